/** What the session heading shows; db/sessions SessionSummary has these fields. */
export type SessionMetaData = {
  id: string;
  date: string;
  plannedDate: string;
  title: string;
  block: string;
  week: number;
  deload: boolean;
  logged: boolean;
  completed: boolean;
  templateTitle: string;
};
