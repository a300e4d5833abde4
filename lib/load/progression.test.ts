import { describe, expect, it } from "vitest";
import { DELOAD, deloadSets, weekProgression } from "./progression";

describe("weekly progression", () => {
  it("adds (k − 1) load steps in week k and nothing in week 1", () => {
    const steps = [{ kind: "load" as const, mass: { value: 2.5, unit: "kg" as const } }];
    expect([1, 2, 3, 4].map((k) => weekProgression(steps, k, "kg", false).addLoad)).toEqual([0, 2.5, 5, 7.5]);
  });

  it("converts a load step written in pounds with 1 lb = 0.45359237 kg", () => {
    // NIST SP 811, Appendix B.
    const steps = [{ kind: "load" as const, mass: { value: 5, unit: "lb" as const } }];
    expect(weekProgression(steps, 2, "kg", false).addLoad).toBeCloseTo(2.26796185, 10);
  });

  it("adds percentage points on %-based lines and grows other loads by a share of themselves", () => {
    const steps = [{ kind: "percent" as const, value: 5 }];
    expect(weekProgression(steps, 3, "kg", true)).toMatchObject({ addPercentPoints: 10, loadFactor: 1 });
    expect(weekProgression(steps, 3, "kg", false)).toMatchObject({ addPercentPoints: 0, loadFactor: 1.1 });
  });

  it("adds reps per week", () => {
    expect(weekProgression([{ kind: "reps", value: 1 }], 4, "kg", false).addReps).toBe(3);
  });

  it("ignores nonsense week numbers below 1", () => {
    expect(weekProgression([{ kind: "reps", value: 1 }], 0, "kg", false).addReps).toBe(0);
  });

  it("keeps 60 % of the sets in a deload, rounded up, at least one", () => {
    // Common practice, no source.
    expect(DELOAD).toEqual({ loadFactor: 0.9, setsFactor: 0.6 });
    expect([1, 2, 3, 4, 5, 6].map(deloadSets)).toEqual([1, 2, 2, 3, 3, 4]);
    expect(deloadSets(0)).toBe(0);
  });
});
