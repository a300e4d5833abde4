import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { defaultRampReps, warmupRamp } from "./ramp";
import type { RoundingRule } from "./round";

const KG_BAR: RoundingRule = { kind: "barbell", bar: 20, plates: [25, 20, 15, 10, 5, 2.5, 1.25] };

describe("warm-up ramp", () => {
  it("works each step from the first working load and rounds it to plates", () => {
    const r = warmupRamp([{ percent: 50, reps: 5 }, { percent: 70, reps: 3 }, { percent: 85, reps: 1 }], 100, KG_BAR);
    expect(r.map((s) => s.load)).toEqual([50, 70, 85]);
    expect(r[0].perSide).toEqual([15]);
  });

  it("never goes below the empty bar", () => {
    expect(warmupRamp([{ percent: 30, reps: 5 }], 40, KG_BAR)[0].load).toBe(20);
  });

  it("lowers default reps as the load rises", () => {
    // Common practice; NSCA 1RM protocol (5–10, then 3–5, then 2–3) and Abad et al. 2011 (8 at 50 %, 3 at 70 %).
    expect([40, 50, 60, 70, 85, 95].map(defaultRampReps)).toEqual([8, 8, 5, 3, 2, 1]);
    const reps = warmupRamp([30, 50, 60, 70, 80, 90, 95].map((p) => ({ percent: p, reps: null })), 100, KG_BAR).map((s) => s.reps);
    for (let i = 1; i < reps.length; i++) expect(reps[i]).toBeLessThanOrEqual(reps[i - 1]);
  });

  it("keeps written reps over the default", () => {
    expect(warmupRamp([{ percent: 50, reps: 10 }], 100, KG_BAR)[0].reps).toBe(10);
  });

  it("keeps the steps without loads when the working load is unknown", () => {
    expect(warmupRamp([{ percent: 60, reps: null }], null, KG_BAR)).toEqual([{ percent: 60, reps: 5, load: null, perSide: null }]);
  });

  it("never exceeds the working load, whatever the percentages", () => {
    const rules: fc.Arbitrary<RoundingRule> = fc.oneof(
      fc.constant(KG_BAR),
      fc.constant<RoundingRule>({ kind: "barbell", bar: 45, plates: [45, 35, 25, 10, 5, 2.5] }),
      fc.constantFrom(1, 2, 2.5, 5).chain((step) => fc.record({ kind: fc.constant("step" as const), step: fc.constant(step), min: fc.constantFrom(0, step) })),
    );
    fc.assert(
      fc.property(rules, fc.double({ min: 0, max: 400, noNaN: true }), fc.array(fc.integer({ min: -20, max: 150 }), { maxLength: 6 }), (rule, target, percents) => {
        // The working load is itself rounded, as it is in a session.
        const work = warmupRamp([{ percent: 100, reps: 1 }], target, rule)[0].load!;
        for (const s of warmupRamp(percents.map((p) => ({ percent: p, reps: null })), work, rule)) expect(s.load!).toBeLessThanOrEqual(work + 1e-9);
      }),
    );
  });
});
