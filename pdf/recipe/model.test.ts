import { describe, expect, it } from "vitest";
import { OAT_BOWL } from "../../lib/nutrition/fixtures";
import { recipeCardView } from "./model";

const bowl = { title: "Oat bowl", servings: 2, steps: ["Warm the milk"], ingredients: OAT_BOWL };

describe("recipe card view", () => {
  it("prints one serving beside the whole recipe, rounded as labels are", () => {
    // Totals worked by hand in lib/nutrition/recipe.test.ts: 1188.84 kcal, 39.788 g protein, 165.536 g carbohydrate,
    // 38.94 g fat, 18.736 g fibre; halves for a serving. Rounding: EU labelling guidance (from memory).
    expect(recipeCardView(bowl).rows).toEqual([
      { label: "Energy", perServing: "594 kcal", whole: "1189 kcal" },
      { label: "Protein", perServing: "20 g", whole: "40 g" },
      { label: "Carbohydrate", perServing: "83 g", whole: "166 g" },
      { label: "Fat", perServing: "19 g", whole: "39 g" },
      { label: "Fibre", perServing: "9.4 g", whole: "19 g" },
    ]);
  });

  it("gives the weight of amounts in ml or pieces and the serving size", () => {
    const card = recipeCardView(bowl);
    // 400 ml × 1.03 g/ml = 412 g; 2 × 118 g = 236 g; 20 ml × 1.4 g/ml = 28 g; 826 g ÷ 2 = 413 g.
    expect(card.ingredients.map((i) => [i.amount, i.weight])).toEqual([
      ["120 g", null],
      ["400 ml", "412 g"],
      ["2 pieces", "236 g"],
      ["30 g", null],
      ["20 ml", "28 g"],
    ]);
    expect(card.servingLine).toBe("Serves 2 · about 413 g a serving");
  });

  it("says when fibre covers only some ingredients and leaves it out when none state it", () => {
    expect(recipeCardView(bowl).fibreNote).toBe("Fibre counts the 3 of 5 ingredients whose label states it.");
    const none = recipeCardView({ ...bowl, ingredients: OAT_BOWL.map((i) => ({ ...i, fibre: null })) });
    expect(none.rows.map((r) => r.label)).toEqual(["Energy", "Protein", "Carbohydrate", "Fat"]);
    expect(none.fibreNote).toBeNull();
  });

  it("marks an ingredient whose label energy disagrees with its macros", () => {
    // 268 kcal stated against 4·3.4 + 4·4.8 + 9·3.6 = 65.2 kcal (Atwater general factors, USDA Handbook 74).
    const card = recipeCardView({ ...bowl, ingredients: OAT_BOWL.map((i, n) => (n === 1 ? { ...i, energyKcal: 268 } : i)) });
    expect(card.ingredients.map((i) => i.flagged)).toEqual([false, true, false, false, false]);
    expect(card.flagNote).toMatch(/check the label/);
    expect(recipeCardView(bowl).flagNote).toBeNull();
  });
});
