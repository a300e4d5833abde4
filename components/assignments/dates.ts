/**
 * Calendar helpers for the assignment forms. The start date a coach picks is a
 * day on their own calendar, so "today" here is the browser's local date.
 *
 * @example
 * nextMonday("2027-01-06"); // "2027-01-11"
 * weekdaysFrom("2027-01-06", ["mon", "wed", "fri"]); // ["wed", "fri", "mon"]
 */
import { addDays, isDateString, nextOnOrAfter, WEEKDAY_ORDER, weekdayOf } from "@/lib/dates/date";
import type { Weekday } from "@/lib/notation/model";

export function localToday(now = new Date()): string {
  const p = (n: number) => String(n).padStart(2, "0");
  return `${now.getFullYear()}-${p(now.getMonth() + 1)}-${p(now.getDate())}`;
}

/** The first Monday after today (a programme usually starts at the top of a week). */
export function nextMonday(today = localToday()): string {
  return nextOnOrAfter(addDays(today, 1), "mon");
}

/**
 * The ticked weekdays in the order they come round from the start date: days
 * without a weekday tag take them in turn, so the first day of the programme
 * lands on the first ticked day on or after the start.
 */
export function weekdaysFrom(startDate: string, ticked: readonly string[]): Weekday[] {
  const first = isDateString(startDate) ? WEEKDAY_ORDER.indexOf(weekdayOf(startDate)) : 0;
  const order = [...WEEKDAY_ORDER.slice(first), ...WEEKDAY_ORDER.slice(0, first)];
  return order.filter((d) => ticked.includes(d));
}

const DAY = new Intl.DateTimeFormat("en-GB", { weekday: "short", day: "numeric", month: "short", timeZone: "UTC" });

/** "Mon 4 Jan" for a YYYY-MM-DD date, the same wherever the reader is. */
export function dayLabel(date: string): string {
  return isDateString(date) ? DAY.format(new Date(`${date}T00:00:00Z`)) : date;
}
