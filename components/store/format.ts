/**
 * Words and numbers the store pages share. Money is formatted from integer
 * minor units by lib/money (Intl.NumberFormat); nothing here does arithmetic on it.
 */
export { formatMoney } from "@/lib/money";

export const LEVEL_LABEL = { beginner: "Beginner", intermediate: "Intermediate", advanced: "Advanced" } as const;

export const WEEKS_LABEL: Record<string, string> = { "1-4": "Up to 4 weeks", "5-8": "5–8 weeks", "9-12": "9–12 weeks", "13+": "13 weeks or more" };

export function weeksText(weeks: number): string {
  return `${weeks} week${weeks === 1 ? "" : "s"}`;
}

export function daysText(days: number): string {
  return `${days} day${days === 1 ? "" : "s"} a week`;
}

const DAY = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });
const MONTH = new Intl.DateTimeFormat("en-GB", { month: "long", year: "numeric", timeZone: "UTC" });

/** "4 Jan 2027" for an ISO instant or Date. */
export function dayText(when: string | Date | null): string {
  return when ? DAY.format(new Date(when)) : "—";
}

/** "January 2027" for "2027-01". */
export function monthText(month: string): string {
  return MONTH.format(new Date(`${month}-01T00:00:00Z`));
}
