/**
 * Totals and per-serving nutrition of a recipe, worked from each ingredient's
 * amount and its label per 100 g. Nothing is rounded here; rounding is for
 * display only (rounding.ts), so sums stay exact.
 *
 * @example
 * const r = recipeNutrition([{ name: "Oats", kind: "g", amount: 200, density: null, pieceGrams: null,
 *   energyKcal: 375, protein: 13, carbohydrate: 60, fat: 7, fibre: 9 }], 2);
 * r.totals.energyKcal; // 750 (200 g × 375 / 100)
 * r.perServing.protein; // 13 (26 g over 2 servings)
 */
import { gramsOf } from "./amount";
import { checkLabelEnergy, type LabelEnergyCheck, macroEnergy } from "./atwater";
import type { Ingredient, Nutrients } from "./types";

export type IngredientNutrition = { grams: number; nutrients: Nutrients; label: LabelEnergyCheck };

export type RecipeNutrition = {
  servings: number;
  /** Weight of all ingredients as used (no cooking losses or water gained). */
  grams: number;
  gramsPerServing: number;
  totals: Nutrients;
  perServing: Nutrients;
  ingredients: IngredientNutrition[];
  /** How many ingredients' labels state fibre; fibre totals cover only those. */
  fibreStated: number;
  /** Positions of ingredients whose label energy disagrees with their macros. */
  disagreeing: number[];
};

/** Energy and macros in the amount of one ingredient. */
export function ingredientNutrition(i: Ingredient): IngredientNutrition {
  const grams = gramsOf(i);
  const f = grams / 100;
  const nutrients: Nutrients = {
    energyKcal: i.energyKcal * f,
    macroEnergyKcal: macroEnergy(i) * f,
    protein: i.protein * f,
    carbohydrate: i.carbohydrate * f,
    fat: i.fat * f,
    fibre: i.fibre === null ? null : i.fibre * f,
  };
  return { grams, nutrients, label: checkLabelEnergy(i) };
}

function divide(n: Nutrients, by: number): Nutrients {
  return {
    energyKcal: n.energyKcal / by,
    macroEnergyKcal: n.macroEnergyKcal / by,
    protein: n.protein / by,
    carbohydrate: n.carbohydrate / by,
    fat: n.fat / by,
    fibre: n.fibre === null ? null : n.fibre / by,
  };
}

export function recipeNutrition(ingredients: readonly Ingredient[], servings: number): RecipeNutrition {
  if (!(Number.isFinite(servings) && servings > 0)) throw new Error("servings must be a positive number");
  const each = ingredients.map(ingredientNutrition);
  const totals: Nutrients = { energyKcal: 0, macroEnergyKcal: 0, protein: 0, carbohydrate: 0, fat: 0, fibre: null };
  let grams = 0;
  for (const { grams: g, nutrients: n } of each) {
    grams += g;
    totals.energyKcal += n.energyKcal;
    totals.macroEnergyKcal += n.macroEnergyKcal;
    totals.protein += n.protein;
    totals.carbohydrate += n.carbohydrate;
    totals.fat += n.fat;
    if (n.fibre !== null) totals.fibre = (totals.fibre ?? 0) + n.fibre;
  }
  return {
    servings,
    grams,
    gramsPerServing: grams / servings,
    totals,
    perServing: divide(totals, servings),
    ingredients: each,
    fibreStated: ingredients.filter((i) => i.fibre !== null).length,
    disagreeing: each.flatMap((e, idx) => (e.label.agrees ? [] : [idx])),
  };
}

/**
 * The same recipe for another number of servings: every amount scales by
 * `to / from`, so each serving stays the same. Densities and piece weights
 * are properties of the food and do not change.
 */
export function scaleRecipe<T extends Ingredient>(ingredients: readonly T[], from: number, to: number): T[] {
  if (!(from > 0 && to > 0)) throw new Error("servings must be positive");
  const k = to / from;
  return ingredients.map((i) => ({ ...i, amount: i.amount * k }));
}
