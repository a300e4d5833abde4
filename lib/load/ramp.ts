/**
 * Warm-up ramps: lighter sets before the first working set.
 *
 * Each step's load is its percentage of the first working set's (already rounded) load,
 * rounded with the same equipment rule, so it is never below the empty bar and never above the
 * working load. Steps over 100 % are held at the working load.
 *
 * Default reps, when the coach wrote none, fall as the load rises (common practice; in line
 * with the NSCA 1RM-testing protocol's light set of 5–10 reps then 3–5 then 2–3, and Abad et al.
 * 2011, J Strength Cond Res 25(8), 8 reps at ~50 % then 3 at 70 %):
 * up to 50 % → 8, up to 65 % → 5, up to 80 % → 3, up to 90 % → 2, above → 1.
 *
 * @example
 * warmupRamp([{ percent: 50, reps: null }, { percent: 85, reps: null }], 100, { kind: "step", step: 2.5, min: 0 });
 * // [{ percent: 50, reps: 8, load: 50, perSide: null }, { percent: 85, reps: 1, load: 85, perSide: null }]
 */
import type { RampStep } from "../notation/model";
import { roundLoad, type RoundingRule } from "./round";

export const DEFAULT_RAMP_REPS: readonly (readonly [number, number])[] = [
  [50, 8],
  [65, 5],
  [80, 3],
  [90, 2],
  [Infinity, 1],
];

/** @example defaultRampReps(70); // 3 */
export function defaultRampReps(percent: number): number {
  for (const [upTo, reps] of DEFAULT_RAMP_REPS) if (percent <= upTo) return reps;
  return 1;
}

export interface RampSet {
  percent: number;
  reps: number;
  load: number | null;
  perSide: number[] | null;
}

/**
 * The warm-up sets for a working load (null when the working load is unknown: the steps are
 * kept with empty loads so the athlete still sees reps and percentages).
 * @example warmupRamp([{ percent: 40, reps: 5 }], 40, { kind: "barbell", bar: 20, plates: [5] })[0].load; // 20
 */
export function warmupRamp(steps: readonly RampStep[], workLoad: number | null, rule: RoundingRule): RampSet[] {
  return steps.map((step) => {
    const percent = Math.min(100, Math.max(0, Number.isFinite(step.percent) ? step.percent : 0));
    const reps = step.reps !== null && step.reps > 0 ? step.reps : defaultRampReps(percent);
    if (workLoad === null) return { percent: step.percent, reps, load: null, perSide: null };
    const r = roundLoad((workLoad * percent) / 100, rule);
    // The working load is itself a rounded load, so holding at it keeps the set loadable.
    if (r.load > workLoad) return { percent: step.percent, reps, load: workLoad, perSide: roundLoad(workLoad, rule).perSide };
    return { percent: step.percent, reps, load: r.load, perSide: r.perSide };
  });
}
