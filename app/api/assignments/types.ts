/**
 * JSON shapes of the assignment and job API, for the pages that call it.
 * Types only, taken from the query modules where the JSON is theirs. Dates of
 * sessions are "YYYY-MM-DD"; timestamps are ISO 8601 strings. Failures are
 * `ApiError` (app/api/templates/types.ts).
 */
import type { AssignmentSummary as StoredAssignmentSummary, AssignOutcome, EndResult } from "@/db/assignments";
import type { UpgradePreview, UpgradeResult } from "@/db/assignmentUpgrade";
import type { JobView as StoredJobView } from "@/db/jobs";
import type { AsJson } from "../json";

export type { AssignOutcome } from "@/db/assignments";
export type { ExerciseChange, SessionChange } from "@/db/assignmentUpgrade";
export type { JobStatus } from "@/db/database";
export type { ExpandDiagnostic as Diagnostic } from "@/lib/load/types";

/**
 * GET /api/jobs/[id]; also the `job` of POST /api/assignments (id null when it
 * was done inline). For "bulk-assign", `result` holds one outcome per athlete
 * handled so far.
 */
export type JobView = Omit<AsJson<StoredJobView>, "id" | "result"> & { id: string | null; result: { outcomes?: AssignOutcome[] } | null };
export type JobResponse = { job: JobView };

/** POST /api/assignments body. `weekdays` go to days without a weekday tag, in the order given. */
export type AssignBody = { versionId: string; athleteIds: string[]; startDate: string; weekdays?: string[]; autoRegulate?: boolean };
/** POST /api/assignments: 201 with a finished job for one athlete, 202 with a queued one for several. */
export type AssignResponse = JobResponse;

export type AssignmentSummary = AsJson<StoredAssignmentSummary>;
/** GET /api/assignments?athleteId=… (active first). */
export type AssignmentListResponse = { assignments: AssignmentSummary[] };

/** DELETE /api/assignments/[id] */
export type EndResponse = EndResult;

/** GET /api/assignments/[id]/upgrade?versionId=… */
export type UpgradePreviewResponse = { preview: UpgradePreview };

/** POST /api/assignments/[id]/upgrade { versionId } */
export type UpgradeResponse = { upgrade: UpgradeResult };
