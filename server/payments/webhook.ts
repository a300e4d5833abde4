import "server-only";
import type { Kysely } from "kysely";
import Stripe from "stripe";
import type { Database } from "@/db/database";
import { applyPaymentEvent, type EventOutcome } from "@/db/webhookEvents";
import { AppError } from "../errors";
import { paymentsClient, requirePaymentsConfig, WEBHOOK_TOLERANCE_SECONDS } from "./client";
import { getBoss } from "../jobs/boss";
import { mailReceiptOrRetry } from "../jobs/receiptMail";

/**
 * The provider's event arriving at /api/webhooks/payments: the signature is
 * checked against the raw body exactly as received (any change to the bytes,
 * another secret, or a timestamp older than the tolerance is refused), then
 * the event is applied once (db/webhookEvents.ts). A paid purchase's receipt
 * is mailed after the grant has committed, and retried from the job queue when
 * the mail server cannot take it.
 */
export async function receivePaymentEvent(db: Kysely<Database>, rawBody: string, signature: string | null, baseUrl: string): Promise<EventOutcome> {
  const { webhookSecret } = requirePaymentsConfig();
  if (!signature) throw new AppError("unauthenticated", "The event carries no signature header, so it was not accepted.");
  let event: Stripe.Event;
  try {
    event = paymentsClient().webhooks.constructEvent(rawBody, signature, webhookSecret, WEBHOOK_TOLERANCE_SECONDS);
  } catch (err) {
    if (err instanceof Stripe.errors.StripeSignatureVerificationError) {
      console.warn(`[ironquill] payment event refused: ${err.message}`);
      throw new AppError("unauthenticated", "The event's signature does not match its body, or it is too old; it was not accepted.");
    }
    throw new AppError("invalid_input", "The event body is not a valid event.");
  }
  const object = (event.data?.object ?? {}) as unknown as Record<string, unknown>;
  const result = await applyPaymentEvent(db, { id: event.id, type: event.type, object });
  // The purchase stands whether or not the mail goes out; the receipt is also on the purchases page.
  if (result.outcome === "granted") await mailReceiptOrRetry(db, getBoss, result.purchaseId, baseUrl);
  return result;
}
