import { describe, expect, it } from "vitest";
import { exerciseKey, exerciseResolver, normaliseExerciseName, resolveExercise } from "./resolve";

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

describe("exerciseResolver over a coach's library", () => {
  const resolve = exerciseResolver([
    { name: "safety bar squat", exercise: "safety bar squat", equipment: "barbell" },
    { name: "SSB", exercise: "safety bar squat", equipment: "barbell" },
    { name: "squat", exercise: "my squat", equipment: "machine" },
  ]);

  it("resolves the library's aliases to its exercise, keyed as a max filed under that exercise", () => {
    expect(resolve("ssb")).toEqual({ id: "safety bar squat", name: "safety bar squat", aliases: [], equipment: "barbell" });
    expect(resolve("Safety-Bar Squat")?.id).toBe(exerciseKey("safety bar squat"));
  });

  it("keeps built-in names meaning the built-in movement", () => {
    expect(resolve("squat")?.id).toBe("back-squat");
    expect(resolve("zercher carry")).toBeNull();
  });
});
