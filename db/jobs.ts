import "server-only";
import { sql } from "kysely";
import type { Actor, Db } from "./athleteAccess";
import type { JobStatus } from "./database";
import { isUuid } from "./templateRules";

/**
 * Progress rows of background work (job_runs). The queue (pg-boss) only says
 * "do this"; what a person watches — how many done, which failed and why —
 * lives here, written by the handler as it goes.
 */
export type JobView = {
  id: string;
  kind: string;
  status: JobStatus;
  total: number;
  done: number;
  failed: number;
  /** Kind-specific; a bulk assignment keeps `{ outcomes: [...] }`, one per athlete handled so far. */
  result: Record<string, unknown> | null;
  error: string | null;
  createdAt: Date;
  finishedAt: Date | null;
};

export type JobRunRecord = JobView & { requestedBy: string | null; payload: Record<string, unknown> };

const COLUMNS = ["id", "kind", "status", "total", "done", "failed", "result", "error", "created_at", "finished_at", "requested_by", "payload"] as const;

type Row = {
  id: string;
  kind: string;
  status: JobStatus;
  total: number;
  done: number;
  failed: number;
  result: Record<string, unknown> | null;
  error: string | null;
  created_at: Date;
  finished_at: Date | null;
  requested_by: string | null;
  payload: Record<string, unknown>;
};

function toRecord(r: Row): JobRunRecord {
  return {
    id: r.id,
    kind: r.kind,
    status: r.status,
    total: r.total,
    done: r.done,
    failed: r.failed,
    result: r.result,
    error: r.error,
    createdAt: r.created_at,
    finishedAt: r.finished_at,
    requestedBy: r.requested_by,
    payload: r.payload,
  };
}

export function toJobView(r: JobRunRecord): JobView {
  return { id: r.id, kind: r.kind, status: r.status, total: r.total, done: r.done, failed: r.failed, result: r.result, error: r.error, createdAt: r.createdAt, finishedAt: r.finishedAt };
}

/** A queued run; the caller enqueues the work in the same transaction so neither exists without the other. */
export async function createJobRun(db: Db, input: { kind: string; requestedBy: string; total: number; payload: Record<string, unknown> }): Promise<JobRunRecord> {
  const row = await db
    .insertInto("job_runs")
    .values({ kind: input.kind, requested_by: input.requestedBy, total: input.total, payload: JSON.stringify(input.payload), result: null, error: null, finished_at: null })
    .returning(COLUMNS)
    .executeTakeFirstOrThrow();
  return toRecord(row);
}

/** A run for its handler, whoever asked for it. */
export async function loadJobRun(db: Db, id: string): Promise<JobRunRecord | null> {
  if (!isUuid(id)) return null;
  const row = await db.selectFrom("job_runs").select(COLUMNS).where("id", "=", id).executeTakeFirst();
  return row ? toRecord(row) : null;
}

/** A run's progress, only for the person who asked for it; anyone else gets null (answered as not found). */
export async function getJobFor(db: Db, actor: Actor, id: string): Promise<JobView | null> {
  const run = await loadJobRun(db, id);
  if (!run || run.requestedBy !== actor.id) return null;
  return toJobView(run);
}

export async function markJobRunning(db: Db, id: string): Promise<void> {
  await db.updateTable("job_runs").set({ status: "running" }).where("id", "=", id).where("status", "=", "queued").execute();
}

/**
 * Counts one item done or failed and appends its outcome to `result.outcomes`
 * in a single statement, so a crash never leaves the count and the list apart.
 */
export async function recordJobItem(db: Db, id: string, item: { ok: boolean; outcome: unknown }): Promise<void> {
  const entry = JSON.stringify([item.outcome]);
  await db
    .updateTable("job_runs")
    .set((eb) => ({
      done: item.ok ? eb("done", "+", 1) : eb.ref("done"),
      failed: item.ok ? eb.ref("failed") : eb("failed", "+", 1),
      result: sql<string>`jsonb_set(coalesce(result, '{}'::jsonb), '{outcomes}', coalesce(result->'outcomes', '[]'::jsonb) || ${entry}::jsonb)`,
    }))
    .where("id", "=", id)
    .execute();
}

export async function finishJobRun(db: Db, id: string, outcome: { status: "done" | "failed"; error?: string | null }): Promise<void> {
  await db
    .updateTable("job_runs")
    .set({ status: outcome.status, error: outcome.error ?? null, finished_at: new Date() })
    .where("id", "=", id)
    .execute();
}
