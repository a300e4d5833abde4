/**
 * Shapes of a recipe's ingredients and of the nutrition worked from them.
 * Nutrition per 100 g is as printed on the ingredient's label.
 *
 * @example
 * const oats: Ingredient = { name: "Rolled oats", kind: "g", amount: 80, density: null, pieceGrams: null,
 *   energyKcal: 375, protein: 13, carbohydrate: 60, fat: 7, fibre: 9 };
 */

/** How an amount is given: grams, millilitres (with a density) or pieces (with a weight per piece). */
export const AMOUNT_KINDS = ["g", "ml", "piece"] as const;
export type AmountKind = (typeof AMOUNT_KINDS)[number];

/** The label's values per 100 g: energy in kcal, the macros in g. Fibre is optional on a label. */
export type Per100g = {
  energyKcal: number;
  protein: number;
  carbohydrate: number;
  fat: number;
  fibre: number | null;
};

export type Ingredient = Per100g & {
  name: string;
  kind: AmountKind;
  /** Grams, millilitres or pieces, as `kind` says. */
  amount: number;
  /** g per ml; set for "ml", null otherwise. */
  density: number | null;
  /** g per piece; set for "piece", null otherwise. */
  pieceGrams: number | null;
};

/** Energy and macros of some amount of food. `fibre` is null when no label in it stated fibre. */
export type Nutrients = {
  /** From the labels' energy values. */
  energyKcal: number;
  /** Recomputed from the macros (lib/nutrition/atwater.ts), to compare with the labels. */
  macroEnergyKcal: number;
  protein: number;
  carbohydrate: number;
  fat: number;
  fibre: number | null;
};
