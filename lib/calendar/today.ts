/**
 * The calendar day it is for a person, in their own time zone: at 18:00 in
 * Los Angeles the server's UTC clock already reads tomorrow, and "Today"
 * must not show tomorrow's session.
 *
 * @example
 * calendarDateIn("America/Los_Angeles", new Date("2027-01-05T02:00:00Z")); // "2027-01-04"
 * calendarDateIn("Not/AZone", new Date("2027-01-05T02:00:00Z"));          // null
 */
export function calendarDateIn(timeZone: string, now: Date = new Date()): string | null {
  let parts: Intl.DateTimeFormatPart[];
  try {
    parts = new Intl.DateTimeFormat("en-CA", { timeZone, year: "numeric", month: "2-digit", day: "2-digit" }).formatToParts(now);
  } catch {
    return null;
  }
  const get = (type: string) => parts.find((p) => p.type === type)?.value ?? "";
  const date = `${get("year").padStart(4, "0")}-${get("month")}-${get("day")}`;
  return /^\d{4}-\d{2}-\d{2}$/.test(date) ? date : null;
}

/**
 * The day for a time zone a browser reported, or the UTC day when it is missing or unknown.
 * @example todayFor(undefined, new Date("2027-01-05T02:00:00Z")); // "2027-01-05"
 */
export function todayFor(timeZone: string | undefined, now: Date = new Date()): string {
  return (timeZone && timeZone.length <= 64 ? calendarDateIn(timeZone, now) : null) ?? now.toISOString().slice(0, 10);
}
