/**
 * Date-only helpers shared by scheduling and display.
 * @example
 * import { addDays, isoWeekLabel } from "../dates";
 * isoWeekLabel(addDays("2027-01-04", 7)); // "2027-W02"
 */
export * from "./date";
export * from "./isoWeek";
