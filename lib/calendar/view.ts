/**
 * Which stretch of the calendar a page shows, read from its search params:
 * `?month=2027-01` for a month, `?week=2027-W01` for one ISO week, nothing for
 * the current month. Anything unreadable falls back to the period holding
 * today and says so (`fellBack`), so a stale or hand-typed link still opens.
 *
 * @example
 * const v = calendarView({ week: "2027-W01" }, "2027-01-06");
 * v.kind;                    // "week"
 * [v.from, v.to];            // ["2027-01-04", "2027-01-10"]
 * v.prev;                    // { week: "2026-W53" }
 */
import { addDays, fromIsoWeek, isDateString, isoWeekdayNumber, isoWeekLabel } from "../dates";
import { addMonths, monthGrid, monthKey, monthOf, weekStrip, type MonthGrid, type WeekStrip } from "./grid";

export type CalendarParams = { month?: string; week?: string };

interface ViewBase {
  from: string;
  to: string;
  /** "January 2027" or "2027-W01 · 4–10 Jan 2027". */
  title: string;
  prev: CalendarParams;
  next: CalendarParams;
  /** The same kind of view, at the period holding today. */
  current: CalendarParams;
  /** The other kind of view, at a matching period. */
  other: CalendarParams;
  /** True when the params could not be read and today's period is shown instead. */
  fellBack: boolean;
}

export type CalendarView = (ViewBase & { kind: "month"; grid: MonthGrid }) | (ViewBase & { kind: "week"; strip: WeekStrip });

const MONTH_RE = /^(\d{4})-(\d{2})$/;
const WEEK_RE = /^(\d{4})-W(\d{2})$/;
const MONTH_TITLE = new Intl.DateTimeFormat("en-GB", { month: "long", year: "numeric", timeZone: "UTC" });
const DAY_MONTH = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", timeZone: "UTC" });
const DAY_MONTH_YEAR = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

const utc = (date: string) => new Date(`${date}T00:00:00Z`);

/**
 * "2027-01" → { year, month }, or null for anything else (month 13, year 0…).
 * @example parseMonth("2027-13"); // null
 */
export function parseMonth(s: string | undefined): { year: number; month: number } | null {
  const m = s ? MONTH_RE.exec(s) : null;
  if (!m) return null;
  const year = Number(m[1]);
  const month = Number(m[2]);
  return year >= 1 && month >= 1 && month <= 12 ? { year, month } : null;
}

/**
 * "2027-W01" → the Monday of that ISO week, or null; week 53 only in years that have one.
 * @example parseIsoWeek("2026-W53"); // "2026-12-28"
 * @example parseIsoWeek("2027-W53"); // null (2027 has 52 ISO weeks)
 */
export function parseIsoWeek(s: string | undefined): string | null {
  const m = s ? WEEK_RE.exec(s) : null;
  if (!m) return null;
  const year = Number(m[1]);
  const week = Number(m[2]);
  if (year < 1 || week < 1 || week > 53) return null;
  const monday = fromIsoWeek(year, week, 1);
  return isDateString(monday) && isoWeekLabel(monday) === s ? monday : null;
}

function weekTitle(strip: WeekStrip): string {
  const sameYear = strip.from.slice(0, 4) === strip.to.slice(0, 4);
  const start = (sameYear ? DAY_MONTH : DAY_MONTH_YEAR).format(utc(strip.from));
  return `${strip.label} · ${start} – ${DAY_MONTH_YEAR.format(utc(strip.to))}`;
}

/**
 * The month or week to show for the page's search params, with links to its neighbours.
 * @example calendarView({}, "2027-01-04").title; // "January 2027"
 */
export function calendarView(params: CalendarParams, today: string): CalendarView {
  if (params.week !== undefined) {
    const monday = parseIsoWeek(params.week);
    const strip = weekStrip(monday ?? today, today);
    // The month view that matches a week is the month of its Thursday (the day ISO 8601 dates a week by).
    const thursday = addDays(strip.from, 3);
    return {
      kind: "week",
      strip,
      from: strip.from,
      to: strip.to,
      title: weekTitle(strip),
      prev: { week: isoWeekLabel(addDays(strip.from, -7)) },
      next: { week: isoWeekLabel(addDays(strip.from, 7)) },
      current: { week: isoWeekLabel(today) },
      other: { month: monthKey(monthOf(thursday)) },
      fellBack: monday === null,
    };
  }
  const ym = parseMonth(params.month);
  const month = ym ?? monthOf(today);
  const grid = monthGrid(month, today);
  const inMonth = today.slice(0, 7) === grid.key;
  const first = `${grid.key}-01`;
  // The week of the month's first Thursday belongs to this month by the same ISO rule, so toggling back lands here.
  const firstThursday = addDays(first, (4 - isoWeekdayNumber(first) + 7) % 7);
  return {
    kind: "month",
    grid,
    from: grid.from,
    to: grid.to,
    title: MONTH_TITLE.format(utc(`${grid.key}-01`)),
    prev: { month: monthKey(addMonths(month, -1)) },
    next: { month: monthKey(addMonths(month, 1)) },
    current: { month: monthKey(monthOf(today)) },
    other: { week: isoWeekLabel(inMonth ? today : firstThursday) },
    fellBack: params.month !== undefined && ym === null,
  };
}

/**
 * The query string for a view's params ("?month=2027-01"), for links.
 * @example calendarQuery({ week: "2027-W01" }); // "?week=2027-W01"
 */
export function calendarQuery(params: CalendarParams): string {
  const q = new URLSearchParams();
  if (params.month) q.set("month", params.month);
  if (params.week) q.set("week", params.week);
  const s = q.toString();
  return s ? `?${s}` : "";
}
