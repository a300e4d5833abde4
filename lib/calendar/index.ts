/**
 * Calendar layout for the athlete's and the coach's calendar pages: month
 * grids and week strips in ISO 8601 weeks, the view a page's search params
 * ask for, and sessions bucketed by day.
 *
 * @example
 * import { calendarView, itemsByDate } from "@/lib/calendar";
 * const view = calendarView({ month: "2027-01" }, "2027-01-04");
 * const byDay = itemsByDate(sessions); // sessions with a `date`
 */
export * from "./grid";
export * from "./place";
export * from "./today";
export * from "./view";
