import { describe, expect, it } from "vitest";
import { set } from "./fixtures";
import { isOffTarget } from "./targets";

describe("sets far off target", () => {
  it("flags a work set more than 20 % short of the planned reps", () => {
    expect(isOffTarget(set({ plannedReps: 5, reps: 3 }))).toBe(true);
    expect(isOffTarget(set({ plannedReps: 5, reps: 4 }))).toBe(false);
    expect(isOffTarget(set({ plannedReps: 10, reps: 7 }))).toBe(true);
    expect(isOffTarget(set({ plannedReps: 10, reps: 8 }))).toBe(false);
  });

  it("never flags warm-ups, undone or timed sets", () => {
    expect(isOffTarget(set({ kind: "warmup", reps: 0 }))).toBe(false);
    expect(isOffTarget(set({ done: false, reps: 0 }))).toBe(false);
    expect(isOffTarget(set({ plannedReps: null, reps: 0 }))).toBe(false);
  });
});
