/**
 * Reps to failure ↔ fraction of 1RM, and the inverse: an estimated 1RM from a performed set.
 *
 * Forms fixed here (other published constants differ slightly):
 * - Brzycki (1993): %1RM = (37 − r) / 36.
 * - Epley (1985): %1RM = 1 / (1 + r / 30).
 * - NSCA table (Essentials of S&C, 4th ed.): listed points, linear between them, nothing past 15.
 *
 * Design decisions:
 * - One rep to failure is 100 % in every model. Epley alone would give 96.8 %; between 1 and 2
 *   reps Epley is interpolated linearly from 100 % to its own 2-rep value so that the curve has
 *   no jump for fractional reps (from half RPE points).
 * - Each model has a domain (where the formula means anything: Brzycki below 37, the table up
 *   to 15) and a narrower trusted range (up to 12 reps for the equations, 15 for the table —
 *   common practice, no source) beyond which callers should warn. Outside the domain the answer
 *   is null, never a number.
 *
 * @example
 * percentOf1RM(5, "brzycki"); // 0.8888…
 * e1rm(100, 5, 0, "epley");   // 116.666…
 */
import type { LoadModel } from "../notation/model";

/** The NSCA %1RM–repetitions table: [reps, %1RM]. */
export const NSCA_TABLE: readonly (readonly [number, number])[] = [
  [1, 100], [2, 95], [3, 93], [4, 90], [5, 87], [6, 85], [7, 83], [8, 80], [9, 77], [10, 75], [11, 70], [12, 67], [15, 65],
];

/** Reps to failure up to which each model is trusted without a warning. */
export const TRUSTED_REPS: Readonly<Record<LoadModel, number>> = { brzycki: 12, epley: 12, nsca: 15 };

/** Largest reps to failure for which each model gives any number at all. */
export const DOMAIN_REPS: Readonly<Record<LoadModel, number>> = { brzycki: 36, epley: 100, nsca: 15 };

export type RepsCheck = "ok" | "untrusted" | "outside";

/**
 * Whether a reps-to-failure value is inside a model's trusted range, only inside its domain,
 * or outside it (fewer than 1 rep, or past the domain).
 * @example checkRepsToFailure(20, "brzycki"); // "untrusted"
 */
export function checkRepsToFailure(repsToFailure: number, model: LoadModel): RepsCheck {
  if (!Number.isFinite(repsToFailure) || repsToFailure < 1 || repsToFailure > DOMAIN_REPS[model]) return "outside";
  return repsToFailure > TRUSTED_REPS[model] ? "untrusted" : "ok";
}

function epley(r: number): number {
  return 1 / (1 + r / 30);
}

function nsca(r: number): number {
  for (let i = 1; i < NSCA_TABLE.length; i++) {
    const [r1, p1] = NSCA_TABLE[i];
    if (r <= r1) {
      const [r0, p0] = NSCA_TABLE[i - 1];
      return (p0 + ((p1 - p0) * (r - r0)) / (r1 - r0)) / 100;
    }
  }
  return NSCA_TABLE[NSCA_TABLE.length - 1][1] / 100;
}

/**
 * Fraction of 1RM (0–1) that can be lifted for `repsToFailure` reps, or null outside the model's domain.
 * @example percentOf1RM(10, "nsca"); // 0.75
 */
export function percentOf1RM(repsToFailure: number, model: LoadModel): number | null {
  if (checkRepsToFailure(repsToFailure, model) === "outside") return null;
  const r = repsToFailure;
  switch (model) {
    case "brzycki":
      return (37 - r) / 36;
    case "epley":
      return r >= 2 ? epley(r) : 1 + (epley(2) - 1) * (r - 1);
    case "nsca":
      return nsca(r);
  }
}

/**
 * Estimated 1RM from a set of `reps` at `load` stopped with `rir` reps in reserve
 * (reps to failure = reps + rir). Null when that falls outside the model's domain.
 * @example e1rm(100, 10, 0, "brzycki"); // 133.33…
 */
export function e1rm(load: number, reps: number, rir: number, model: LoadModel): number | null {
  const p = percentOf1RM(reps + rir, model);
  return p === null ? null : load / p;
}
