/**
 * Calendar dates as people read them. Dates are "YYYY-MM-DD" calendar days,
 * formatted in UTC so no time zone can move them by one.
 *
 * @example
 * longDate("2027-01-04");  // "Monday 4 January 2027"
 * shortDate("2027-01-04"); // "Mon 4 Jan"
 */
const LONG = new Intl.DateTimeFormat("en-GB", { weekday: "long", day: "numeric", month: "long", year: "numeric", timeZone: "UTC" });
const LONG_NO_YEAR = new Intl.DateTimeFormat("en-GB", { weekday: "long", day: "numeric", month: "long", timeZone: "UTC" });
const SHORT = new Intl.DateTimeFormat("en-GB", { weekday: "short", day: "numeric", month: "short", timeZone: "UTC" });

const utc = (date: string) => new Date(`${date}T00:00:00Z`);

export function longDate(date: string): string {
  return LONG.format(utc(date));
}

/** Without the year: for dates close to today. */
export function dayDate(date: string): string {
  return LONG_NO_YEAR.format(utc(date));
}

export function shortDate(date: string): string {
  return SHORT.format(utc(date));
}
