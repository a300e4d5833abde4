import "server-only";
import type { Kysely } from "kysely";
import type PgBoss from "pg-boss";
import { type AssignOutcome, assignTemplate, checkAssignInput, versionToAssign } from "@/db/assignments";
import { type Actor, findAthleteFor } from "@/db/athleteAccess";
import type { Database } from "@/db/database";
import { DomainError } from "@/db/domainError";
import { createJobRun, finishJobRun, type JobRunRecord, loadJobRun, markJobRunning, recordJobItem } from "@/db/jobs";
import { executorFor, QUEUES } from "./boss";

/** What travels through the queue: only the id; the request itself is the job_runs row's payload. */
export type BulkAssignData = { jobRunId: string };

/** Every athlete must be on the actor's roster before anything is queued; the first stranger is named by position. */
async function requireRoster(db: Kysely<Database>, actor: Actor, athleteIds: string[]): Promise<void> {
  const fields: Record<string, string> = {};
  for (const [i, id] of athleteIds.entries()) {
    if (!(await findAthleteFor(db, actor, id))) fields[`athleteIds.${i}`] = "Not on your roster";
  }
  if (Object.keys(fields).length > 0) {
    throw new DomainError("not_found", "Some of those athletes do not exist or are not on your roster.", fields);
  }
}

/**
 * Records the run and queues its job in one transaction, after the same checks
 * an inline assignment makes (input, version, roster), so a queued run only
 * fails for reasons that arise while it runs.
 */
export async function enqueueBulkAssign(db: Kysely<Database>, boss: PgBoss, actor: Actor, raw: unknown): Promise<JobRunRecord> {
  const input = checkAssignInput(raw);
  await versionToAssign(db, actor, input.versionId);
  await requireRoster(db, actor, input.athleteIds);
  return db.transaction().execute(async (trx) => {
    const run = await createJobRun(trx, { kind: QUEUES.bulkAssign, requestedBy: actor.id, total: input.athleteIds.length, payload: input });
    const data: BulkAssignData = { jobRunId: run.id };
    const jobId = await boss.send(QUEUES.bulkAssign, data, { db: executorFor(trx) });
    if (!jobId) throw new Error(`queue ${QUEUES.bulkAssign} refused the job (does the queue exist?)`);
    return run;
  });
}

function outcomesOf(run: JobRunRecord): AssignOutcome[] {
  const list = run.result?.outcomes;
  return Array.isArray(list) ? (list as AssignOutcome[]) : [];
}

/**
 * Works one bulk assignment, athlete by athlete, each in its own transaction
 * that also counts it in job_runs. Run again after a crash, it carries on with
 * the athletes not yet recorded. Problems with the whole request (the account
 * gone, the template no longer theirs) finish the run as failed; anything
 * unexpected is thrown so the queue retries.
 */
export async function handleBulkAssign(db: Kysely<Database>, data: BulkAssignData): Promise<void> {
  const run = await loadJobRun(db, typeof data?.jobRunId === "string" ? data.jobRunId : "");
  if (!run || run.kind !== QUEUES.bulkAssign || run.status === "done" || run.status === "failed") return;
  const requester = run.requestedBy
    ? await db.selectFrom("users").select(["id", "role", "disabled_at"]).where("id", "=", run.requestedBy).executeTakeFirst()
    : undefined;
  if (!requester || requester.disabled_at !== null) {
    await finishJobRun(db, run.id, { status: "failed", error: "The account that asked for this is no longer active." });
    return;
  }
  let input;
  try {
    input = checkAssignInput(run.payload);
  } catch (err) {
    await finishJobRun(db, run.id, { status: "failed", error: err instanceof Error ? err.message : "The request could not be read." });
    return;
  }
  await markJobRunning(db, run.id);
  const handled = new Set(outcomesOf(run).map((o) => o.athleteId));
  const remaining = input.athleteIds.filter((id) => !handled.has(id));
  if (remaining.length > 0) {
    try {
      await assignTemplate(
        db,
        { id: requester.id, role: requester.role },
        { ...input, athleteIds: remaining },
        { onOutcome: (tx, outcome) => recordJobItem(tx, run.id, { ok: outcome.status === "assigned", outcome }) },
      );
    } catch (err) {
      if (!(err instanceof DomainError)) throw err;
      await finishJobRun(db, run.id, { status: "failed", error: err.message });
      return;
    }
  }
  await finishJobRun(db, run.id, { status: "done" });
}

/**
 * The queue callback: one job at a time. On the last allowed attempt a thrown
 * error also marks the run failed, so nobody watches a bar that never moves.
 */
export function bulkAssignWorker(db: Kysely<Database>) {
  return async (jobs: PgBoss.JobWithMetadata<BulkAssignData>[]): Promise<void> => {
    for (const job of jobs) {
      try {
        await handleBulkAssign(db, job.data);
      } catch (err) {
        console.error("[ironquill] bulk assignment job failed:", err);
        if (job.retryCount >= job.retryLimit && typeof job.data?.jobRunId === "string") {
          await finishJobRun(db, job.data.jobRunId, { status: "failed", error: "The assignment stopped on our side; the athletes listed as assigned keep their sessions. Try the rest again." }).catch(() => {});
        }
        throw err;
      }
    }
  };
}
