/**
 * What the coach's roster table shows per athlete: sessions planned and logged this ISO week
 * and over the four ISO weeks before it, missed sessions, the last session trained and the
 * flags that ask for a look.
 *
 * Rules (common practice, no source):
 * - this week = the ISO week (Monday to Sunday) holding `today`; last four weeks = the four
 *   ISO weeks before it;
 * - missed = a session dated before today, inside those five weeks, with nothing logged
 *   (today's session is not missed yet);
 * - off target = at least OFF_TARGET_FLAG_SETS (2) off-target sets (targets.ts) in sessions of
 *   the last OFF_TARGET_DAYS (14) days;
 * - stalled = any exercise stalled (stall.ts).
 *
 * @example
 * attentionFor({ sessions, sets, bests, today: "2027-02-03" });
 * // { thisWeek: { planned: 3, logged: 1 }, lastFourWeeks: { planned: 12, logged: 11 }, missed: 1, lastSession: "2027-02-01", flags: ["missed"] }
 */
import { addDays } from "../dates/date";
import { fromIsoWeek, isoWeek } from "../dates/isoWeek";
import { stalledExercises, type Stall } from "./stall";
import { isOffTarget } from "./targets";
import type { LoggedSet, SessionBest } from "./types";

export const OFF_TARGET_DAYS = 14;
export const OFF_TARGET_FLAG_SETS = 2;

export type Flag = "missed" | "off-target" | "stalled";

export interface PlannedSession {
  date: string;
  /** True once any set was logged. */
  logged: boolean;
}

export interface Attention {
  thisWeek: { planned: number; logged: number };
  lastFourWeeks: { planned: number; logged: number };
  missed: number;
  offTargetSets: number;
  stalled: Stall[];
  /** Latest date of a session with something logged; null when nothing is. */
  lastSession: string | null;
  flags: Flag[];
}

/** Monday of the ISO week holding `date`. */
export function isoMonday(date: string): string {
  const w = isoWeek(date);
  return fromIsoWeek(w.year, w.week, 1);
}

export function attentionFor(input: {
  sessions: readonly PlannedSession[];
  sets: readonly Pick<LoggedSet, "date" | "done" | "kind" | "reps" | "plannedReps">[];
  bests: readonly SessionBest[];
  today: string;
}): Attention {
  const monday = isoMonday(input.today);
  const nextMonday = addDays(monday, 7);
  const fourBack = addDays(monday, -28);
  const thisWeek = { planned: 0, logged: 0 };
  const lastFourWeeks = { planned: 0, logged: 0 };
  let missed = 0;
  let lastSession: string | null = null;
  for (const s of input.sessions) {
    if (s.logged && (lastSession === null || s.date > lastSession)) lastSession = s.date;
    if (s.date >= monday && s.date < nextMonday) {
      thisWeek.planned++;
      if (s.logged) thisWeek.logged++;
    } else if (s.date >= fourBack && s.date < monday) {
      lastFourWeeks.planned++;
      if (s.logged) lastFourWeeks.logged++;
    }
    if (!s.logged && s.date >= fourBack && s.date < input.today) missed++;
  }
  const offFrom = addDays(input.today, -OFF_TARGET_DAYS);
  const offTargetSets = input.sets.filter((s) => s.date >= offFrom && s.date <= input.today && isOffTarget(s)).length;
  const stalled = stalledExercises(input.bests, input.today);
  const flags: Flag[] = [];
  if (missed > 0) flags.push("missed");
  if (offTargetSets >= OFF_TARGET_FLAG_SETS) flags.push("off-target");
  if (stalled.length > 0) flags.push("stalled");
  return { thisWeek, lastFourWeeks, missed, offTargetSets, stalled, lastSession, flags };
}
