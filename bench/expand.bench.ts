/**
 * Expansion speed: a 12-week programme, 5 days a week, 8 exercises a day (mixed %, RIR, RPE,
 * fixed and bodyweight lines, ramps, substitutes, rotations), for one athlete and for 100.
 * Target: one athlete ≤ 5 ms once warm.
 */
import { performance } from "node:perf_hooks";
import { expandProgramme } from "../lib/load/index";
import type { Exercise } from "../lib/notation/model";
import type { AthleteProfile } from "../lib/athlete/profile";
import { block, day, exercise, kgAthlete, lbAthlete, programme } from "../lib/load/fixtures/build";

const lines: Exercise[] = [
  exercise({ variations: ["back squat"], sets: 4, intensity: { kind: "percent", value: 75 }, progression: [{ kind: "load", mass: { value: 2.5, unit: "kg" } }], ramp: [{ percent: 40, reps: 8 }, { percent: 60, reps: 5 }, { percent: 80, reps: 2 }] }),
  exercise({ variations: ["bench press"], sets: 4, reps: { kind: "reps", min: 5, max: 7, amrap: false }, intensity: { kind: "rir", value: 2 }, ramp: [{ percent: 50, reps: null }, { percent: 70, reps: null }, { percent: 85, reps: null }] }),
  exercise({ variations: ["pull-up", "chin-up"], rotateWeeks: 2, sets: 3, reps: { kind: "reps", min: 6, max: 10, amrap: false }, load: { kind: "bodyweight", plus: null } }),
  exercise({ variations: ["romanian deadlift"], sets: 3, reps: { kind: "reps", min: 8, max: 8, amrap: false }, intensity: { kind: "rpe", value: 8 } }),
  exercise({ variations: ["cable row"], sets: 3, reps: { kind: "reps", min: 10, max: 12, amrap: false }, intensity: { kind: "rir", value: 1 }, substitutes: ["machine row", "dumbbell row"] }),
  exercise({ variations: ["lateral raise"], sets: 3, reps: { kind: "reps", min: 15, max: 15, amrap: false }, load: { kind: "fixed", mass: { value: 6, unit: "kg" } }, progression: [{ kind: "reps", value: 1 }] }),
  exercise({ variations: ["deadlift"], sets: 3, reps: { kind: "reps", min: 5, max: 5, amrap: true }, intensity: { kind: "percent", value: 80 }, progression: [{ kind: "percent", value: 2.5 }] }),
  exercise({ variations: ["plank"], sets: 3, reps: { kind: "time", seconds: 45 } }),
];

const week = ["mon", "tue", "wed", "thu", "fri"] as const;
const prog = programme([
  block(week.map((d) => day(lines, { name: d, weekday: d })), { name: "Accumulate", weeks: 4, deloadWeeks: [4] }),
  block(week.map((d) => day(lines, { name: d, weekday: d })), { name: "Intensify", weeks: 4, deloadWeeks: [4] }),
  block(week.map((d) => day(lines, { name: d, weekday: d })), { name: "Realise", weeks: 4 }),
]);

const athletes: AthleteProfile[] = Array.from({ length: 100 }, (_, i) =>
  i % 3 === 2
    ? lbAthlete({ name: `A${i}`, maxes: { squat: 225 + i * 2, bench: 155 + i, deadlift: 275 + i * 3, rdl: 200 + i } })
    : kgAthlete({
        name: `A${i}`,
        plates: i % 2 ? [25, 20, 15, 10, 5, 2.5, 1.25] : [{ weight: 20, pairs: 4 }, { weight: 10, pairs: 2 }, { weight: 5, pairs: 2 }, { weight: 2.5, pairs: 1 }, { weight: 1.25, pairs: 1 }],
        maxes: { squat: 100 + i, "bench press": 70 + i / 2, deadlift: 120 + i, rdl: 90 + i, "cable row": 60 },
      }),
);

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

function time(runs: number, f: () => void): number {
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const a = performance.now();
    f();
    t.push(performance.now() - a);
  }
  return median(t);
}

export default async function bench(): Promise<void> {
  const opts = { start: "2027-01-04" };
  const one = () => expandProgramme(prog, athletes[0], opts);
  const r = one();
  const sets = r.sessions.reduce((n, s) => n + s.exercises.reduce((m, e) => m + e.sets.length, 0), 0);
  for (let i = 0; i < 100; i++) one(); // warm the JIT and the plate tables
  const single = time(200, one);
  const many = time(10, () => {
    for (const a of athletes) expandProgramme(prog, a, opts);
  });
  const rows = [
    ["case", "median", "target", "ok"],
    [`1 athlete, ${r.sessions.length} sessions, ${sets} sets`, `${single.toFixed(2)} ms`, "≤ 5 ms", single <= 5 ? "yes" : "NO"],
    ["100 athletes", `${many.toFixed(1)} ms`, "(reported)", ""],
  ];
  const w = rows[0].map((_, c) => Math.max(...rows.map((row) => row[c].length)));
  for (const row of rows) console.log(row.map((cell, c) => cell.padEnd(w[c])).join("  "));
}
