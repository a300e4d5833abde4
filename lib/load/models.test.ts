import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { LOAD_MODELS } from "../notation/model";
import { NSCA_TABLE, checkRepsToFailure, e1rm, percentOf1RM } from "./models";

describe("1RM models", () => {
  it("estimates 100 kg × 5 as 112.50 (Brzycki) and 116.67 (Epley)", () => {
    // Brzycki M. (1993) JOPERD 64(1):88–90: 1RM = w·36/(37 − r).
    expect(e1rm(100, 5, 0, "brzycki")).toBeCloseTo(112.5, 2);
    // Epley B. (1985) Poundage Chart: 1RM = w·(1 + r/30).
    expect(e1rm(100, 5, 0, "epley")).toBeCloseTo(116.67, 2);
  });

  it("estimates 100 kg × 10 as 133.33 in both equations", () => {
    // Brzycki 1993 and Epley 1985 agree exactly at 10 reps.
    expect(e1rm(100, 10, 0, "brzycki")).toBeCloseTo(133.33, 2);
    expect(e1rm(100, 10, 0, "epley")).toBeCloseTo(133.33, 2);
  });

  it("counts reps in reserve as reps still to failure", () => {
    // 3 reps with 2 in reserve is a 5-rep-max effort: Brzycki 1993.
    expect(e1rm(100, 3, 2, "brzycki")).toBeCloseTo(112.5, 6);
  });

  it("gives the NSCA table points exactly", () => {
    // Haff & Triplett (2016) Essentials of S&C 4th ed., ch. 17 (12 → 67 % from memory).
    const expected: Record<number, number> = { 1: 100, 2: 95, 3: 93, 4: 90, 5: 87, 6: 85, 7: 83, 8: 80, 9: 77, 10: 75, 11: 70, 12: 67, 15: 65 };
    for (const [reps, pct] of Object.entries(expected)) expect(percentOf1RM(Number(reps), "nsca")).toBeCloseTo(pct / 100, 10);
    expect(NSCA_TABLE.length).toBe(13);
  });

  it("interpolates the NSCA table linearly between listed points", () => {
    // 13 reps lies one third of the way from 12 (67 %) to 15 (65 %).
    expect(percentOf1RM(13, "nsca")).toBeCloseTo((67 - 2 / 3) / 100, 10);
    expect(percentOf1RM(5.5, "nsca")).toBeCloseTo(0.86, 10);
  });

  it("treats one rep to failure as 100 % in every model", () => {
    // A design decision (Epley alone gives 96.8 %); Brzycki 1993 gives 100 % by construction.
    for (const m of LOAD_MODELS) expect(percentOf1RM(1, m)).toBe(1);
  });

  it("matches the Epley equation from 2 reps on and bridges 1–2 reps without a jump", () => {
    expect(percentOf1RM(2, "epley")).toBeCloseTo(1 / (1 + 2 / 30), 12);
    expect(percentOf1RM(1.5, "epley")).toBeCloseTo((1 + 1 / (1 + 2 / 30)) / 2, 12);
  });

  it("refuses reps to failure outside a model's domain instead of returning a number", () => {
    // Brzycki divides by zero at 37 reps; the NSCA table stops at 15.
    expect(percentOf1RM(37, "brzycki")).toBeNull();
    expect(percentOf1RM(16, "nsca")).toBeNull();
    expect(percentOf1RM(0, "epley")).toBeNull();
    expect(e1rm(100, 40, 0, "brzycki")).toBeNull();
    expect(checkRepsToFailure(20, "brzycki")).toBe("untrusted");
    expect(checkRepsToFailure(12, "epley")).toBe("ok");
  });

  it("always falls as reps to failure rise and is the inverse of e1rm", () => {
    fc.assert(
      fc.property(fc.constantFrom(...LOAD_MODELS), fc.double({ min: 1, max: 14, noNaN: true }), fc.double({ min: 0.01, max: 1, noNaN: true }), (m, r, dr) => {
        const a = percentOf1RM(r, m)!;
        const b = percentOf1RM(r + dr, m)!;
        expect(b).toBeLessThan(a);
        expect(e1rm(100 * a, r, 0, m)).toBeCloseTo(100, 9);
      }),
    );
  });
});
