import { describe, expect, it } from "vitest";
import { exerciseKey, normaliseExerciseName, resolveExercise } from "./resolve";

describe("exercise name resolution", () => {
  it("resolves aliases to one movement", () => {
    expect(resolveExercise("squat")?.id).toBe("back-squat");
    expect(resolveExercise("incline press")?.id).toBe("incline-bench-press");
  });

  it("ignores case, spacing, hyphens and apostrophes", () => {
    expect(resolveExercise("  BENCH   Press ")?.id).toBe("bench-press");
    expect(resolveExercise("Pull Up")?.id).toBe("pull-up");
    expect(resolveExercise("pull-up")?.id).toBe("pull-up");
    expect(resolveExercise("farmers walk")?.id).toBe("farmers-walk");
    expect(normaliseExerciseName("Farmer's  Walk")).toBe("farmers walk");
  });

  it("returns null for names that are not built in", () => {
    expect(resolveExercise("zercher carry")).toBeNull();
    expect(resolveExercise("")).toBeNull();
  });

  it("gives aliases and unknown names stable keys for looking up maxes", () => {
    expect(exerciseKey("Squat")).toBe(exerciseKey("back squat"));
    expect(exerciseKey("Zercher  Squat")).toBe("zercher squat");
  });
});
