/**
 * The auto-regulation rule: when the athlete's recent sessions estimate a clearly different 1RM
 * than the one on file, propose the new value for a person to accept — never apply it.
 *
 * Rule (thresholds are common practice, no source):
 * - take the best estimated 1RM (e1rm.ts) of the exercise in each of its last
 *   AUTOREG_WINDOW (3) logged sessions dated on or after the day the current max was measured
 *   (older sessions were already known when it was set);
 * - with fewer than 3 such sessions, say nothing;
 * - the estimate is the median of those three, so one great or one bad day cannot move it;
 * - propose it when it differs from the max on file by more than AUTOREG_THRESHOLD (5 %) up or
 *   down, rounded to 0.5 kg / 1 lb.
 * Only a 1RM is compared: a training max is a deliberate fraction a coach chose. The caller leaves
 * deload weeks out of `bests`: they are light on purpose.
 *
 * @example
 * proposeMax({ bests, current: { value: 100, measuredOn: "2027-01-01", kind: "1rm" }, unit: "kg" });
 * // { value: 108, estimate: 108.1, change: 0.081, basis: [three SessionBest] }
 */
import type { Unit } from "../notation/model";
import type { SessionBest } from "./types";

export const AUTOREG_WINDOW = 3;
export const AUTOREG_THRESHOLD = 0.05;

export interface MaxProposal {
  /** The proposed 1RM, rounded to a loadable step. */
  value: number;
  /** The unrounded median estimate. */
  estimate: number;
  /** (estimate − current) / current: +0.08 is 8 % above the max on file. */
  change: number;
  /** The session bests it rests on, oldest first. */
  basis: SessionBest[];
}

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const mid = Math.floor(s.length / 2);
  return s.length % 2 === 1 ? s[mid] : (s[mid - 1] + s[mid]) / 2;
}

/** Rounds a proposed max to 0.5 kg or 1 lb. */
export function roundMax(value: number, unit: Unit): number {
  const step = unit === "kg" ? 0.5 : 1;
  return Math.round(value / step) * step;
}

/**
 * A proposal for one exercise, or null when the rule finds nothing to propose. `bests` are the
 * exercise's session bests in `unit`, the same unit as `current.value`.
 */
export function proposeMax(input: { bests: readonly SessionBest[]; current: { value: number; measuredOn: string; kind: "1rm" | "tm" }; unit: Unit }): MaxProposal | null {
  const { current } = input;
  if (current.kind !== "1rm" || !(current.value > 0)) return null;
  const recent = [...input.bests]
    .filter((b) => b.date >= current.measuredOn)
    .sort((a, b) => a.date.localeCompare(b.date) || a.sessionId.localeCompare(b.sessionId))
    .slice(-AUTOREG_WINDOW);
  if (recent.length < AUTOREG_WINDOW) return null;
  const estimate = median(recent.map((b) => b.e1rm));
  const change = (estimate - current.value) / current.value;
  if (Math.abs(change) <= AUTOREG_THRESHOLD) return null;
  return { value: roundMax(estimate, input.unit), estimate, change, basis: recent };
}
