/** A session as a calendar cell shows it; db/sessions SessionSummary has these fields. */
export type CalendarItem = {
  id: string;
  date: string;
  plannedDate: string;
  title: string;
  day: string;
  block: string;
  week: number;
  deload: boolean;
  exerciseCount: number;
  logged: boolean;
  completed: boolean;
};

/** Where a session opens: `${sessionHref}${id}`. */
export type SessionHref = string;
