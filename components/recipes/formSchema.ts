/**
 * The recipe editor's form: the same rules as the server (lib/nutrition/rules.ts),
 * with method steps as rows ({ text }) so they can be a repeatable list.
 *
 * @example
 * const out = recipeFormSchema.parse(values); // steps still as rows
 * toPayload(out); // { title, servings, steps: ["Mix"], ingredients }
 */
import type { Control } from "react-hook-form";
import { z } from "zod";
import { type AmountKind, type Ingredient, ingredientSchema, INGREDIENTS_MAX, servingsSchema, STEP_MAX, titleSchema } from "@/lib/nutrition";

export const recipeFormSchema = z.object({
  title: titleSchema,
  servings: servingsSchema,
  steps: z.array(z.object({ text: z.string().max(STEP_MAX, `Keep each step to ${STEP_MAX} characters`) })).max(30, "Use at most 30 steps"),
  ingredients: z.array(ingredientSchema).min(1, "Add at least one ingredient").max(INGREDIENTS_MAX, `Use at most ${INGREDIENTS_MAX} ingredients`),
});

export type FormOutput = z.output<typeof recipeFormSchema>;

/** What the inputs hold: numbers once typed, "" or NaN while empty. */
type Num = number | string;
export type FormIngredient = {
  name: string;
  kind: AmountKind;
  amount: Num;
  density: Num;
  pieceGrams: Num;
  energyKcal: Num;
  protein: Num;
  carbohydrate: Num;
  fat: Num;
  fibre: Num;
};
export type FormValues = { title: string; servings: Num; steps: { text: string }[]; ingredients: FormIngredient[] };
export type FormControl = Control<FormValues, unknown, FormOutput>;

/** A new row: grams, and a density of 1.00 ready (shown) should the coach switch to ml. */
export function blankIngredient(): FormIngredient {
  return { name: "", kind: "g", amount: "", density: 1, pieceGrams: "", energyKcal: "", protein: "", carbohydrate: "", fat: "", fibre: "" };
}

export function formValuesOf(recipe: { title: string; servings: number; steps: string[]; ingredients: Ingredient[] } | null): FormValues {
  if (!recipe) return { title: "", servings: 2, steps: [{ text: "" }], ingredients: [blankIngredient()] };
  return {
    title: recipe.title,
    servings: recipe.servings,
    steps: recipe.steps.length > 0 ? recipe.steps.map((text) => ({ text })) : [{ text: "" }],
    ingredients: recipe.ingredients.map((i) => ({
      ...i,
      density: i.density ?? 1,
      pieceGrams: i.pieceGrams ?? "",
      fibre: i.fibre ?? "",
    })),
  };
}

export function toPayload(out: FormOutput) {
  return { title: out.title, servings: out.servings, steps: out.steps.map((s) => s.text), ingredients: out.ingredients };
}
