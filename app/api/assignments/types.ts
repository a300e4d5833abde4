/**
 * JSON shapes of the assignment and job API, for the pages that call it.
 * Types only. Dates of sessions are "YYYY-MM-DD"; timestamps are ISO 8601
 * strings. Failures are `ApiError` (app/api/templates/types.ts).
 */

export type Diagnostic = { severity: "error" | "warning" | "info"; code: string; message: string; line: number | null };

export type AssignOutcome =
  | { athleteId: string; athleteName: string; status: "assigned"; assignmentId: string; sessions: number; firstDate: string | null; diagnostics: Diagnostic[] }
  | { athleteId: string; athleteName: string | null; status: "failed"; error: { code: string; message: string } };

export type JobStatus = "queued" | "running" | "done" | "failed";

/** GET /api/jobs/[id]; also the `job` of POST /api/assignments (id null when it was done inline). */
export type JobView = {
  id: string | null;
  kind: string;
  status: JobStatus;
  total: number;
  done: number;
  failed: number;
  /** For "bulk-assign": one outcome per athlete handled so far. */
  result: { outcomes?: AssignOutcome[] } | null;
  error: string | null;
  createdAt: string;
  finishedAt: string | null;
};
export type JobResponse = { job: JobView };

/** POST /api/assignments body. `weekdays` go to days without a weekday tag, in the order given. */
export type AssignBody = { versionId: string; athleteIds: string[]; startDate: string; weekdays?: string[]; autoRegulate?: boolean };
/** POST /api/assignments: 201 with a finished job for one athlete, 202 with a queued one for several. */
export type AssignResponse = JobResponse;

export type AssignmentSummary = {
  id: string;
  athleteId: string;
  templateId: string;
  templateTitle: string;
  version: { id: string; number: number };
  /** Only when the viewer owns the template. */
  latestVersion: { id: string; number: number } | null;
  newerVersionAvailable: boolean;
  canManage: boolean;
  startDate: string;
  weekdays: string[];
  status: "active" | "ended";
  autoRegulate: boolean;
  createdAt: string;
  endedAt: string | null;
  sessions: { total: number; logged: number; upcoming: number };
  nextSessionDate: string | null;
};
/** GET /api/assignments?athleteId=… (active first). */
export type AssignmentListResponse = { assignments: AssignmentSummary[] };

/** DELETE /api/assignments/[id] */
export type EndResponse = { assignmentId: string; status: "ended"; removedSessions: number; keptSessions: number };

export type ExerciseChange = {
  change: "added" | "removed" | "changed";
  name: string;
  before: string | null;
  after: string | null;
  aspects: ("sets" | "reps" | "load" | "effort" | "rest" | "details")[];
};
export type SessionChange = { ordinal: number; date: string; title: string; previousTitle: string | null; change: "added" | "removed" | "changed"; exercises: ExerciseChange[] };

/** GET /api/assignments/[id]/upgrade?versionId=… */
export type UpgradePreviewResponse = {
  preview: {
    assignmentId: string;
    athleteId: string;
    templateTitle: string;
    from: { id: string; number: number };
    to: { id: string; number: number };
    today: string;
    sessions: SessionChange[];
    unchanged: number;
    kept: number;
    diagnostics: Diagnostic[];
  };
};

/** POST /api/assignments/[id]/upgrade { versionId } */
export type UpgradeResponse = {
  upgrade: { assignmentId: string; version: { id: string; number: number }; rewritten: number; dropped: number; kept: number; diagnostics: Diagnostic[] };
};
