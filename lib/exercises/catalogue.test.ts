import { describe, expect, it } from "vitest";
import { CATALOGUE } from "./catalogue";
import { normaliseExerciseName } from "./resolve";

describe("exercise catalogue", () => {
  it("lists the main barbell lifts as barbell movements", () => {
    const required = ["back squat", "front squat", "bench press", "incline bench press", "overhead press", "deadlift", "romanian deadlift", "barbell row"];
    for (const name of required) {
      expect(CATALOGUE.find((x) => x.name === name)?.equipment, name).toBe("barbell");
    }
  });

  it("covers every equipment kind", () => {
    const kinds = new Set(CATALOGUE.map((x) => x.equipment));
    expect([...kinds].sort()).toEqual(["barbell", "bodyweight", "cable", "dumbbell", "machine", "other"]);
  });

  it("never gives two movements the same name or alias", () => {
    const seen = new Map<string, string>();
    for (const entry of CATALOGUE) {
      for (const n of [entry.name, ...entry.aliases]) {
        const key = normaliseExerciseName(n);
        expect(seen.get(key) ?? entry.id, `${n} is claimed twice`).toBe(entry.id);
        seen.set(key, entry.id);
      }
    }
  });

  it("uses unique kebab-case ids", () => {
    const ids = CATALOGUE.map((x) => x.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const id of ids) expect(id).toMatch(/^[a-z]+(-[a-z]+)*$/);
  });
});
