import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { getISOWeek, getISOWeekYear } from "date-fns";
import { expandProgramme, variationFor } from "./expand";
import { block, day, exercise, kgAthlete, lbAthlete, programme } from "./fixtures/build";
import { arbitraryProgramme } from "./fixtures/arbitrary";
import { readdirSync, readFileSync } from "node:fs";
import { parseProgramme } from "../notation/index";
import { parseAthleteProfile, type AthleteProfile } from "../athlete/profile";

const local = (s: string) => {
  const [y, m, d] = s.split("-").map(Number);
  return new Date(y, m - 1, d);
};

describe("expanding a programme", () => {
  const squat = exercise({ line: 5, variations: ["back squat"], sets: 4, intensity: { kind: "percent", value: 75 }, progression: [{ kind: "load", mass: { value: 2.5, unit: "kg" } }] });
  const p = programme([
    block([day([squat], { name: "Lower", weekday: "thu", line: 4 }), day([exercise({ line: 8 })], { name: "Upper", line: 7, warmups: ["arm circles"] })], { name: "Accumulate", weeks: 4, deloadWeeks: [4] }),
  ]);
  const athlete = kgAthlete({ maxes: { squat: 120, "bench press": 100 } });

  it("dates each session and labels its ISO week like date-fns", () => {
    const { sessions } = expandProgramme(p, athlete, { start: "2026-12-28", days: ["mon"] });
    expect(sessions.map((s) => s.date)).toEqual(["2026-12-28", "2026-12-31", "2027-01-04", "2027-01-07", "2027-01-11", "2027-01-14", "2027-01-18", "2027-01-21"]);
    for (const s of sessions) {
      // ISO 8601 week numbering, date-fns as the reference.
      const d = local(s.date);
      expect(s.isoWeek).toBe(`${getISOWeekYear(d)}-W${String(getISOWeek(d)).padStart(2, "0")}`);
    }
  });

  it("adds (k − 1) load steps and deloads week 4", () => {
    const { sessions } = expandProgramme(p, athlete, { start: "2027-01-04" });
    const lower = sessions.filter((s) => s.day === "Lower");
    // 75 % of 120 = 90; +2.5 kg per week; week 4 is a deload: (90 + 7.5) × 0.9 = 87.75 → 87.5, 3 of 4 sets.
    expect(lower.map((s) => s.exercises[0].sets.map((x) => x.load))).toEqual([[90, 90, 90, 90], [92.5, 92.5, 92.5, 92.5], [95, 95, 95, 95], [87.5, 87.5, 87.5]]);
    expect(lower.map((s) => s.deload)).toEqual([false, false, false, true]);
  });

  it("carries the fields the preview and cards need", () => {
    const { sessions } = expandProgramme(p, athlete, { start: "2027-01-04" });
    const upper = sessions.find((s) => s.day === "Upper")!;
    expect(upper).toMatchObject({ block: "Accumulate", week: 1, weekInProgramme: 1, units: "kg", warmupNotes: ["arm circles"], dayLine: 7 });
    expect(upper.exercises[0]).toMatchObject({ name: "bench press", line: 8, exerciseId: "bench-press", equipment: "barbell", label: null, cue: null });
  });

  it("counts rotations from the programme's first week across blocks", () => {
    const rot = exercise({ variations: ["pull-up", "chin-up"], rotateWeeks: 2 });
    const two = programme([block([day([rot], { weekday: "mon" })], { weeks: 3 }), block([day([rot], { weekday: "mon" })], { weeks: 3 })]);
    const { sessions } = expandProgramme(two, athlete, { start: "2027-01-04" });
    expect(sessions.map((s) => s.exercises[0].name)).toEqual(["pull-up", "pull-up", "chin-up", "chin-up", "pull-up", "pull-up"]);
    expect(variationFor(5, null, 3)).toBe(1);
  });

  it("gives substitutes their own loads from their own maxes", () => {
    const ex = exercise({ variations: ["bench press"], intensity: { kind: "percent", value: 80 }, substitutes: ["dumbbell bench press", "machine chest press"] });
    const { sessions } = expandProgramme(programme([block([day([ex], { weekday: "mon" })])]), kgAthlete({ maxes: { bench: 100, "db bench press": 36 } }), { start: "2027-01-04" });
    const [db, machine] = sessions[0].exercises[0].substitutes;
    // 80 % of 36 = 28.8 → 28 on 2 kg dumbbell steps.
    expect(db).toMatchObject({ name: "dumbbell bench press", equipment: "dumbbell", max: 36, loadNote: null });
    expect(db.sets[0].load).toBe(28);
    expect(machine).toMatchObject({ max: null, loadNote: "no 1RM on file for machine chest press" });
  });

  it("finds a max filed under a coach's own exercise for any of its aliases, and rounds to its equipment", () => {
    const ex = exercise({ variations: ["ssb"], intensity: { kind: "percent", value: 75 } });
    const p1 = programme([block([day([ex], { weekday: "mon" })])]);
    const athlete1 = kgAthlete({ maxes: { "safety bar squat": 130 } });
    const library = [
      { name: "safety bar squat", exercise: "safety bar squat", equipment: "barbell" as const },
      { name: "ssb", exercise: "safety bar squat", equipment: "barbell" as const },
    ];
    const withLibrary = expandProgramme(p1, athlete1, { start: "2027-01-04", library }).sessions[0].exercises[0];
    // 75 % of 130 = 97.5 kg, loadable on a 20 kg bar: (97.5 − 20) / 2 = 38.75 a side (common practice: plates per side = (load − bar) / 2).
    expect(withLibrary).toMatchObject({ name: "ssb", equipment: "barbell", max: 130 });
    expect(withLibrary.sets[0].load).toBe(97.5);
    expect(withLibrary.sets[0].perSide?.reduce((a, b) => a + b, 0)).toBe(38.75);
    // Without the library the alias means nothing: no max, no load, and no number invented.
    const without = expandProgramme(p1, athlete1, { start: "2027-01-04" }).sessions[0].exercises[0];
    expect(without).toMatchObject({ max: null, equipment: "other" });
    expect(without.sets[0].load).toBeNull();
  });

  it("stops after --weeks and reports a bad start date instead of throwing", () => {
    expect(expandProgramme(p, athlete, { start: "2027-01-04", weeks: 1 }).sessions).toHaveLength(2);
    const bad = expandProgramme(p, athlete, { start: "2027-02-30" });
    expect(bad.sessions).toEqual([]);
    expect(bad.diagnostics[0]).toMatchObject({ severity: "error", code: "bad-start" });
    const days = expandProgramme(p, athlete, { start: "2027-01-04", days: ["monday" as never] });
    expect(days.diagnostics[0]).toMatchObject({ severity: "error", code: "bad-days" });
  });

  it("never throws on any model and keeps its promises", () => {
    fc.assert(
      fc.property(arbitraryProgramme, fc.constantFrom(kgAthlete({ maxes: { squat: 140, bench: 100, rdl: 120 } }), lbAthlete({ maxes: { "bench press": 225 }, plates: [{ weight: 45, pairs: 3 }, { weight: 10, pairs: 1 }, { weight: 5, pairs: 1 }] })), fc.option(fc.subarray(["mon", "wed", "fri"] as const)), (prog, who, days) => {
        const { sessions, diagnostics } = expandProgramme(prog, who, { start: "2027-01-04", ...(days ? { days: [...days] } : {}) });
        for (let i = 1; i < sessions.length; i++) expect(sessions[i].date >= sessions[i - 1].date).toBe(true);
        for (const s of sessions) {
          for (const ex of s.exercises) {
            for (const out of [ex, ...ex.substitutes]) {
              const firstWork = out.sets.find((x) => x.kind === "work");
              for (const set of out.sets) {
                expect(set.load === null || Number.isFinite(set.load)).toBe(true);
                if (set.kind === "warmup" && set.load !== null && firstWork?.load != null) expect(set.load).toBeLessThanOrEqual(firstWork.load);
                if (set.perSide && set.load !== null) expect(set.perSide.reduce((a, b) => a + b, 0)).toBeCloseTo((set.load - who.bar) / 2, 9);
              }
            }
          }
        }
        for (const d of diagnostics) expect(d.message.length).toBeGreaterThan(0);
      }),
      { numRuns: 300 },
    );
  });

  const root = new URL("../../", import.meta.url);
  const profile = (f: string): AthleteProfile => {
    const r = parseAthleteProfile(JSON.parse(readFileSync(new URL(`lib/load/fixtures/${f}`, root), "utf8")));
    if (!r.ok) throw new Error(r.errors.join("; "));
    return r.profile;
  };

  it("expands every sample template for kg and lb gyms without errors", () => {
    const files = readdirSync(new URL("templates/", root)).filter((f) => f.endsWith(".iq"));
    expect(files.length).toBeGreaterThan(0);
    for (const f of files) {
      const { programme: prog, diagnostics } = parseProgramme(readFileSync(new URL(`templates/${f}`, root), "utf8"));
      expect(diagnostics.filter((d) => d.severity === "error"), f).toEqual([]);
      for (const who of ["kg-gym.json", "lb-gym.json", "kg-limited-plates.json"].map(profile)) {
        const r = expandProgramme(prog, who, { start: "2027-01-04" });
        expect(r.diagnostics.filter((d) => d.severity === "error"), f).toEqual([]);
        expect(r.sessions.length, f).toBe(prog.blocks.reduce((n, b) => n + b.weeks * b.days.length, 0));
      }
    }
  });

  it("never throws on whatever the notation makes of random text", () => {
    const pieces = ["block Base 3w deload w3", "block X 0w", "day A mon", "day B", "day C thu", "  warmup \"bike\"", "  squat 3x5 @75% +2.5kg/wk ramp 50/70/85%", "  bench press 4x5-7 @2rir or dumbbell bench press",
      "  {pull-up | chin-up} 3x6-10 bw rotate 2w", "  plank 3x30s", "  lateral raise 3x15 6kg +1rep/wk", "  deadlift 1x10+ @rpe9.5", "  curl 3x12 175lb", "  dip 3x8 bw+10kg", "units: lb", "model: nsca", "round: 1", "  squat 3x40 @0rir", "  x 200x5 @150%"];
    fc.assert(
      fc.property(fc.array(fc.constantFrom(...pieces), { maxLength: 14 }), fc.constantFrom("kg-gym.json", "lb-gym.json", "kg-limited-plates.json"), (lines, f) => {
        const { programme: prog } = parseProgramme(lines.join("\n"));
        const r = expandProgramme(prog, profile(f), { start: "2027-01-04", days: ["tue", "fri"] });
        expect(Array.isArray(r.sessions)).toBe(true);
      }),
      { numRuns: 200 },
    );
  });
});
