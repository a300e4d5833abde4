import type { SessionSummary } from "@/db/sessions";

/** What the session heading shows: the part of db/sessions SessionSummary it reads. */
export type SessionMetaData = Pick<SessionSummary, "id" | "date" | "plannedDate" | "title" | "block" | "week" | "deload" | "logged" | "completed" | "templateTitle">;
