import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { roundLoad, roundToStep } from "./round";

describe("rounding to loadable weights", () => {
  it("rounds to the nearest step with ties toward the lighter load", () => {
    expect(roundToStep(23, 2, 2)).toBe(22);
    expect(roundToStep(23.1, 2, 2)).toBe(24);
    expect(roundToStep(3.75, 2.5, 0)).toBe(2.5);
  });

  it("never goes below the lightest dumbbell or stack plate", () => {
    expect(roundToStep(0.4, 2, 2)).toBe(2);
    expect(roundToStep(-10, 5, 5)).toBe(5);
  });

  it("keeps decimal steps free of floating-point residue", () => {
    expect(roundToStep(82.49, 2.5, 0)).toBe(82.5);
    expect(roundToStep(0.3, 0.1, 0)).toBe(0.3);
  });

  it("is never further than half a step from the target above the minimum", () => {
    fc.assert(
      fc.property(fc.constantFrom(0.5, 1, 1.25, 2, 2.5, 5, 10), fc.double({ min: 0, max: 500, noNaN: true }), (step, target) => {
        const r = roundToStep(target, step, 0);
        expect(Math.abs(r - target)).toBeLessThanOrEqual(step / 2 + 1e-9);
        expect(Math.abs(r / step - Math.round(r / step))).toBeLessThan(1e-9);
      }),
    );
  });

  it("rounds barbell loads with plates and other loads by step", () => {
    expect(roundLoad(83, { kind: "barbell", bar: 20, plates: [25, 20, 15, 10, 5, 2.5, 1.25] })).toEqual({ load: 82.5, perSide: [25, 5, 1.25], beyondPlates: false });
    expect(roundLoad(31, { kind: "step", step: 5, min: 5 })).toEqual({ load: 30, perSide: null, beyondPlates: false });
  });
});
