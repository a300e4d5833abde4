import { describe, expect, it } from "vitest";
import { OAT_BOWL } from "./fixtures";
import { ingredientSchema, MACRO_SUM_SLACK, recipeInputSchema, usableIngredients } from "./rules";

const fieldsOf = (r: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }) =>
  Object.fromEntries((r.error?.issues ?? []).map((i) => [i.path.join("."), i.message]));

const recipe = (over: Record<string, unknown> = {}) => ({ title: "Oat bowl", servings: 2, steps: ["Warm the milk", "Stir in the oats"], ingredients: OAT_BOWL, ...over });

describe("recipe input rules", () => {
  it("accepts the oat bowl as it is", () => {
    const r = recipeInputSchema.safeParse(recipe());
    expect(r.success).toBe(true);
    expect(r.data?.ingredients[1]).toMatchObject({ kind: "ml", density: 1.03, pieceGrams: null });
  });

  it("names the field of a negative or zero amount", () => {
    const r = recipeInputSchema.safeParse(recipe({ ingredients: [{ ...OAT_BOWL[0], amount: -5 }] }));
    expect(fieldsOf(r)).toEqual({ "ingredients.0.amount": "The amount must be more than 0" });
    const zero = recipeInputSchema.safeParse(recipe({ ingredients: [{ ...OAT_BOWL[0], amount: 0 }] }));
    expect(fieldsOf(zero)["ingredients.0.amount"]).toBe("The amount must be more than 0");
  });

  it("refuses macros that add up to more than 100 g per 100 g, allowing label rounding", () => {
    // 40 + 40 + 22 = 102 g is within the 2 g slack (four values rounded up by at most 0.5 g each);
    // 40 + 40 + 23 = 103 g is not.
    expect(MACRO_SUM_SLACK).toBe(2);
    const base = { ...OAT_BOWL[0], energyKcal: 518, fibre: null };
    expect(ingredientSchema.safeParse({ ...base, protein: 40, carbohydrate: 40, fat: 22 }).success).toBe(true);
    const over = ingredientSchema.safeParse({ ...base, protein: 40, carbohydrate: 40, fat: 23 });
    expect(fieldsOf(over)).toEqual({ macros: "Protein, carbohydrate and fat add up to 103 g per 100 g; 100 g of food cannot hold more than 100 g of them" });
    const withFibre = ingredientSchema.safeParse({ ...base, protein: 30, carbohydrate: 50, fat: 10, fibre: 15 });
    expect(fieldsOf(withFibre).macros).toMatch(/^Protein, carbohydrate, fat and fibre add up to 105 g/);
  });

  it("refuses negative nutrition values and energy beyond pure fat", () => {
    const r = ingredientSchema.safeParse({ ...OAT_BOWL[0], protein: -1, fibre: -2, energyKcal: 1569 });
    expect(fieldsOf(r)).toEqual({
      protein: "The protein cannot be negative",
      fibre: "The fibre cannot be negative",
      energyKcal: "No food has more than 900 kcal per 100 g — was it kJ?",
    });
  });

  it("asks for a density with millilitres and a weight with pieces", () => {
    const ml = ingredientSchema.safeParse({ ...OAT_BOWL[1], density: null });
    expect(fieldsOf(ml)).toEqual({ density: "Give the density in g per ml (1.00 for water)" });
    const dense = ingredientSchema.safeParse({ ...OAT_BOWL[1], density: 8 });
    expect(fieldsOf(dense)).toEqual({ density: "The density is between 0.1 and 3 g per ml" });
    const piece = ingredientSchema.safeParse({ ...OAT_BOWL[2], pieceGrams: Number.NaN });
    expect(fieldsOf(piece)).toEqual({ pieceGrams: "Give the weight of one piece in g" });
  });

  it("drops a density or piece weight that does not belong to the unit", () => {
    const r = ingredientSchema.parse({ ...OAT_BOWL[0], density: 1.2, pieceGrams: 50 });
    expect([r.density, r.pieceGrams]).toEqual([null, null]);
  });

  it("reads an empty form field as not given", () => {
    const r = ingredientSchema.safeParse({ ...OAT_BOWL[0], protein: Number.NaN, fibre: "" });
    expect(fieldsOf(r)).toEqual({ protein: "Enter the protein" });
  });

  it("caps amounts, servings and the ingredient list", () => {
    expect(fieldsOf(ingredientSchema.safeParse({ ...OAT_BOWL[0], amount: 10_001 }))).toEqual({ amount: "Keep the amount to 10000 g" });
    expect(fieldsOf(recipeInputSchema.safeParse(recipe({ servings: 0 })))).toEqual({ servings: "At least 1 serving" });
    expect(fieldsOf(recipeInputSchema.safeParse(recipe({ servings: 101 })))).toEqual({ servings: "At most 100 servings" });
    expect(fieldsOf(recipeInputSchema.safeParse(recipe({ servings: 2.5 })))).toEqual({ servings: "Servings are a whole number" });
    expect(fieldsOf(recipeInputSchema.safeParse(recipe({ ingredients: [] })))).toEqual({ ingredients: "Add at least one ingredient" });
    expect(fieldsOf(recipeInputSchema.safeParse(recipe({ title: "   " })))).toEqual({ title: "Give the recipe a title" });
  });

  it("drops blank method steps", () => {
    expect(recipeInputSchema.parse(recipe({ steps: ["  Mix ", "", "   ", "Serve"] })).steps).toEqual(["Mix", "Serve"]);
  });

  it("keeps complete rows for the live total and lists the rest", () => {
    const rows = [OAT_BOWL[0], { ...OAT_BOWL[1], amount: "" }, { name: "" }, OAT_BOWL[3]];
    const r = usableIngredients(rows);
    expect(r.ingredients.map((i) => i.name)).toEqual(["Rolled oats", "Peanut butter"]);
    expect(r.pending).toEqual([1, 2]);
  });
});
