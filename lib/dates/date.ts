/**
 * Date-only arithmetic on `YYYY-MM-DD` strings.
 *
 * Training dates are calendar days, not instants: a session on 2027-01-04 is on that day
 * wherever the athlete is. Every computation goes through a UTC day count so that no local
 * time zone or daylight-saving change can move a date by one.
 *
 * @example
 * addDays("2026-12-28", 7); // "2027-01-04"
 * weekdayOf("2027-01-04");  // "mon"
 */
import type { Weekday } from "../notation/model";

const DAY_MS = 86_400_000;
const DATE_RE = /^(\d{4})-(\d{2})-(\d{2})$/;

/** Weekdays Monday first, the ISO 8601 order (Monday = 1 … Sunday = 7 is index + 1). */
export const WEEKDAY_ORDER: readonly Weekday[] = ["mon", "tue", "wed", "thu", "fri", "sat", "sun"];

/**
 * Whether `s` is a real calendar date written `YYYY-MM-DD` (rejects 2027-02-30).
 * @example isDateString("2028-02-29"); // true
 */
export function isDateString(s: string): boolean {
  const m = DATE_RE.exec(s);
  if (!m) return false;
  const [y, mo, d] = [Number(m[1]), Number(m[2]), Number(m[3])];
  if (mo < 1 || mo > 12 || d < 1) return false;
  return d <= daysInMonth(y, mo);
}

const MONTH_DAYS = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

function daysInMonth(year: number, month: number): number {
  // Gregorian leap years: every 4th, except centuries not divisible by 400.
  const leap = year % 4 === 0 && (year % 100 !== 0 || year % 400 === 0);
  return month === 2 && leap ? 29 : MONTH_DAYS[month - 1];
}

/**
 * Days since 1970-01-01 for a `YYYY-MM-DD` string; throws on anything else, so callers
 * validate user input with {@link isDateString} first.
 * @example toDayNumber("1970-01-02"); // 1
 */
export function toDayNumber(date: string): number {
  if (!isDateString(date)) throw new RangeError(`not a YYYY-MM-DD date: ${date}`);
  const [y, m, d] = date.split("-").map(Number);
  return Math.round(Date.UTC(y, m - 1, d) / DAY_MS);
}

/**
 * The `YYYY-MM-DD` string for a day number (inverse of {@link toDayNumber}).
 * @example fromDayNumber(0); // "1970-01-01"
 */
export function fromDayNumber(day: number): string {
  const dt = new Date(day * DAY_MS);
  const y = dt.getUTCFullYear();
  const m = dt.getUTCMonth() + 1;
  const d = dt.getUTCDate();
  return `${String(y).padStart(4, "0")}-${String(m).padStart(2, "0")}-${String(d).padStart(2, "0")}`;
}

/**
 * `date` moved by `days` whole days (negative goes back).
 * @example addDays("2027-03-01", -1); // "2027-02-28"
 */
export function addDays(date: string, days: number): string {
  return fromDayNumber(toDayNumber(date) + days);
}

/**
 * ISO weekday number, Monday = 1 … Sunday = 7.
 * @example isoWeekdayNumber("2027-01-03"); // 7 (a Sunday)
 */
export function isoWeekdayNumber(date: string): number {
  // 1970-01-01 was a Thursday (ISO 4).
  return ((((toDayNumber(date) + 3) % 7) + 7) % 7) + 1;
}

/**
 * Weekday name of a date.
 * @example weekdayOf("2027-01-01"); // "fri"
 */
export function weekdayOf(date: string): Weekday {
  return WEEKDAY_ORDER[isoWeekdayNumber(date) - 1];
}

/**
 * First date on or after `from` that falls on `weekday` (same day when it already does).
 * @example nextOnOrAfter("2027-01-06", "mon"); // "2027-01-11"
 */
export function nextOnOrAfter(from: string, weekday: Weekday): string {
  const want = WEEKDAY_ORDER.indexOf(weekday) + 1;
  const have = isoWeekdayNumber(from);
  return addDays(from, (want - have + 7) % 7);
}
