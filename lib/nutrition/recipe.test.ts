import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { OAT_BOWL } from "./fixtures";
import { recipeNutrition, scaleRecipe } from "./recipe";
import { grams, kcal } from "./rounding";
import type { Ingredient } from "./types";

describe("recipe nutrition", () => {
  it("works the five-ingredient oat bowl out as done by hand", () => {
    // Worked by hand (grams × value per 100 g ÷ 100), 2 servings:
    //   Rolled oats   120 g                      → 120 g
    //   Whole milk    400 ml × 1.03 g/ml         → 412 g
    //   Banana        2 pieces × 118 g           → 236 g
    //   Peanut butter 30 g                       →  30 g
    //   Honey         20 ml × 1.4 g/ml           →  28 g        total 826 g, 413 g a serving
    // Energy (label): 1.2×375 = 450; 4.12×64 = 263.68; 2.36×89 = 210.04; 0.3×600 = 180; 0.28×304 = 85.12
    //   = 1188.84 kcal, ÷ 2 = 594.42 kcal a serving → "594 kcal"
    // Protein: 1.2×13 = 15.6; 4.12×3.4 = 14.008; 2.36×1.1 = 2.596; 0.3×25 = 7.5; 0.28×0.3 = 0.084
    //   = 39.788 g, ÷ 2 = 19.894 g → "20 g"
    // Carbohydrate: 1.2×60 = 72; 4.12×4.8 = 19.776; 2.36×20 = 47.2; 0.3×12 = 3.6; 0.28×82 = 22.96
    //   = 165.536 g, ÷ 2 = 82.768 g → "83 g"
    // Fat: 1.2×7 = 8.4; 4.12×3.6 = 14.832; 2.36×0.3 = 0.708; 0.3×50 = 15; 0.28×0 = 0
    //   = 38.94 g, ÷ 2 = 19.47 g → "19 g"
    // Fibre (stated on oats, banana, peanut butter): 1.2×9 = 10.8; 2.36×2.6 = 6.136; 0.3×6 = 1.8
    //   = 18.736 g, ÷ 2 = 9.368 g → "9.4 g"
    // Energy from macros (Atwater general factors 4/4/9, Merrill & Watt 1955, USDA Agriculture Handbook No. 74;
    // fibre 2 kcal/g, Regulation (EU) No 1169/2011 Annex XIV):
    //   4×39.788 + 4×165.536 + 9×38.94 + 2×18.736 = 159.152 + 662.144 + 350.46 + 37.472 = 1209.228 kcal
    const r = recipeNutrition(OAT_BOWL, 2);
    expect(r.ingredients.map((i) => i.grams)).toEqual([120, expect.closeTo(412, 9), 236, 30, expect.closeTo(28, 9)]);
    expect(r.grams).toBeCloseTo(826, 9);
    expect(r.gramsPerServing).toBeCloseTo(413, 9);
    expect(r.totals.energyKcal).toBeCloseTo(1188.84, 9);
    expect(r.totals.protein).toBeCloseTo(39.788, 9);
    expect(r.totals.carbohydrate).toBeCloseTo(165.536, 9);
    expect(r.totals.fat).toBeCloseTo(38.94, 9);
    expect(r.totals.fibre).toBeCloseTo(18.736, 9);
    expect(r.totals.macroEnergyKcal).toBeCloseTo(1209.228, 9);
    expect(r.perServing.energyKcal).toBeCloseTo(594.42, 9);
    expect(r.perServing.protein).toBeCloseTo(19.894, 9);
    expect(r.perServing.carbohydrate).toBeCloseTo(82.768, 9);
    expect(r.perServing.fat).toBeCloseTo(19.47, 9);
    expect(r.perServing.fibre).toBeCloseTo(9.368, 9);
    expect(r.fibreStated).toBe(3);
    const p = r.perServing;
    expect([kcal(p.energyKcal), grams(p.protein), grams(p.carbohydrate), grams(p.fat), grams(p.fibre!)]).toEqual(["594 kcal", "20 g", "83 g", "19 g", "9.4 g"]);
  });

  it("flags only the ingredients whose label energy disagrees with their macros", () => {
    expect(recipeNutrition(OAT_BOWL, 2).disagreeing).toEqual([]);
    // Milk's 268 kJ typed into the kcal field: 268 vs 65.2 from its macros.
    const slipped = OAT_BOWL.map((i, n) => (n === 1 ? { ...i, energyKcal: 268 } : i));
    expect(recipeNutrition(slipped, 2).disagreeing).toEqual([1]);
  });

  it("leaves fibre empty when no label states it", () => {
    const noFibre = OAT_BOWL.map((i) => ({ ...i, fibre: null }));
    const r = recipeNutrition(noFibre, 1);
    expect(r.totals.fibre).toBeNull();
    expect(r.fibreStated).toBe(0);
  });

  it("refuses zero servings", () => {
    expect(() => recipeNutrition(OAT_BOWL, 0)).toThrow(/servings/);
  });
});

const per100 = fc
  .record({ protein: fc.integer({ min: 0, max: 300 }), carbohydrate: fc.integer({ min: 0, max: 300 }), fat: fc.integer({ min: 0, max: 300 }), fibre: fc.option(fc.integer({ min: 0, max: 100 })) })
  .map((m) => ({ protein: m.protein / 10, carbohydrate: m.carbohydrate / 10, fat: m.fat / 10, fibre: m.fibre === null ? null : m.fibre / 10 }));

const ingredient: fc.Arbitrary<Ingredient> = fc
  .tuple(per100, fc.integer({ min: 0, max: 900 }), fc.constantFrom("g", "ml", "piece" as const), fc.integer({ min: 1, max: 5000 }), fc.integer({ min: 50, max: 200 }), fc.integer({ min: 1, max: 300 }))
  .map(([m, energyKcal, kind, amount, density, piece]) => ({
    name: "x",
    kind,
    amount: kind === "piece" ? amount / 500 : amount / 10,
    density: kind === "ml" ? density / 100 : null,
    pieceGrams: kind === "piece" ? piece : null,
    energyKcal,
    ...m,
  }));

describe("scaling servings", () => {
  it("keeps every per-serving value when amounts scale with the servings", () => {
    fc.assert(
      fc.property(fc.array(ingredient, { minLength: 1, maxLength: 8 }), fc.integer({ min: 1, max: 100 }), fc.integer({ min: 1, max: 100 }), (items, from, to) => {
        const before = recipeNutrition(items, from).perServing;
        const after = recipeNutrition(scaleRecipe(items, from, to), to).perServing;
        for (const key of ["energyKcal", "macroEnergyKcal", "protein", "carbohydrate", "fat"] as const) {
          expect(after[key]).toBeCloseTo(before[key], 6);
        }
        if (before.fibre === null) expect(after.fibre).toBeNull();
        else expect(after.fibre).toBeCloseTo(before.fibre, 6);
      }),
    );
  });

  it("changes totals in proportion: twice the servings, twice the total", () => {
    const r = recipeNutrition(scaleRecipe(OAT_BOWL, 2, 4), 4);
    // 1188.84 × 2 = 2377.68
    expect(r.totals.energyKcal).toBeCloseTo(2377.68, 9);
    expect(scaleRecipe(OAT_BOWL, 2, 4)[2].amount).toBe(4); // 2 bananas become 4
  });
});
