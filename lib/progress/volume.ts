/**
 * Weekly volume load: the sum of reps × load over done work sets, by ISO 8601 week (Monday to
 * Sunday). Warm-ups are left out (they are not training stimulus in the usual accounting);
 * a bodyweight set counts only its added load. Summing reps × load per set is the same as
 * sets × reps × load for equal sets. Common practice, no source.
 *
 * Weeks between the first and the last with training are filled with zeros so a chart shows
 * the gaps.
 *
 * @example
 * weeklyVolume(sets, "kg"); // [{ week: "2027-W01", volume: 4500, sets: 9, reps: 45 }, …]
 */
import { addDays } from "../dates/date";
import { fromIsoWeek, isoWeek, isoWeekLabel } from "../dates/isoWeek";
import { convertMass } from "../load/units";
import type { Unit } from "../notation/model";
import type { LoggedSet } from "./types";

export interface WeekVolume {
  /** "YYYY-Www". */
  week: string;
  /** Monday of the week, `YYYY-MM-DD`. */
  monday: string;
  volume: number;
  sets: number;
  reps: number;
}

/** Whether a set adds to volume: a done work set with reps. */
export function countsForVolume(set: LoggedSet): boolean {
  return set.done && set.kind === "work" && set.reps > 0;
}

function mondayOf(date: string): string {
  const w = isoWeek(date);
  return fromIsoWeek(w.year, w.week, 1);
}

/** Volume per ISO week in `unit`, oldest first, with empty weeks in between as zeros. */
export function weeklyVolume(sets: readonly LoggedSet[], unit: Unit): WeekVolume[] {
  const byMonday = new Map<string, WeekVolume>();
  for (const s of sets) {
    if (!countsForVolume(s)) continue;
    const monday = mondayOf(s.date);
    const w = byMonday.get(monday) ?? { week: isoWeekLabel(monday), monday, volume: 0, sets: 0, reps: 0 };
    w.volume += s.reps * convertMass(Math.max(0, s.load), s.unit, unit);
    w.sets += 1;
    w.reps += s.reps;
    byMonday.set(monday, w);
  }
  if (byMonday.size === 0) return [];
  const mondays = [...byMonday.keys()].sort();
  const out: WeekVolume[] = [];
  for (let m = mondays[0]; m <= mondays[mondays.length - 1]; m = addDays(m, 7)) {
    const w = byMonday.get(m) ?? { week: isoWeekLabel(m), monday: m, volume: 0, sets: 0, reps: 0 };
    out.push({ ...w, volume: Math.round(w.volume * 100) / 100 });
  }
  return out;
}
