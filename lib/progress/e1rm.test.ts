import { describe, expect, it } from "vitest";
import { countsForE1rm, sessionBests, setE1rm } from "./e1rm";
import { set } from "./fixtures";

describe("estimated 1RM of a logged set", () => {
  it("matches the published Brzycki and Epley examples for 100 × 5 and 100 × 10", () => {
    // Brzycki M. (1993) JOPERD 64(1):88–90: 1RM = w·36/(37 − r) → 100×5 = 112.50, 100×10 = 133.33.
    expect(setE1rm(set({ load: 100, reps: 5, model: "brzycki" }))).toBeCloseTo(112.5, 2);
    expect(setE1rm(set({ load: 100, reps: 10, model: "brzycki" }))).toBeCloseTo(133.33, 2);
    // Epley B. (1985) Poundage Chart: 1RM = w·(1 + r/30) → 100×5 = 116.67, 100×10 = 133.33.
    expect(setE1rm(set({ load: 100, reps: 5, model: "epley" }))).toBeCloseTo(116.67, 2);
    expect(setE1rm(set({ load: 100, reps: 10, model: "epley" }))).toBeCloseTo(133.33, 2);
  });

  it("adds the reported reps in reserve to the reps done", () => {
    // 3 reps with 2 in reserve is a 5-rep-max effort: Brzycki 1993 gives 112.50 for 100×5.
    expect(setE1rm(set({ load: 100, reps: 3, rir: 2 }))).toBeCloseTo(112.5, 2);
  });

  it("treats a set logged without RIR as taken to failure", () => {
    expect(setE1rm(set({ rir: null }))).toBeCloseTo(setE1rm(set({ rir: 0 }))!, 10);
  });

  it("converts the estimate to the unit asked for", () => {
    // 1 lb = 0.45359237 kg exactly (NIST SP 811, App. B): 112.5 kg = 248.02 lb.
    expect(setE1rm(set({ load: 100, reps: 5 }), "lb")).toBeCloseTo(112.5 / 0.45359237, 6);
  });

  it("ignores warm-ups, undone, bodyweight, empty and past-the-trusted-range sets", () => {
    expect(countsForE1rm(set({ kind: "warmup" }))).toBe(false);
    expect(countsForE1rm(set({ done: false }))).toBe(false);
    expect(countsForE1rm(set({ bodyweight: true }))).toBe(false);
    expect(countsForE1rm(set({ reps: 0 }))).toBe(false);
    expect(countsForE1rm(set({ load: 0 }))).toBe(false);
    // Brzycki is trusted to 12 reps to failure (lib/load/models.ts; common practice, no source).
    expect(countsForE1rm(set({ reps: 10, rir: 2 }))).toBe(true);
    expect(countsForE1rm(set({ reps: 10, rir: 3 }))).toBe(false);
    expect(setE1rm(set({ reps: 15 }))).toBeNull();
  });
});

describe("best estimated 1RM per session", () => {
  it("keeps the highest set of each exercise in each session, oldest session first", () => {
    const sets = [
      set({ sessionId: "b", date: "2027-01-11", load: 105 }),
      set({ sessionId: "a", date: "2027-01-04", load: 100 }),
      set({ sessionId: "a", date: "2027-01-04", load: 100, reps: 8 }),
      set({ sessionId: "a", date: "2027-01-04", exercise: "bench press", exerciseKey: "bench-press", load: 80 }),
    ];
    const bests = sessionBests(sets, "kg");
    expect(bests.map((b) => [b.sessionId, b.exerciseKey])).toEqual([["a", "back-squat"], ["a", "bench-press"], ["b", "back-squat"]]);
    // Brzycki 1993: 100 × 8 → 100·36/29 = 124.14, above 100 × 5 → 112.5.
    expect(bests[0].e1rm).toBeCloseTo(124.14, 2);
    expect(bests[0].reps).toBe(8);
  });

  it("gives no entry for a session where no set counts", () => {
    expect(sessionBests([set({ kind: "warmup" }), set({ done: false })], "kg")).toEqual([]);
  });
});
