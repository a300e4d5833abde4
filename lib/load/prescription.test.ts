import { describe, expect, it } from "vitest";
import type { Exercise, Programme } from "../notation/model";
import type { AthleteProfile } from "../athlete/profile";
import { createContext, prescribe } from "./prescription";
import { exercise, kgAthlete, lbAthlete, programme } from "./fixtures/build";
import type { ExpandDiagnostic } from "./types";

function run(ex: Exercise, athlete: AthleteProfile, over: Partial<Programme> = {}, week = { weekOfBlock: 1, deload: false }, name = ex.variations[0]) {
  const diagnostics: ExpandDiagnostic[] = [];
  const ctx = createContext(programme([], over), athlete, (d) => diagnostics.push(d));
  return { ...prescribe(ctx, ex, name, week), diagnostics };
}
const work = (r: { sets: { kind: string }[] }) => r.sets.filter((s) => s.kind === "work") as ReturnType<typeof run>["sets"];

describe("working loads from effort targets", () => {
  const bench = exercise({ sets: 4, reps: { kind: "reps", min: 5, max: 7, amrap: false }, intensity: { kind: "rir", value: 2 } });

  it("works 5-7 @2rir from 7 reps to failure with Brzycki and rounds to plates", () => {
    const r = run(bench, kgAthlete({ maxes: { "bench press": 100 } }));
    // Brzycki 1993: (37 − 7)/36 = 0.8333 → 83.33 kg → nearest on 1.25 kg change plates: 82.5 (tie rules not needed).
    expect(work(r).map((s) => s.load)).toEqual([82.5, 82.5, 82.5, 82.5]);
    expect(work(r)[0]).toMatchObject({ repsMin: 5, repsMax: 7, rir: 2, percent1RM: 0.8333, perSide: [25, 5, 1.25] });
  });

  it("uses the programme's model: Epley and the NSCA table", () => {
    const athlete = kgAthlete({ maxes: { "bench press": 100 } });
    // Epley 1985: 1/(1 + 7/30) = 0.8108 → 81.08 → 80 kg.
    expect(work(run(bench, athlete, { model: "epley" }))[0]).toMatchObject({ load: 80, percent1RM: 0.8108 });
    // NSCA table (Essentials of S&C, 4th ed., ch. 17): 7 reps → 83 % → 83 → 82.5 kg.
    expect(work(run(bench, athlete, { model: "nsca" }))[0]).toMatchObject({ load: 82.5, percent1RM: 0.83 });
  });

  it("reads RPE 8 as 2 reps in reserve", () => {
    // Zourdos et al. 2016: RPE 8 = 2 RIR, so the load equals the @2rir load.
    const r = run({ ...bench, intensity: { kind: "rpe", value: 8 } }, kgAthlete({ maxes: { bench: 100 } }));
    expect(work(r)[0]).toMatchObject({ load: 82.5, rir: 2 });
  });

  it("leaves the load empty and keeps the effort when no max is on file", () => {
    const r = run(bench, kgAthlete());
    expect(work(r)[0]).toMatchObject({ load: null, perSide: null, rir: 2 });
    expect(r.loadNote).toBe("no 1RM on file for bench press");
    expect(r.diagnostics.map((d) => d.code)).toEqual(["no-max"]);
  });

  it("warns past the trusted range and refuses outside the model's domain", () => {
    const athlete = kgAthlete({ maxes: { "bench press": 100 } });
    const long = run({ ...bench, reps: { kind: "reps", min: 15, max: 15, amrap: false } }, athlete);
    expect(long.diagnostics.map((d) => d.code)).toEqual(["reps-untrusted"]);
    expect(work(long)[0].load).not.toBeNull();
    // The NSCA table stops at 15 reps; 17 to failure has no value.
    const nsca = run({ ...bench, reps: { kind: "reps", min: 15, max: 15, amrap: false } }, athlete, { model: "nsca" });
    expect(work(nsca)[0].load).toBeNull();
    expect(nsca.diagnostics.map((d) => d.code)).toEqual(["reps-outside-model"]);
  });

  it("has no load for an effort target on a timed set", () => {
    const r = run(exercise({ variations: ["farmer's walk"], reps: { kind: "time", seconds: 30 }, intensity: { kind: "rir", value: 2 } }), kgAthlete({ maxes: { "farmers walk": 100 } }));
    expect(work(r)[0]).toMatchObject({ seconds: 30, repsMin: null, load: null });
    expect(r.loadNote).toMatch(/timed set/);
  });
});

