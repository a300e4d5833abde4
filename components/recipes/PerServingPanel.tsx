"use client";
import { useWatch } from "react-hook-form";
import { kcal, recipeNutrition, servingsSchema, usableIngredients } from "@/lib/nutrition";
import type { FormControl } from "./formSchema";
import { NutritionFacts } from "./NutritionFacts";

const listOf = (ns: number[]) => (ns.length === 1 ? `${ns[0]}` : `${ns.slice(0, -1).join(", ")} and ${ns[ns.length - 1]}`);

/** The recipe's nutrition from the rows complete so far, worked out again on every keystroke. */
function useLiveNutrition(control: FormControl) {
  const [servingsRaw, rows] = useWatch({ control, name: ["servings", "ingredients"] });
  const servings = servingsSchema.safeParse(servingsRaw);
  const { ingredients, pending } = usableIngredients(rows ?? []);
  const n = ingredients.length > 0 ? recipeNutrition(ingredients, servings.success ? servings.data : 1) : null;
  return { servings, rows: rows ?? [], ingredients, pending, n };
}

/** On a phone the panel sits below the form; this line stays at the foot of the screen meanwhile. */
export function PerServingBar({ control }: { control: FormControl }) {
  const { servings, n } = useLiveNutrition(control);
  if (!n || !servings.success) return null;
  return (
    <div className="sticky bottom-0 z-10 -mx-4 border-t border-chalk-300 bg-white/95 px-4 py-2 shadow-[0_-2px_6px_rgba(28,33,40,0.06)] lg:hidden" aria-hidden="true">
      <span className="mr-1 text-xs font-semibold uppercase tracking-wider text-iron-400">A serving</span>
      <NutritionFacts perServing={n.perServing} testIdPrefix="per-serving-bar" compact />
    </div>
  );
}

/** Per-serving values worked out again on every keystroke from the complete rows. */
export function PerServingPanel({ control }: { control: FormControl }) {
  const { servings, rows, ingredients, pending, n } = useLiveNutrition(control);

  return (
    <section className="panel p-4" aria-labelledby="per-serving-h" aria-live="polite" data-testid="per-serving">
      <h2 id="per-serving-h" className="text-sm font-semibold uppercase tracking-wider text-iron-400">
        Per serving
      </h2>
      {!n ? (
        <p className="mt-2 text-sm text-iron-500">Fill in an ingredient&apos;s amount and label to see a serving.</p>
      ) : !servings.success ? (
        <p className="mt-2 text-sm text-ember-700">{servings.error.issues[0].message} to see a serving.</p>
      ) : (
        <>
          <p className="mt-1 text-xs text-iron-400" data-testid="per-serving-weight">
            about {Math.round(n.gramsPerServing)} g, 1 of {servings.data}
          </p>
          <div className="mt-2">
            <NutritionFacts perServing={n.perServing} />
          </div>
        </>
      )}
      {n ? (
        <p className="mt-3 text-xs text-iron-500" data-testid="recipe-total">
          Whole recipe: {kcal(n.totals.energyKcal)}, {Math.round(n.grams)} g
        </p>
      ) : null}
      {n && n.fibreStated > 0 && n.fibreStated < ingredients.length ? (
        <p className="mt-1 text-xs text-iron-400">Fibre counts only the ingredients whose label states it.</p>
      ) : null}
      {pending.length > 0 && rows.length > 0 ? (
        <p className="mt-2 text-xs text-ember-700" data-testid="per-serving-pending">
          Ingredient{pending.length === 1 ? "" : "s"} {listOf(pending.map((p) => p + 1))} {pending.length === 1 ? "is" : "are"} not counted until complete.
        </p>
      ) : null}
      {n && n.disagreeing.length > 0 ? (
        <p className="mt-1 text-xs text-iron-600">Energy is as labelled; {n.disagreeing.length === 1 ? "one label disagrees" : `${n.disagreeing.length} labels disagree`} with its macros (marked).</p>
      ) : null}
    </section>
  );
}
