import { amountText, gramsOf, type Ingredient, type Nutrients } from "@/lib/nutrition";
import { NutritionFacts } from "./NutritionFacts";

/** A recipe to read and cook from: one serving's values, the ingredients and the method. Server-safe. */
export function RecipeView({ recipe }: { recipe: { servings: number; steps: string[]; ingredients: Ingredient[]; perServing: Nutrients } }) {
  return (
    <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,1fr)_18rem]">
      <div className="space-y-6">
        <section className="panel p-4" aria-labelledby="ingredients-h">
          <h2 id="ingredients-h" className="text-sm font-semibold uppercase tracking-wider text-iron-400">Ingredients</h2>
          <ul className="mt-2 divide-y divide-chalk-200 text-sm" data-testid="recipe-ingredients">
            {recipe.ingredients.map((i, idx) => (
              <li key={idx} className="flex gap-3 py-1.5">
                <span className="w-24 shrink-0 font-semibold text-iron">{amountText(i)}</span>
                <span className="text-iron-700">
                  {i.name}
                  {i.kind !== "g" ? <span className="text-iron-400"> ({Math.round(gramsOf(i))} g)</span> : null}
                </span>
              </li>
            ))}
          </ul>
        </section>
        {recipe.steps.length > 0 ? (
          <section className="panel p-4" aria-labelledby="method-h">
            <h2 id="method-h" className="text-sm font-semibold uppercase tracking-wider text-iron-400">Method</h2>
            <ol className="mt-2 list-decimal space-y-2 pl-5 text-sm text-iron-700">
              {recipe.steps.map((s, idx) => (
                <li key={idx} className="whitespace-pre-line">{s}</li>
              ))}
            </ol>
          </section>
        ) : null}
      </div>
      <section className="panel self-start p-4" aria-labelledby="serving-h">
        <h2 id="serving-h" className="text-sm font-semibold uppercase tracking-wider text-iron-400">One serving of {recipe.servings}</h2>
        <div className="mt-2">
          <NutritionFacts perServing={recipe.perServing} />
        </div>
        <p className="mt-3 text-xs text-iron-400">Worked from the food labels; a guide for planning meals, not dietary or medical advice.</p>
      </section>
    </div>
  );
}
