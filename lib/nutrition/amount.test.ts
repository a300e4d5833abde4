import { describe, expect, it } from "vitest";
import { amountText, gramsOf } from "./amount";

describe("grams of an amount", () => {
  it("takes grams as they are", () => {
    expect(gramsOf({ kind: "g", amount: 80, density: null, pieceGrams: null })).toBe(80);
  });

  it("turns millilitres into grams with the density", () => {
    // mass = volume × density: 250 ml × 1.03 g/ml = 257.5 g
    expect(gramsOf({ kind: "ml", amount: 250, density: 1.03, pieceGrams: null })).toBeCloseTo(257.5, 9);
  });

  it("turns pieces into grams with the weight of one piece", () => {
    // 3 × 60 g = 180 g; half a piece is allowed
    expect(gramsOf({ kind: "piece", amount: 3, density: null, pieceGrams: 60 })).toBe(180);
    expect(gramsOf({ kind: "piece", amount: 0.5, density: null, pieceGrams: 118 })).toBe(59);
  });

  it("refuses millilitres without a density and pieces without a weight", () => {
    expect(() => gramsOf({ kind: "ml", amount: 1, density: null, pieceGrams: null })).toThrow(/density/);
    expect(() => gramsOf({ kind: "piece", amount: 1, density: null, pieceGrams: null })).toThrow(/per piece/);
  });

  it("reads amounts in the unit they were given", () => {
    expect(amountText({ kind: "g", amount: 80 })).toBe("80 g");
    expect(amountText({ kind: "ml", amount: 12.5 })).toBe("12.5 ml");
    expect(amountText({ kind: "piece", amount: 1 })).toBe("1 piece");
    expect(amountText({ kind: "piece", amount: 1.3333333 })).toBe("1.33 pieces");
  });
});
