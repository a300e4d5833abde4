/**
 * What a recipe may hold, as zod schemas shared by the editor form (field by
 * field, as the coach types) and the server (whoever calls). Every refusal
 * names its field, e.g. `ingredients.2.density`.
 *
 * Numbers may arrive as NaN or "" from an empty form field; both read as "not
 * given". A label's macros may add up to at most 100 g per 100 g plus
 * MACRO_SUM_SLACK: labels round each value to the nearest 1 g from 10 g up
 * (rounding.ts), so each of four values may read up to 0.5 g high.
 *
 * @example
 * recipeInputSchema.safeParse({ title: "Oat bowl", servings: 2, steps: ["Mix"], ingredients: [...] });
 * ingredientSchema.safeParse({ ...oats, protein: 60, carbohydrate: 60 }).error?.issues[0].path; // ["macros"]
 */
import { z } from "zod";
import { AMOUNT_KINDS, type Ingredient } from "./types";

export const TITLE_MAX = 120;
export const NAME_MAX = 80;
export const STEP_MAX = 1000;
export const STEPS_MAX = 30;
export const INGREDIENTS_MAX = 40;
export const SERVINGS_MAX = 100;
/** Caps that catch a slipped key (10 kg of one ingredient is already a banquet). */
export const AMOUNT_MAX = { g: 10_000, ml: 10_000, piece: 500 } as const;
export const PIECE_GRAMS_MAX = 5_000;
/** g per ml; 0.1–3 spans whipped foods to syrups and salt. */
export const DENSITY_RANGE = { min: 0.1, max: 3 } as const;
/** 100 g of pure fat at 9 kcal per g; nothing on a label can be more. */
export const ENERGY_MAX = 900;
export const MACRO_SUM_SLACK = 2;

const blankToNull = (v: unknown) => (v === "" || v === undefined || v === null || (typeof v === "number" && Number.isNaN(v)) ? null : v);

/** A number the person must give; `what` completes "Enter the …". */
const required = (what: string) =>
  z.preprocess(blankToNull, z.number({ error: (iss) => (iss.input === null ? `Enter the ${what}` : `The ${what} must be a number`) }));

const optional = (what: string) => z.preprocess(blankToNull, z.number({ error: `The ${what} must be a number` }).nullable());

const macro = (what: string) => required(what).pipe(z.number().min(0, `The ${what} cannot be negative`).max(100, `The ${what} cannot be more than 100 g per 100 g`));

const tidy = (s: string) => s.replace(/\s+/g, " ").trim();

