/**
 * Rounding a target load to what the athlete can actually lift.
 *
 * - Barbell: nearest total of bar + plates (see {@link nearestBarbellLoad}), never below the empty bar.
 * - Dumbbell, machine, cable, other: nearest multiple of the equipment's step, never below the
 *   lightest setting (`min`: one step for dumbbells and stacks, 0 for added load).
 * Ties always go to the lighter load: when two loads are equally near, the safer one wins.
 *
 * @example
 * roundLoad(83, { kind: "barbell", bar: 20, plates: [25, 20, 15, 10, 5, 2.5, 1.25] }); // { load: 82.5, perSide: [25, 5, 1.25], beyondPlates: false }
 * roundLoad(23, { kind: "step", step: 2, min: 2 });                                   // { load: 22, perSide: null, beyondPlates: false }
 */
import { nearestBarbellLoad, type PlateSet } from "./plates";

export type RoundingRule =
  | { kind: "barbell"; bar: number; plates: PlateSet }
  | { kind: "step"; step: number; min: number };

export interface RoundedLoad {
  load: number;
  /** Plates on each side for a barbell, heaviest first; null for other equipment. */
  perSide: number[] | null;
  /** The target was heavier than the athlete's plates can make. */
  beyondPlates: boolean;
}

const EPS = 1e-9;

/**
 * Nearest multiple of `step` to `target`, ties to the lighter, never below `min`.
 * @example roundToStep(3.75, 2.5, 0); // 2.5
 */
export function roundToStep(target: number, step: number, min: number): number {
  if (!(step > 0) || !Number.isFinite(target)) return Math.max(min, Number.isFinite(target) ? target : min);
  const n = target / step;
  const lower = Math.floor(n + EPS);
  const k = n - lower > 0.5 + EPS ? lower + 1 : lower;
  // Whole thousandths keep 2.5 × 33 from printing as 82.49999999.
  const value = Math.round(k * step * 1000) / 1000;
  return Math.max(min, value);
}

/**
 * Round a target load (in the athlete's unit) under one rule.
 * @example roundLoad(10, { kind: "barbell", bar: 20, plates: [20] }).load; // 20 (the empty bar)
 */
export function roundLoad(target: number, rule: RoundingRule): RoundedLoad {
  if (rule.kind === "barbell") return nearestBarbellLoad(target, rule.bar, rule.plates);
  return { load: roundToStep(target, rule.step, rule.min), perSide: null, beyondPlates: false };
}