describe("percentage, fixed and bodyweight loads", () => {
  it("takes N % of the max found through an alias", () => {
    const r = run(exercise({ variations: ["Back Squat"], intensity: { kind: "percent", value: 75 } }), kgAthlete({ maxes: { squat: 120 } }));
    expect(work(r)[0]).toMatchObject({ load: 90, percent1RM: 0.75, perSide: [25, 10] });
  });

  it("converts a kg load for a pound gym with 1 lb = 0.45359237 kg, then rounds in pounds", () => {
    // NIST SP 811: 80 kg = 176.37 lb → nearest 5 lb step on a 45 lb bar: 175.
    const r = run(exercise({ variations: ["deadlift"], load: { kind: "fixed", mass: { value: 80, unit: "kg" } } }), lbAthlete());
    expect(work(r)[0]).toMatchObject({ load: 175, perSide: [45, 10, 10] });
  });

  it("rounds a pound load for a kg gym after converting", () => {
    // NIST SP 811: 135 lb = 61.235 kg; with 1.25 kg plates the bar makes 60 or 62.5, and 60 is nearer.
    const r = run(exercise({ variations: ["squat"], load: { kind: "fixed", mass: { value: 135, unit: "lb" } } }), kgAthlete());
    expect(work(r)[0].load).toBe(60);
  });

  it("rounds dumbbells and machines to their own steps", () => {
    const db = run(exercise({ variations: ["lateral raise"], load: { kind: "fixed", mass: { value: 7, unit: "kg" } } }), kgAthlete({ dumbbellStep: 2 }));
    expect(work(db)[0]).toMatchObject({ load: 6, perSide: null });
    const machine = run(exercise({ variations: ["leg press"], intensity: { kind: "percent", value: 70 } }), kgAthlete({ machineStep: 5, maxes: { "leg press": 200 } }));
    expect(work(machine)[0].load).toBe(140);
  });

  it("rounds unknown movements to the programme step, or 2.5 kg / 5 lb", () => {
    const ex = exercise({ variations: ["zercher carry"], load: { kind: "fixed", mass: { value: 61, unit: "kg" } } });
    expect(work(run(ex, kgAthlete(), { round: 1 }))[0].load).toBe(61);
    expect(work(run(ex, kgAthlete()))[0].load).toBe(60);
    const lb = run(exercise({ variations: ["zercher carry"], load: { kind: "fixed", mass: { value: 137, unit: "lb" } } }), lbAthlete(), { round: 2.5 });
    expect(work(lb)[0].load).toBe(135);
  });

  it("marks bodyweight sets and carries the added load", () => {
    const plus = run(exercise({ variations: ["dip"], load: { kind: "bodyweight", plus: { value: 10, unit: "kg" } } }), kgAthlete());
    expect(work(plus)[0]).toMatchObject({ bodyweight: true, load: 10, perSide: null });
    const plain = run(exercise({ variations: ["pull-up"] }), kgAthlete());
    expect(work(plain)[0]).toMatchObject({ bodyweight: true, load: 0 });
  });

  it("warns when the target is beyond what the plates can make", () => {
    const r = run(exercise({ variations: ["squat"], load: { kind: "fixed", mass: { value: 200, unit: "kg" } } }), kgAthlete({ plates: [{ weight: 20, pairs: 2 }] }));
    expect(work(r)[0].load).toBe(100);
    expect(r.diagnostics.map((d) => d.code)).toEqual(["beyond-plates"]);
  });
});

describe("set structure", () => {
  it("lists one entry per set and only the last set of 10+ as AMRAP", () => {
    const r = run(exercise({ sets: 3, reps: { kind: "reps", min: 10, max: 10, amrap: true } }), kgAthlete());
    expect(r.sets.map((s) => [s.amrap, s.repsMin, s.repsMax])).toEqual([[false, 10, 10], [false, 10, 10], [true, 10, null]]);
  });

  it("puts ramp sets before the work sets, worked from the first working load", () => {
    const ex = exercise({ intensity: { kind: "percent", value: 80 }, ramp: [{ percent: 50, reps: null }, { percent: 70, reps: 3 }] });
    const r = run(ex, kgAthlete({ maxes: { "bench press": 100 } }));
    expect(r.sets.map((s) => [s.kind, s.load, s.repsMin])).toEqual([["warmup", 40, 8], ["warmup", 55, 3], ["work", 80, 5], ["work", 80, 5], ["work", 80, 5]]);
    expect(r.sets[0].percent1RM).toBe(0.4);
  });

  it("progresses a %-line by points and adds rep steps to both ends of the range", () => {
    const ex = exercise({ variations: ["squat"], reps: { kind: "reps", min: 6, max: 8, amrap: false }, intensity: { kind: "percent", value: 70 }, progression: [{ kind: "percent", value: 2.5 }, { kind: "reps", value: 1 }] });
    const r = run(ex, kgAthlete({ maxes: { squat: 100 } }), {}, { weekOfBlock: 3, deload: false });
    expect(work(r)[0]).toMatchObject({ load: 75, percent1RM: 0.75, repsMin: 8, repsMax: 10 });
  });

  it("deloads to 90 % of the load and 60 % of the sets, rounded up", () => {
    // Common practice, no source.
    const ex = exercise({ variations: ["squat"], sets: 4, intensity: { kind: "percent", value: 75 }, progression: [{ kind: "load", mass: { value: 2.5, unit: "kg" } }] });
    const r = run(ex, kgAthlete({ maxes: { squat: 120 } }), {}, { weekOfBlock: 4, deload: true });
    // Week 4 target 90 + 3 × 2.5 = 97.5; × 0.9 = 87.75 → 87.5; 4 sets × 0.6 = 2.4 → 3.
    expect(work(r).map((s) => s.load)).toEqual([87.5, 87.5, 87.5]);
  });
});

describe("substitutes", () => {
  it("keep a written load only on the same kind of equipment", () => {
    const dip = exercise({ variations: ["dip"], load: { kind: "bodyweight", plus: null } });
    const asSub = (() => {
      const diagnostics: ExpandDiagnostic[] = [];
      const ctx = createContext(programme([]), kgAthlete(), (d) => diagnostics.push(d));
      return prescribe(ctx, dip, "close-grip bench press", { weekOfBlock: 1, deload: false }, "dip");
    })();
    expect(asSub.sets[0]).toMatchObject({ bodyweight: false, load: null });
    expect(asSub.loadNote).toBe("the written load is for dip");
    const ctx = createContext(programme([]), kgAthlete(), () => {});
    expect(prescribe(ctx, dip, "chin-up", { weekOfBlock: 1, deload: false }, "dip").sets[0]).toMatchObject({ bodyweight: true, load: 0 });
  });
});