export const ingredientSchema = z
  .object({
    name: z
      .string({ error: "Name the ingredient" })
      .transform(tidy)
      .pipe(z.string().min(1, "Name the ingredient").max(NAME_MAX, `Keep the name to ${NAME_MAX} characters`)),
    kind: z.enum(AMOUNT_KINDS, { error: "The unit is g, ml or pieces" }),
    amount: required("amount").pipe(z.number().gt(0, "The amount must be more than 0")),
    density: optional("density"),
    pieceGrams: optional("weight per piece"),
    energyKcal: required("energy per 100 g")
      .pipe(z.number().min(0, "The energy cannot be negative").max(ENERGY_MAX, `No food has more than ${ENERGY_MAX} kcal per 100 g — was it kJ?`)),
    protein: macro("protein"),
    carbohydrate: macro("carbohydrate"),
    fat: macro("fat"),
    fibre: optional("fibre").pipe(z.number().min(0, "The fibre cannot be negative").max(100, "The fibre cannot be more than 100 g per 100 g").nullable()),
  })
  .superRefine((i, ctx) => {
    const cap = AMOUNT_MAX[i.kind];
    if (i.amount > cap) ctx.addIssue({ code: "custom", path: ["amount"], message: `Keep the amount to ${cap} ${i.kind === "piece" ? "pieces" : i.kind}` });
    if (i.kind === "ml") {
      if (i.density === null) ctx.addIssue({ code: "custom", path: ["density"], message: "Give the density in g per ml (1.00 for water)" });
      else if (i.density < DENSITY_RANGE.min || i.density > DENSITY_RANGE.max)
        ctx.addIssue({ code: "custom", path: ["density"], message: `The density is between ${DENSITY_RANGE.min} and ${DENSITY_RANGE.max} g per ml` });
    }
    if (i.kind === "piece") {
      if (i.pieceGrams === null) ctx.addIssue({ code: "custom", path: ["pieceGrams"], message: "Give the weight of one piece in g" });
      else if (!(i.pieceGrams > 0) || i.pieceGrams > PIECE_GRAMS_MAX)
        ctx.addIssue({ code: "custom", path: ["pieceGrams"], message: `A piece weighs more than 0 g and at most ${PIECE_GRAMS_MAX} g` });
    }
    const sum = i.protein + i.carbohydrate + i.fat + (i.fibre ?? 0);
    if (sum > 100 + MACRO_SUM_SLACK) {
      const parts = i.fibre === null ? "Protein, carbohydrate and fat" : "Protein, carbohydrate, fat and fibre";
      ctx.addIssue({
        code: "custom",
        path: ["macros"],
        message: `${parts} add up to ${Number(sum.toFixed(1))} g per 100 g; 100 g of food cannot hold more than 100 g of them`,
      });
    }
  })
  .transform(
    (i): Ingredient => ({
      ...i,
      density: i.kind === "ml" ? i.density : null,
      pieceGrams: i.kind === "piece" ? i.pieceGrams : null,
    }),
  );

export const titleSchema = z
  .string({ error: "Give the recipe a title" })
  .transform(tidy)
  .pipe(z.string().min(1, "Give the recipe a title").max(TITLE_MAX, `Keep the title to ${TITLE_MAX} characters`));

export const servingsSchema = z.preprocess(
  blankToNull,
  z
    .number({ error: (iss) => (iss.input === null ? "Enter the number of servings" : "Servings must be a number") })
    .int("Servings are a whole number")
    .min(1, "At least 1 serving")
    .max(SERVINGS_MAX, `At most ${SERVINGS_MAX} servings`),
);

/** Blank steps are dropped (an empty row left in the form is harmless). */
export const stepsSchema = z
  .array(z.string({ error: "Each step must be text" }).transform((s) => s.replace(/\r\n?/g, "\n").trim()), { error: "Steps must be a list" })
  .transform((steps) => steps.filter((s) => s !== ""))
  .superRefine((steps, ctx) => {
    steps.forEach((s, i) => {
      if (s.length > STEP_MAX) ctx.addIssue({ code: "custom", path: [i], message: `Keep each step to ${STEP_MAX} characters` });
    });
    if (steps.length > STEPS_MAX) ctx.addIssue({ code: "custom", message: `Use at most ${STEPS_MAX} steps` });
  });

export const recipeInputSchema = z.object({
  title: titleSchema,
  servings: servingsSchema,
  steps: stepsSchema,
  ingredients: z
    .array(ingredientSchema, { error: "Ingredients must be a list" })
    .min(1, "Add at least one ingredient")
    .max(INGREDIENTS_MAX, `Use at most ${INGREDIENTS_MAX} ingredients`),
});

export type RecipeInput = z.output<typeof recipeInputSchema>;

/**
 * The rows that are complete and valid, for a live total while the coach is
 * still typing; `pending` lists the positions left out.
 */
export function usableIngredients(rows: readonly unknown[]): { ingredients: Ingredient[]; pending: number[] } {
  const ingredients: Ingredient[] = [];
  const pending: number[] = [];
  rows.forEach((row, i) => {
    const r = ingredientSchema.safeParse(row);
    if (r.success) ingredients.push(r.data);
    else pending.push(i);
  });
  return { ingredients, pending };
}
