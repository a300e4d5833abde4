/**
 * Reading the plan for the logging screen: which exercise a slot is on (the
 * planned one or a listed substitute), its sets, labels, and the starting
 * values of a set — the planned reps and load.
 */
import type { ExerciseOut, SetOut, SubstituteOut } from "@/lib/load/types";
import type { SetValues, Units } from "./types";

const norm = (s: string) => s.toLowerCase().replace(/['’`]/g, "").replace(/[-_]+/g, " ").replace(/\s+/g, " ").trim();

/** The planned exercise or the substitute of that name (falls back to the planned one). */
export function variantOf(ex: ExerciseOut, name: string): SubstituteOut {
  const n = norm(name);
  if (norm(ex.name) === n) return ex;
  return ex.substitutes.find((s) => norm(s.name) === n) ?? ex;
}

/** Planned reps and load as the set starts out; an AMRAP starts at its floor, a missing load at 0. */
export function startingValues(set: SetOut): SetValues {
  return { reps: set.repsMin ?? 0, load: set.load ?? 0, rir: null, done: false };
}

/** "Warm-up 2" / "Set 3": work sets count from 1 after the warm-ups. */
export function setLabels(sets: readonly SetOut[]): string[] {
  let w = 0;
  let s = 0;
  return sets.map((x) => (x.kind === "warmup" ? `Warm-up ${++w}` : `Set ${++s}`));
}

/** Load step for the steppers: the smallest pair of change plates in common use. Common practice, no source. */
export function loadStep(units: Units, set: SetOut): number {
  if (set.bodyweight) return units === "kg" ? 2.5 : 5;
  if (set.load !== null && set.load < 20) return units === "kg" ? 1 : 2.5;
  return units === "kg" ? 2.5 : 5;
}

export function fmt(n: number): string {
  return Number.isInteger(n) ? String(n) : String(Math.round(n * 100) / 100);
}

export function mmss(seconds: number): string {
  const s = Math.max(0, Math.round(seconds));
  return `${Math.floor(s / 60)}:${String(s % 60).padStart(2, "0")}`;
}
