import type { SessionSummary } from "@/db/sessions";

/** A session as a calendar cell shows it: the part of db/sessions SessionSummary it reads. */
export type CalendarItem = Pick<
  SessionSummary,
  "id" | "date" | "plannedDate" | "title" | "day" | "block" | "week" | "deload" | "exerciseCount" | "logged" | "completed"
>;

/** Where a session opens: `${sessionHref}${id}`. */
export type SessionHref = string;
