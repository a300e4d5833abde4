/**
 * A five-ingredient oat bowl used by the tests. The label values are invented
 * but typical of such foods; each label's energy agrees with its macros
 * within LABEL_TOLERANCE.
 *
 * @example
 * recipeNutrition(OAT_BOWL, 2).perServing.energyKcal; // 594.42
 */
import type { Ingredient } from "./types";

const g = (name: string, amount: number, per100: Omit<Ingredient, "name" | "kind" | "amount" | "density" | "pieceGrams">): Ingredient => ({
  name,
  kind: "g",
  amount,
  density: null,
  pieceGrams: null,
  ...per100,
});

export const OAT_BOWL: Ingredient[] = [
  g("Rolled oats", 120, { energyKcal: 375, protein: 13, carbohydrate: 60, fat: 7, fibre: 9 }),
  { ...g("Whole milk", 400, { energyKcal: 64, protein: 3.4, carbohydrate: 4.8, fat: 3.6, fibre: null }), kind: "ml", density: 1.03 },
  { ...g("Banana", 2, { energyKcal: 89, protein: 1.1, carbohydrate: 20, fat: 0.3, fibre: 2.6 }), kind: "piece", pieceGrams: 118 },
  g("Peanut butter", 30, { energyKcal: 600, protein: 25, carbohydrate: 12, fat: 50, fibre: 6 }),
  { ...g("Honey", 20, { energyKcal: 304, protein: 0.3, carbohydrate: 82, fat: 0, fibre: null }), kind: "ml", density: 1.4 },
];
