/**
 * Week-to-week progression and deload weeks.
 *
 * Semantics (k = week of the block, counted from 1; every step is multiplied by k − 1):
 * - `+2.5kg/wk` (load step): adds (k − 1) × step to the week-1 target before rounding. A step
 *   written in the other unit is converted exactly first.
 * - `+5%/wk` (percent step): on a `@N%` line adds percentage points of 1RM, so week k works at
 *   (N + 5(k − 1)) %; on any other line (fixed load, RIR/RPE) it grows the week-1 load by
 *   5 % of itself per week: load × (1 + 0.05(k − 1)).
 * - `+1rep/wk` (rep step): adds (k − 1) reps to both ends of a range (6-8 → 7-9 in week 2) and
 *   to the floor of an AMRAP set. On RIR/RPE lines the load is worked from the new lower end,
 *   so it falls a little as reps rise at the same effort. Reps never drop below 1.
 * - Deload weeks keep their place in the count (week 4 of a block still adds 3 steps), then
 *   take {@link DELOAD.loadFactor} of the load and {@link DELOAD.setsFactor} of the sets,
 *   rounded up, at least one. 90 % load and 60 % of the sets is common practice, no source.
 *
 * @example
 * const p = weekProgression([{ kind: "load", mass: { value: 2.5, unit: "kg" } }], 3, "kg", false);
 * p.addLoad; // 5 (week 3 adds two steps)
 */
import type { Progression, Unit } from "../notation/model";
import { massIn } from "./units";

export const DELOAD = { loadFactor: 0.9, setsFactor: 0.6 } as const;

export interface WeekProgression {
  /** Mass to add to the target, in the athlete's unit. */
  addLoad: number;
  /** Percentage points of 1RM to add on a %-based line. */
  addPercentPoints: number;
  /** Multiplier on a computed or fixed load (percent steps on non-% lines). */
  loadFactor: number;
  /** Reps to add to both ends of the range. */
  addReps: number;
}

/**
 * What `progression` adds in `weekOfBlock` (1-based).
 * @example weekProgression([{ kind: "percent", value: 5 }], 2, "kg", true).addPercentPoints; // 5
 */
export function weekProgression(progression: readonly Progression[], weekOfBlock: number, unit: Unit, percentLine: boolean): WeekProgression {
  const n = Math.max(0, weekOfBlock - 1);
  const out: WeekProgression = { addLoad: 0, addPercentPoints: 0, loadFactor: 1, addReps: 0 };
  for (const p of progression) {
    if (p.kind === "load") out.addLoad += massIn(p.mass, unit) * n;
    else if (p.kind === "reps") out.addReps += p.value * n;
    else if (percentLine) out.addPercentPoints += p.value * n;
    else out.loadFactor += (p.value / 100) * n;
  }
  return out;
}

/**
 * Sets in a deload week: 60 % of the written sets rounded up, never fewer than one.
 * @example deloadSets(4); // 3
 */
export function deloadSets(sets: number): number {
  if (sets <= 0) return 0;
  return Math.max(1, Math.ceil(sets * DELOAD.setsFactor - 1e-9));
}
