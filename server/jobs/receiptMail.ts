import "server-only";
import type { Kysely } from "kysely";
import type PgBoss from "pg-boss";
import type { Database } from "@/db/database";
import { deliverReceipt } from "../payments/receipt";
import { QUEUES } from "./boss";

/** One purchase's receipt, and the address its link points at (the webhook knows it from the request). */
export type ReceiptMailData = { purchaseId: string; baseUrl: string };

/** First retry a minute after the failed send, then backing off (pg-boss retry options in ./boss.ts). */
const FIRST_RETRY_SECONDS = 60;

/**
 * Sends the receipt now; when the mail server cannot take it, queues it to be
 * tried again, so a short mail outage costs the buyer a few minutes rather
 * than their receipt. The purchase stands either way, and the receipt is
 * always on the buyer's purchases page.
 *
 * @example
 * await mailReceiptOrRetry(db, getBoss, purchaseId, "https://ironquill.example"); // "sent"
 */
export async function mailReceiptOrRetry(db: Kysely<Database>, queue: () => Promise<PgBoss>, purchaseId: string, baseUrl: string): Promise<"sent" | "nothing to send" | "queued" | "not sent"> {
  try {
    return await deliverReceipt(db, purchaseId, baseUrl);
  } catch (err) {
    console.error(`[ironquill] receipt for purchase ${purchaseId} not mailed, will retry:`, err instanceof Error ? err.message : err);
  }
  try {
    const boss = await queue();
    const data: ReceiptMailData = { purchaseId, baseUrl };
    const id = await boss.send(QUEUES.receiptMail, data, { startAfter: FIRST_RETRY_SECONDS });
    return id ? "queued" : "not sent";
  } catch (err) {
    console.error(`[ironquill] receipt for purchase ${purchaseId} could not be queued:`, err instanceof Error ? err.message : err);
    return "not sent";
  }
}

/** The queue callback: a thrown error (mail still down) lets pg-boss retry with back-off. */
export function receiptMailWorker(db: Kysely<Database>) {
  return async (jobs: PgBoss.JobWithMetadata<ReceiptMailData>[]): Promise<void> => {
    for (const job of jobs) {
      if (typeof job.data?.purchaseId !== "string" || typeof job.data.baseUrl !== "string") continue;
      await deliverReceipt(db, job.data.purchaseId, job.data.baseUrl);
    }
  };
}
