import "server-only";
import type { Kysely } from "kysely";
import type PgBoss from "pg-boss";
import { getDb } from "@/db/client";
import type { Database } from "@/db/database";
import { getBoss, QUEUES } from "./boss";
import { type BulkAssignData, bulkAssignWorker } from "./bulkAssign";
import { type CardPackData, cardPackWorker } from "./cardPack";
import { type ReceiptMailData, receiptMailWorker } from "./receiptMail";

/** Registers every handler on a started instance; the app and the tests go through here alike. */
export async function registerWorkers(boss: PgBoss, db: Kysely<Database>, options: { pollingIntervalSeconds?: number } = {}): Promise<void> {
  await boss.work<BulkAssignData>(QUEUES.bulkAssign, { includeMetadata: true, batchSize: 1, ...options }, bulkAssignWorker(db));
  await boss.work<CardPackData>(QUEUES.cardPack, { includeMetadata: true, batchSize: 1, ...options }, cardPackWorker(db));
  await boss.work<ReceiptMailData>(QUEUES.receiptMail, { includeMetadata: true, batchSize: 1, ...options }, receiptMailWorker(db));
}

type Shared = { started?: Promise<void> };
const SHARED = Symbol.for("ironquill.jobs.worker");

/**
 * Starts this process's worker once, however often it is called (Next may call
 * instrumentation again after a reload). A failed start may be tried again.
 */
export function startJobWorker(): Promise<void> {
  const g = globalThis as typeof globalThis & { [SHARED]?: Shared };
  const s = (g[SHARED] ??= {});
  if (!s.started) {
    const started = (async () => {
      const boss = await getBoss();
      await registerWorkers(boss, getDb());
    })();
    s.started = started;
    started.catch(() => {
      if (s.started === started) s.started = undefined;
    });
  }
  return s.started;
}
