/**
 * Sets far off target: a done work set whose reps fell more than OFF_TARGET_SHORTFALL (20 %)
 * short of the lower end of the planned reps — 3 of a planned 5, 7 of a planned 10. One or two
 * reps short on a hard set is normal; this catches a load that was plainly too heavy or a set
 * that went wrong. Timed sets and sets without a plan are never off target.
 * Common practice, no source.
 *
 * @example
 * isOffTarget({ ...set, plannedReps: 5, reps: 3 }); // true
 * isOffTarget({ ...set, plannedReps: 5, reps: 4 }); // false
 */
import type { LoggedSet } from "./types";

export const OFF_TARGET_SHORTFALL = 0.2;

export function isOffTarget(set: Pick<LoggedSet, "done" | "kind" | "reps" | "plannedReps">): boolean {
  if (!set.done || set.kind !== "work" || set.plannedReps === null || set.plannedReps < 1) return false;
  return set.reps < set.plannedReps * (1 - OFF_TARGET_SHORTFALL);
}
