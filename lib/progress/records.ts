/**
 * Personal bests: a session's best estimated 1RM of an exercise that beats every earlier one.
 * The first session of an exercise sets the mark and is not itself flagged — there is nothing
 * to beat yet, and a history page full of "best" badges would say nothing.
 *
 * @example
 * markPersonalBests([{ …, date: "2027-01-04", e1rm: 110 }, { …, date: "2027-01-11", e1rm: 112 }]);
 * // second entry has pb: true
 */
import type { SessionBest } from "./types";

export type MarkedBest = SessionBest & { pb: boolean };

// Loads are rounded to plates; a difference under 0.01 is arithmetic noise, not a new best.
const EPSILON = 0.01;

/** The same entries, in date order, each with `pb` set when it beats all earlier ones of its exercise. */
export function markPersonalBests(bests: readonly SessionBest[]): MarkedBest[] {
  const sorted = [...bests].sort((a, b) => a.date.localeCompare(b.date) || a.sessionId.localeCompare(b.sessionId));
  const top = new Map<string, number>();
  return sorted.map((b) => {
    const prev = top.get(b.exerciseKey);
    const pb = prev !== undefined && b.e1rm > prev + EPSILON;
    if (prev === undefined || b.e1rm > prev) top.set(b.exerciseKey, b.e1rm);
    return { ...b, pb };
  });
}
