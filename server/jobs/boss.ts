import "server-only";
import { CompiledQuery } from "kysely";
import PgBoss from "pg-boss";
import { databaseUrl } from "@/db/client";
import type { Db } from "@/db/athleteAccess";
import { AppError } from "../errors";

/**
 * The job queue: pg-boss in its own schema of the app's database, so a job and
 * the rows it belongs to can be committed together. One started instance per
 * process, kept on globalThis because Next bundles instrumentation and route
 * handlers separately and a module-level variable would exist twice.
 */
export const PGBOSS_SCHEMA = "pgboss";

export const QUEUES = {
  bulkAssign: "bulk-assign",
  cardPack: "card-pack",
  receiptMail: "receipt-mail",
} as const;

/**
 * Retries are safe because handlers record each finished item in the same
 * transaction as the item itself and skip recorded items on the next attempt.
 */
const QUEUE_OPTIONS: Record<string, Omit<PgBoss.Queue, "name">> = {
  [QUEUES.bulkAssign]: { retryLimit: 3, retryDelay: 15, retryBackoff: true, expireInSeconds: 30 * 60 },
  // One e-mail: a finished run is skipped on retry. The expiry stays far above render + SMTP timeouts so a slow send is never started twice.
  [QUEUES.cardPack]: { retryLimit: 3, retryDelay: 30, retryBackoff: true, expireInSeconds: 10 * 60 },
  // A sent receipt is recorded and skipped on retry. Six tries with back-off from a minute cover about an hour of mail outage.
  [QUEUES.receiptMail]: { retryLimit: 6, retryDelay: 60, retryBackoff: true, expireInSeconds: 5 * 60 },
};

export function bossOptions(url: string): PgBoss.ConstructorOptions {
  // No cron schedules yet; maintenance (expiry, archiving) stays on.
  return { connectionString: url, schema: PGBOSS_SCHEMA, application_name: "ironquill-jobs", max: 3, schedule: false };
}

/** Creates every queue the app sends to; safe to repeat (pg-boss ignores an existing queue). */
export async function ensureQueues(boss: PgBoss): Promise<void> {
  for (const [name, options] of Object.entries(QUEUE_OPTIONS)) await boss.createQueue(name, { name, ...options });
}

/** A started instance with its queues, for a given database (tests pass the scratch one). */
export async function startBoss(url: string): Promise<PgBoss> {
  const boss = new PgBoss(bossOptions(url));
  boss.on("error", (err: Error) => console.error("[ironquill] job queue:", err.message));
  await boss.start();
  await ensureQueues(boss);
  return boss;
}

type Shared = { ready?: Promise<PgBoss> };
const SHARED = Symbol.for("ironquill.jobs.boss");

function shared(): Shared {
  const g = globalThis as typeof globalThis & { [SHARED]?: Shared };
  return (g[SHARED] ??= {});
}

/** The process's started instance, started on first use; a failed start is retried on the next call. */
export function getBoss(): Promise<PgBoss> {
  const s = shared();
  if (!s.ready) {
    const ready = startBoss(databaseUrl());
    s.ready = ready;
    ready.catch(() => {
      if (s.ready === ready) s.ready = undefined;
    });
  }
  return s.ready;
}

/** As getBoss, for route handlers: a queue that cannot start is "unavailable", not a 500. */
export async function guardedBoss(): Promise<PgBoss> {
  try {
    return await getBoss();
  } catch (err) {
    console.error("[ironquill] job queue unavailable:", err);
    throw new AppError("unavailable", "Background work cannot start right now. Assign one athlete at a time, or try again in a minute.");
  }
}

export async function stopBoss(): Promise<void> {
  const s = shared();
  const ready = s.ready;
  s.ready = undefined;
  if (ready) await (await ready.catch(() => null))?.stop({ graceful: true, wait: true });
}

/**
 * Lets pg-boss write its job through our connection, inside our transaction:
 * the job exists exactly when the rows it works on do.
 */
export function executorFor(db: Db): PgBoss.Db {
  return {
    async executeSql(text: string, values: unknown[] = []) {
      const res = await db.executeQuery(CompiledQuery.raw(text, values));
      return { rows: res.rows as unknown[] as Record<string, unknown>[] };
    },
  };
}
