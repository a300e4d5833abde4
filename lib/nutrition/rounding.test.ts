import { describe, expect, it } from "vitest";
import { grams, kcal, roundMacro, roundTo } from "./rounding";

// Rounding rules: European Commission (2012) guidance on tolerances for nutrient values
// declared on a label, rounding table (from memory): energy to 1 kcal; macros to 1 g at
// 10 g and over, 0.1 g under 10 g, "<0.5 g" (or "0 g") under 0.5 g.
describe("display rounding", () => {
  it("shows energy as whole kcal, halves up", () => {
    expect(kcal(594.42)).toBe("594 kcal");
    expect(kcal(511.5)).toBe("512 kcal");
    expect(kcal(0.2)).toBe("0 kcal");
  });

  it("shows macros of 10 g and more to the gram", () => {
    expect(grams(19.894)).toBe("20 g");
    expect(grams(82.768)).toBe("83 g");
    expect(grams(10)).toBe("10 g");
  });

  it("shows macros under 10 g to a tenth, and 9.96 as 10 g", () => {
    expect(grams(9.368)).toBe("9.4 g");
    expect(grams(4.25)).toBe("4.3 g");
    expect(grams(9.96)).toBe("10 g");
    expect(grams(0.5)).toBe("0.5 g");
  });

  it("shows traces as <0.5 g and none as 0 g", () => {
    expect(grams(0.3)).toBe("<0.5 g");
    expect(roundMacro(0.49)).toBeNull();
    expect(grams(0)).toBe("0 g");
  });

  it("rounds decimal halves that binary fractions put just below", () => {
    // 1.005 is 1.00499999999999989… in binary; people expect 1.01.
    expect(roundTo(1.005, 2)).toBe(1.01);
    expect(roundTo(2.675, 2)).toBe(2.68);
  });
});
