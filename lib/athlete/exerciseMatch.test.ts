import { describe, expect, it } from "vitest";
import { CATALOGUE } from "../exercises/catalogue";
import { exerciseMatcher, unknownExerciseMessage } from "./exerciseMatch";

const builtIn = CATALOGUE.flatMap((e) => [e.name, ...e.aliases].map((name) => ({ name, exercise: e.name })));
const library = [
  { name: "safety bar squat", exercise: "safety bar squat" },
  { name: "SSB", exercise: "safety bar squat" },
];
const match = exerciseMatcher([...library, ...builtIn]);

describe("exercise matcher", () => {
  it("files an alias under the exercise's own name and the load engine's key", () => {
    expect(match("Squat")).toEqual({ ok: true, exercise: "back squat", key: "back-squat" });
    expect(match("  back-squat ")).toEqual({ ok: true, exercise: "back squat", key: "back-squat" });
  });

  it("knows the coach's own exercises and their aliases", () => {
    expect(match("ssb")).toEqual({ ok: true, exercise: "safety bar squat", key: "safety bar squat" });
  });

  it("suggests the nearest spellings for a typo", () => {
    const r = match("bench pres");
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.suggestions[0]).toBe("bench press");
  });

  it("suggests names containing a partial word when nothing is spelled close", () => {
    const r = match("curl");
    expect(r.ok ? [] : r.suggestions).toEqual(expect.arrayContaining(["db curl"]));
    expect(r.ok ? [] : r.suggestions.every((s) => s.includes("curl"))).toBe(true);
  });

  it("shows suggestions as the names are written, not in their comparison form", () => {
    const r = match("pul up");
    expect(r.ok ? [] : r.suggestions).toContain("pull-up");
  });

  it("suggests nothing for an empty or unrelated name", () => {
    expect(match("")).toEqual({ ok: false, suggestions: [] });
    expect(match("zzzzqqqq")).toEqual({ ok: false, suggestions: [] });
  });

  it("writes a message with the suggestions joined in plain English", () => {
    expect(unknownExerciseMessage("x", ["a", "b", "c"])).toBe("“x” is not a known exercise — did you mean a, b or c?");
    expect(unknownExerciseMessage("x", ["a"])).toBe("“x” is not a known exercise — did you mean a?");
    expect(unknownExerciseMessage("x", [])).toMatch(/add it to the exercise library/);
  });
});
