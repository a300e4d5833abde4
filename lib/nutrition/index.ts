/**
 * Recipe nutrition: grams from amounts, totals and per serving, energy from
 * macros with the Atwater general factors, label checks, display rounding and
 * the input rules. Conventions are in README.md beside this file.
 *
 * @example
 * import { recipeNutrition, grams, kcal } from "@/lib/nutrition";
 * const n = recipeNutrition(ingredients, 4);
 * `${kcal(n.perServing.energyKcal)} · protein ${grams(n.perServing.protein)}`;
 */
export * from "./types";
export * from "./amount";
export * from "./atwater";
export * from "./recipe";
export * from "./rounding";
export * from "./rules";
