/**
 * What a printed recipe card says, worked out before any layout: amounts in
 * the unit the coach gave with their weight in grams, per-serving and
 * whole-recipe values rounded for display (lib/nutrition/rounding.ts), and
 * the ingredients whose label energy disagrees with their macros. Pure.
 *
 * @example
 * const card = recipeCardView({ title: "Oat bowl", servings: 2, steps: ["Mix"], ingredients });
 * card.rows[0]; // { label: "Energy", perServing: "594 kcal", whole: "1189 kcal" }
 */
import { amountText, grams, kcal, recipeNutrition, roundTo, type Ingredient } from "../../lib/nutrition";

export interface RecipeCardInput {
  title: string;
  servings: number;
  steps: string[];
  ingredients: Ingredient[];
  /** Who wrote it, e.g. the coach's name; printed small above the title. */
  byline?: string | null;
}

export interface RecipeCardView {
  title: string;
  byline: string | null;
  /** "Serves 2 · about 413 g a serving". */
  servingLine: string;
  rows: { label: string; perServing: string; whole: string }[];
  /** Why fibre reads as it does, when not every label stated it; else null. */
  fibreNote: string | null;
  ingredients: { amount: string; name: string; weight: string | null; flagged: boolean }[];
  steps: string[];
  /** Set when some label's energy disagrees with its macros. */
  flagNote: string | null;
}

const wholeGrams = (g: number) => `${Number(roundTo(g, 0))} g`;

export function recipeCardView(input: RecipeCardInput): RecipeCardView {
  const n = recipeNutrition(input.ingredients, input.servings);
  const p = n.perServing;
  const t = n.totals;
  const rows = [
    { label: "Energy", perServing: kcal(p.energyKcal), whole: kcal(t.energyKcal) },
    { label: "Protein", perServing: grams(p.protein), whole: grams(t.protein) },
    { label: "Carbohydrate", perServing: grams(p.carbohydrate), whole: grams(t.carbohydrate) },
    { label: "Fat", perServing: grams(p.fat), whole: grams(t.fat) },
  ];
  if (p.fibre !== null && t.fibre !== null) rows.push({ label: "Fibre", perServing: grams(p.fibre), whole: grams(t.fibre) });
  const total = input.ingredients.length;
  const fibreNote =
    n.fibreStated > 0 && n.fibreStated < total ? `Fibre counts the ${n.fibreStated} of ${total} ingredients whose label states it.` : null;
  const flagged = new Set(n.disagreeing);
  return {
    title: input.title,
    byline: input.byline ?? null,
    servingLine: `Serves ${input.servings} · about ${wholeGrams(n.gramsPerServing)} a serving`,
    rows,
    fibreNote,
    ingredients: input.ingredients.map((i, idx) => ({
      amount: amountText(i),
      name: i.name,
      weight: i.kind === "g" ? null : wholeGrams(n.ingredients[idx].grams),
      flagged: flagged.has(idx),
    })),
    steps: input.steps,
    flagNote: flagged.size > 0 ? "* The label's energy differs from its protein, carbohydrate and fat; check the label." : null,
  };
}
