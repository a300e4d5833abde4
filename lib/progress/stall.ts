/**
 * A stalled lift: its best estimated 1RM has not improved over the last three weeks.
 *
 * Rule (common practice, no source): looking back STALL_DAYS (21) days from `today`, the
 * exercise was trained in at least STALL_MIN_SESSIONS (2) sessions inside that window, it was
 * also trained before the window, and no session inside the window beat the best from before
 * it. A lift trained only inside the window is too new to call stalled.
 *
 * @example
 * stalledExercises(bests, "2027-03-01"); // [{ exerciseKey: "back-squat", exercise: "back squat", best: 140, since: "2027-02-01" }]
 */
import { addDays } from "../dates/date";
import type { SessionBest } from "./types";

export const STALL_DAYS = 21;
export const STALL_MIN_SESSIONS = 2;

export interface Stall {
  exerciseKey: string;
  exercise: string;
  /** Best estimated 1RM before the window, not beaten since. */
  best: number;
  /** Date of that best. */
  since: string;
}

/** Every exercise whose best estimated 1RM has not moved in the last three weeks, by name. */
export function stalledExercises(bests: readonly SessionBest[], today: string): Stall[] {
  const windowStart = addDays(today, -STALL_DAYS);
  const byKey = new Map<string, SessionBest[]>();
  for (const b of bests) {
    if (b.date > today) continue;
    const list = byKey.get(b.exerciseKey) ?? [];
    list.push(b);
    byKey.set(b.exerciseKey, list);
  }
  const out: Stall[] = [];
  for (const [key, list] of byKey) {
    const before = list.filter((b) => b.date < windowStart);
    const inside = list.filter((b) => b.date >= windowStart);
    if (before.length === 0 || inside.length < STALL_MIN_SESSIONS) continue;
    const top = before.reduce((a, b) => (b.e1rm > a.e1rm ? b : a));
    if (inside.every((b) => b.e1rm <= top.e1rm)) {
      out.push({ exerciseKey: key, exercise: inside[inside.length - 1].exercise, best: top.e1rm, since: top.date });
    }
  }
  return out.sort((a, b) => a.exercise.localeCompare(b.exercise));
}
