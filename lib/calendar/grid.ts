/**
 * Calendar grids on `YYYY-MM-DD` strings: a month laid out in ISO 8601 weeks
 * (Monday first) and the seven days of one week, with today marked.
 *
 * A month grid always starts on the Monday on or before the 1st and ends on
 * the Sunday on or after the last day, so every row is a whole ISO week and
 * the days of the neighbouring months fill the gaps (flagged `inMonth: false`).
 *
 * @example
 * const grid = monthGrid({ year: 2027, month: 1 }, "2027-01-04");
 * grid.weeks[0].label;        // "2026-W53" (Mon 28 Dec 2026 – Sun 3 Jan 2027)
 * grid.weeks[1].days[0].today; // true
 * grid.from; grid.to;           // "2026-12-28", "2027-01-31"
 */
import { addDays, isoWeek, isoWeekdayNumber, isoWeekLabel } from "../dates";

export type YearMonth = { year: number; month: number };

export interface GridDay {
  date: string;
  /** Day of the month, 1–31. */
  day: number;
  /** ISO weekday, Monday = 1 … Sunday = 7. */
  weekday: number;
  /** False for the leading and trailing days of the neighbouring months. */
  inMonth: boolean;
  today: boolean;
}

export interface GridWeek {
  /** ISO 8601 week label, "2027-W01". */
  label: string;
  /** ISO week number alone, 1–53. */
  week: number;
  days: GridDay[];
}

export interface MonthGrid extends YearMonth {
  /** "2027-01". */
  key: string;
  weeks: GridWeek[];
  /** First and last day shown (Monday of the first row, Sunday of the last). */
  from: string;
  to: string;
}

export interface WeekStrip {
  label: string;
  year: number;
  week: number;
  days: GridDay[];
  /** Monday and Sunday of the week. */
  from: string;
  to: string;
}

/**
 * The Monday of the ISO week holding `date`.
 * @example startOfIsoWeek("2027-01-03"); // "2026-12-28" (a Sunday belongs to the week before)
 */
export function startOfIsoWeek(date: string): string {
  return addDays(date, 1 - isoWeekdayNumber(date));
}

/**
 * "2027-01" for a year and month.
 * @example monthKey({ year: 2027, month: 1 }); // "2027-01"
 */
export function monthKey(ym: YearMonth): string {
  return `${String(ym.year).padStart(4, "0")}-${String(ym.month).padStart(2, "0")}`;
}

/**
 * The year and month a date falls in.
 * @example monthOf("2027-02-14"); // { year: 2027, month: 2 }
 */
export function monthOf(date: string): YearMonth {
  return { year: Number(date.slice(0, 4)), month: Number(date.slice(5, 7)) };
}

/**
 * A month moved by `n` months (negative goes back), across year ends.
 * @example addMonths({ year: 2027, month: 1 }, -1); // { year: 2026, month: 12 }
 */
export function addMonths(ym: YearMonth, n: number): YearMonth {
  const index = ym.year * 12 + (ym.month - 1) + n;
  return { year: Math.floor(index / 12), month: (((index % 12) + 12) % 12) + 1 };
}

/**
 * Last day of a month, "YYYY-MM-DD" (28, 29, 30 or 31 by the Gregorian rules).
 * @example lastOfMonth({ year: 2028, month: 2 }); // "2028-02-29"
 */
export function lastOfMonth(ym: YearMonth): string {
  return addDays(`${monthKey(addMonths(ym, 1))}-01`, -1);
}

function gridDay(date: string, today: string | null, month: YearMonth | null): GridDay {
  return {
    date,
    day: Number(date.slice(8, 10)),
    weekday: isoWeekdayNumber(date),
    inMonth: month === null || date.slice(0, 7) === monthKey(month),
    today: date === today,
  };
}

function weekFrom(monday: string, today: string | null, month: YearMonth | null): GridWeek {
  const days = Array.from({ length: 7 }, (_, i) => gridDay(addDays(monday, i), today, month));
  return { label: isoWeekLabel(monday), week: isoWeek(monday).week, days };
}

/**
 * The weeks of a month, Monday to Sunday, 4 to 6 rows; `today` (if given) is marked.
 * @example monthGrid({ year: 2027, month: 2 }).weeks.length; // 4 (1 Feb 2027 is a Monday, 28 Feb a Sunday)
 */
export function monthGrid(ym: YearMonth, today: string | null = null): MonthGrid {
  const first = `${monthKey(ym)}-01`;
  const last = lastOfMonth(ym);
  const weeks: GridWeek[] = [];
  for (let monday = startOfIsoWeek(first); monday <= last; monday = addDays(monday, 7)) {
    weeks.push(weekFrom(monday, today, ym));
  }
  return { ...ym, key: monthKey(ym), weeks, from: weeks[0].days[0].date, to: weeks.at(-1)!.days[6].date };
}

/**
 * The seven days of the ISO week holding `date`, Monday first.
 * @example weekStrip("2027-01-01").label; // "2026-W53"
 */
export function weekStrip(date: string, today: string | null = null): WeekStrip {
  const w = weekFrom(startOfIsoWeek(date), today, null);
  const { year } = isoWeek(date);
  return { label: w.label, year, week: w.week, days: w.days, from: w.days[0].date, to: w.days[6].date };
}
