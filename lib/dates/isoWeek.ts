/**
 * ISO 8601 week dates for display ("2027-W01").
 *
 * ISO weeks run Monday to Sunday and week 01 is the week containing the year's first
 * Thursday, so the first days of January can belong to the previous year's last week.
 *
 * @example
 * isoWeek("2027-01-01");      // { year: 2026, week: 53, day: 5 }
 * isoWeekLabel("2027-01-04"); // "2027-W01"
 */
import { isoWeekdayNumber, toDayNumber, fromDayNumber } from "./date";

export interface IsoWeekDate {
  year: number;
  week: number;
  /** Monday = 1 … Sunday = 7. */
  day: number;
}

/**
 * The ISO week-numbering year, week and weekday of a date.
 * @example isoWeek("2026-12-28"); // { year: 2026, week: 53, day: 1 }
 */
export function isoWeek(date: string): IsoWeekDate {
  const n = toDayNumber(date);
  // 1970-01-01 was a Thursday (ISO 4).
  const day = ((((n + 3) % 7) + 7) % 7) + 1;
  // The Thursday of the same ISO week decides which year the week belongs to.
  const thursday = n + 4 - day;
  const year = new Date(thursday * 86_400_000).getUTCFullYear();
  const jan1 = Math.round(Date.UTC(year, 0, 1) / 86_400_000);
  const week = Math.floor((thursday - jan1) / 7) + 1;
  return { year, week, day };
}

/**
 * "YYYY-Www" label of the ISO week containing `date`.
 * @example isoWeekLabel("2027-01-01"); // "2026-W53"
 */
export function isoWeekLabel(date: string): string {
  return label(isoWeek(date));
}

function label(w: IsoWeekDate): string {
  return `${String(w.year).padStart(4, "0")}-W${String(w.week).padStart(2, "0")}`;
}

/**
 * "YYYY-Www-D" full ISO week date.
 * @example isoWeekDateLabel("2026-12-28"); // "2026-W53-1"
 */
export function isoWeekDateLabel(date: string): string {
  const w = isoWeek(date);
  return `${label(w)}-${w.day}`;
}

/**
 * Calendar date of an ISO week date; week 01 is the week holding 4 January.
 * @example fromIsoWeek(2027, 1, 1); // "2027-01-04"
 */
export function fromIsoWeek(year: number, week: number, day: number): string {
  const jan4 = `${String(year).padStart(4, "0")}-01-04`;
  const mondayOfWeek1 = toDayNumber(jan4) - (isoWeekdayNumber(jan4) - 1);
  return fromDayNumber(mondayOfWeek1 + (week - 1) * 7 + (day - 1));
}
