import "server-only";
import type { Kysely } from "kysely";
import type PgBoss from "pg-boss";
import { z } from "zod";
import type { Actor } from "@/db/athleteAccess";
import { emailWeekPack, weekToSend } from "@/db/cardMail";
import type { Database } from "@/db/database";
import { DomainError } from "@/db/domainError";
import { createJobRun, type JobRunRecord, loadJobRun, markJobRunning } from "@/db/jobs";
import { isDateString } from "@/lib/dates";
import { CARD_SIZES, type CardSize } from "@/pdf/sizes";
import { AppError } from "../errors";
import { executorFor, QUEUES } from "./boss";

/** What travels through the queue: only the id; the request itself is the job_runs row's payload. */
export type CardPackData = { jobRunId: string };

/** `result` of a finished "card-pack" run. */
export type CardPackResult = { to: string; sessions: number; fileName: string };

export type CardPackRequest = { athleteId: string; from: string; weeks: 1 | 4; size: CardSize; senderName: string | null };

// The payload is re-read at run time: a row written by an older release must fail readably, not crash the worker.
const payloadSchema = z.object({
  athleteId: z.string(),
  from: z.string().refine(isDateString),
  weeks: z.union([z.literal(1), z.literal(4)]),
  size: z.enum(CARD_SIZES),
  coachId: z.string(),
  senderName: z.string().nullable(),
});

/**
 * Checks what can be checked while the coach waits (the athlete is theirs,
 * the week has sessions), then records the run and queues its job in one
 * transaction, so neither exists without the other.
 *
 * @example
 * const run = await enqueueCardPack(db, guardedBoss, coach, { athleteId, from: "2027-01-04", weeks: 1, size: "a6", senderName: "Rowan Hale" });
 */
export async function enqueueCardPack(db: Kysely<Database>, queue: () => Promise<PgBoss>, actor: Actor, input: CardPackRequest): Promise<JobRunRecord> {
  await weekToSend(db, actor, input.athleteId, input.from, input.weeks);
  // The queue is asked for only now: someone else's athlete is a 404 even while it is down.
  const boss = await queue();
  return db.transaction().execute(async (trx) => {
    const payload = { ...input, coachId: actor.id };
    const run = await createJobRun(trx, { kind: QUEUES.cardPack, requestedBy: actor.id, total: 1, payload });
    const data: CardPackData = { jobRunId: run.id };
    const jobId = await boss.send(QUEUES.cardPack, data, { db: executorFor(trx) });
    if (!jobId) throw new Error(`queue ${QUEUES.cardPack} refused the job (does the queue exist?)`);
    return run;
  });
}

/**
 * Settles the run in one statement. A run already done is never touched again:
 * the mail went out, and a late failure must not say otherwise.
 */
async function settle(db: Kysely<Database>, id: string, outcome: { ok: true; result: CardPackResult } | { ok: false; error: string }): Promise<void> {
  await db
    .updateTable("job_runs")
    .set({
      status: outcome.ok ? "done" : "failed",
      done: outcome.ok ? 1 : 0,
      failed: outcome.ok ? 0 : 1,
      result: outcome.ok ? JSON.stringify(outcome.result) : null,
      error: outcome.ok ? null : outcome.error,
      finished_at: new Date(),
    })
    .where("id", "=", id)
    .where("status", "<>", "done")
    .execute();
}

/**
 * Sends one queued pack. Access and the week are checked again with the coach
 * as the actor, since the athlete may have left the roster or the sessions
 * moved since it was queued. A run already finished is skipped, so a retry
 * never sends a second copy; the only window for one is a crash between the
 * SMTP server accepting the message and the run being marked done. Problems a
 * person can fix finish the run as failed; anything else (mail down) is thrown
 * so the queue retries.
 */
export async function handleCardPack(db: Kysely<Database>, data: CardPackData): Promise<void> {
  const run = await loadJobRun(db, typeof data?.jobRunId === "string" ? data.jobRunId : "");
  if (!run || run.kind !== QUEUES.cardPack || run.status === "done" || run.status === "failed") return;
  const parsed = payloadSchema.safeParse(run.payload);
  if (!parsed.success) {
    await settle(db, run.id, { ok: false, error: "The request could not be read; nothing was sent. Ask for the cards again." });
    return;
  }
  const p = parsed.data;
  const coach =
    run.requestedBy === p.coachId
      ? await db.selectFrom("users").select(["id", "role", "disabled_at"]).where("id", "=", p.coachId).executeTakeFirst()
      : undefined;
  if (!coach || coach.disabled_at !== null || coach.role !== "coach") {
    await settle(db, run.id, { ok: false, error: "The account that asked for this is no longer an active coach; nothing was sent." });
    return;
  }
  await markJobRunning(db, run.id);
  let sent: CardPackResult;
  try {
    const { to, sessions, fileName } = await emailWeekPack(db, { id: coach.id, role: coach.role }, p.athleteId, p.from, {
      weeks: p.weeks,
      size: p.size,
      senderName: p.senderName ?? undefined,
    });
    sent = { to, sessions, fileName };
  } catch (err) {
    if (!(err instanceof DomainError)) throw err;
    // An empty week already says nothing is sent; other refusals (the athlete gone) say it here.
    await settle(db, run.id, { ok: false, error: err.fields.from ? err.message : `${err.message} Nothing was sent.` });
    return;
  }
  await settle(db, run.id, { ok: true, result: sent });
}

/**
 * The queue callback, one job at a time. On the last allowed attempt a thrown
 * error also marks the run failed, with the mail error's own words when it has
 * some, so the coach's page stops waiting.
 */
export function cardPackWorker(db: Kysely<Database>) {
  return async (jobs: PgBoss.JobWithMetadata<CardPackData>[]): Promise<void> => {
    for (const job of jobs) {
      try {
        await handleCardPack(db, job.data);
      } catch (err) {
        console.error("[ironquill] card pack job failed:", err instanceof Error ? err.message : err);
        if (job.retryCount >= job.retryLimit && typeof job.data?.jobRunId === "string") {
          const error = err instanceof AppError ? err.message : "The cards could not be sent because of a problem on our side. Try again in a few minutes.";
          await settle(db, job.data.jobRunId, { ok: false, error }).catch(() => {});
        }
        throw err;
      }
    }
  };
}
