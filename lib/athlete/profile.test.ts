import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { parseAthleteProfile } from "./profile";

const fixture = (name: string) => JSON.parse(readFileSync(new URL(`../load/fixtures/${name}`, import.meta.url), "utf8"));

describe("athlete profile", () => {
  it("accepts the kg and lb gym fixtures", () => {
    for (const f of ["kg-gym.json", "lb-gym.json", "kg-limited-plates.json"]) {
      const r = parseAthleteProfile(fixture(f));
      expect(r.ok, f).toBe(true);
    }
  });

  it("fills equipment steps from the unit when they are left out", () => {
    const kg = parseAthleteProfile({ name: "A", units: "kg", bar: 20, plates: [20, 10] });
    const lb = parseAthleteProfile({ name: "B", units: "lb", bar: 45, plates: [45, 25] });
    expect(kg.ok && [kg.profile.dumbbellStep, kg.profile.machineStep, kg.profile.maxes]).toEqual([2, 5, {}]);
    expect(lb.ok && [lb.profile.dumbbellStep, lb.profile.machineStep]).toEqual([5, 10]);
  });

  it("names each invalid field", () => {
    const r = parseAthleteProfile({ name: "", units: "st", bar: -1, plates: [{ weight: 20, pairs: 1.5 }], maxes: { squat: "lots" }, colour: "red" });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors).toEqual(
      expect.arrayContaining([
        "name: must not be empty",
        'units: expected "kg" or "lb"',
        "bar: must be greater than 0",
        "plates[0].pairs: expected a whole number",
        "maxes.squat: expected a number",
        'profile: unknown field "colour"',
      ]),
    );
  });

  it("points at the one bad plate in a list", () => {
    const r = parseAthleteProfile({ name: "A", units: "kg", bar: 20, plates: [20, 0, 5] });
    expect(r.ok ? [] : r.errors).toEqual(["plates[1]: must be greater than 0"]);
  });

  it("refuses a list mixing plain weights and limited pairs", () => {
    const r = parseAthleteProfile({ name: "A", units: "kg", bar: 20, plates: [20, { weight: 10, pairs: 2 }] });
    expect(r.ok ? [] : r.errors).toEqual(['plates: use either plain weights or {"weight", "pairs"} objects, not both']);
  });

  it("rejects something that is not an object", () => {
    expect(parseAthleteProfile([1, 2])).toEqual({ ok: false, errors: ["profile: expected a JSON object"] });
    expect(parseAthleteProfile(null).ok).toBe(false);
  });

  it("reports a missing required field by name", () => {
    const r = parseAthleteProfile({ name: "A", units: "kg", plates: [] });
    expect(r.ok ? [] : r.errors).toEqual(["bar: expected a number"]);
  });
});
