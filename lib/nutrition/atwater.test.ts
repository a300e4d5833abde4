import { describe, expect, it } from "vitest";
import { ATWATER_GENERAL, checkLabelEnergy, FIBRE_KCAL_PER_G, macroEnergy } from "./atwater";

const label = (energyKcal: number, protein: number, carbohydrate: number, fat: number, fibre: number | null = null) => ({ energyKcal, protein, carbohydrate, fat, fibre });

describe("energy from macros", () => {
  it("uses 4 kcal per g of protein and carbohydrate and 9 kcal per g of fat", () => {
    // Atwater general factors: Merrill & Watt (1955, rev. 1973), USDA Agriculture Handbook No. 74
    expect(ATWATER_GENERAL).toEqual({ protein: 4, carbohydrate: 4, fat: 9 });
    expect(macroEnergy({ protein: 1, carbohydrate: 0, fat: 0, fibre: null })).toBe(4);
    expect(macroEnergy({ protein: 0, carbohydrate: 1, fat: 0, fibre: null })).toBe(4);
    expect(macroEnergy({ protein: 0, carbohydrate: 0, fat: 1, fibre: null })).toBe(9);
  });

  it("adds 2 kcal per g of fibre when the label states it", () => {
    // Regulation (EU) No 1169/2011, Annex XIV: fibre 2 kcal (8 kJ) per g (from memory)
    expect(FIBRE_KCAL_PER_G).toBe(2);
    // 4·10 + 4·50 + 9·5 + 2·10 = 40 + 200 + 45 + 20 = 305
    expect(macroEnergy({ protein: 10, carbohydrate: 50, fat: 5, fibre: 10 })).toBe(305);
  });

  it("agrees with the separately rounded kJ factors 17/17/37 within 2 %", () => {
    // Merrill & Watt 1955 (USDA Handbook 74) and FAO 2003 FNP 77 ch. 3 give 17, 17, 37 kJ/g, each rounded
    // on its own; 1 kcal = 4.184 kJ. 4 × 4.184 = 16.74; 9 × 4.184 = 37.66.
    const kj = { protein: 17, carbohydrate: 17, fat: 37 };
    for (const key of ["protein", "carbohydrate", "fat"] as const) {
      expect(Math.abs(ATWATER_GENERAL[key] * 4.184 - kj[key]) / kj[key]).toBeLessThan(0.02);
    }
  });
});

describe("label energy check", () => {
  it("accepts a label whose energy is close to its macros", () => {
    // 4·13 + 4·60 + 9·7 + 2·9 = 52 + 240 + 63 + 18 = 373 against 375 stated
    const c = checkLabelEnergy(label(375, 13, 60, 7, 9));
    expect(c.fromMacros).toBe(373);
    expect(c.difference).toBe(2);
    expect(c.agrees).toBe(true);
  });

  it("flags kJ typed where kcal belongs", () => {
    // 268 (the kJ figure) against 4·3.4 + 4·4.8 + 9·3.6 = 65.2 kcal
    const c = checkLabelEnergy(label(268, 3.4, 4.8, 3.6));
    expect(c.fromMacros).toBeCloseTo(65.2, 9);
    expect(c.agrees).toBe(false);
  });

  it("allows the larger of 20 kcal and 10 % of the label (common practice, no source)", () => {
    // Small labels: 20 kcal. 100 stated; 4·20 = 80 from macros, gap 20 → accepted; 4·19.75 = 79, gap 21 → flagged.
    expect(checkLabelEnergy(label(100, 0, 20, 0)).agrees).toBe(true);
    expect(checkLabelEnergy(label(100, 0, 19.75, 0)).agrees).toBe(false);
    // Large labels: 10 %. 500 stated, allowed 50; 9·50 = 450, gap 50 → accepted; 9·49.9 = 449.1, gap 50.9 → flagged.
    expect(checkLabelEnergy(label(500, 0, 0, 50)).allowed).toBe(50);
    expect(checkLabelEnergy(label(500, 0, 0, 50)).agrees).toBe(true);
    expect(checkLabelEnergy(label(500, 0, 0, 49.9)).agrees).toBe(false);
  });
});
