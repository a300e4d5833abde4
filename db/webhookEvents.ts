import "server-only";
import type { Kysely } from "kysely";
import type { Database } from "./database";
import { type GrantResult, grantFromCheckout, revokeForRefund } from "./purchases";

/**
 * Applies one verified payment-provider event exactly once. The event id is
 * inserted into webhook_events in the same transaction as its effect, so a
 * replay — the provider retrying, or anyone re-sending a captured request —
 * finds the id taken and changes nothing; two deliveries at the same moment
 * queue on the id's unique index and the second sees the first's row.
 *
 * @example
 * const r = await applyPaymentEvent(db, { id: "evt_1", type: "checkout.session.completed", object: session });
 * r.outcome; // "granted" the first time, "duplicate" after
 */

/** Just the parts of an event we read; the signature was checked before this is called. */
export type PaymentEvent = { id: string; type: string; object: Record<string, unknown> };

export type EventOutcome =
  | { outcome: "duplicate" }
  | { outcome: "granted"; purchaseId: string; receipt: Extract<GrantResult, { outcome: "granted" }>["receipt"] }
  | { outcome: "refunded"; purchaseId: string }
  | { outcome: "ignored"; purchaseId: string | null; reason: string };

const str = (v: unknown): string | null => (typeof v === "string" ? v : null);
const int = (v: unknown): number | null => (typeof v === "number" && Number.isSafeInteger(v) ? v : null);

export async function applyPaymentEvent(db: Kysely<Database>, event: PaymentEvent): Promise<EventOutcome> {
  return db.transaction().execute(async (trx) => {
    const fresh = await trx
      .insertInto("webhook_events")
      .values({ id: event.id, type: event.type, outcome: "received", purchase_id: null })
      .onConflict((oc) => oc.column("id").doNothing())
      .returning("id")
      .executeTakeFirst();
    if (!fresh) return { outcome: "duplicate" } as const;

    let result: EventOutcome;
    if (event.type === "checkout.session.completed") {
      const o = event.object;
      const metadata = (o.metadata ?? {}) as Record<string, unknown>;
      const grant = await grantFromCheckout(trx, {
        sessionId: str(o.id) ?? "",
        purchaseId: str(metadata.purchase_id) ?? str(o.client_reference_id),
        paymentIntentId: str(o.payment_intent),
        amountTotal: int(o.amount_total),
        currency: str(o.currency),
        paymentStatus: str(o.payment_status),
      });
      result =
        grant.outcome === "granted"
          ? { outcome: "granted", purchaseId: grant.purchaseId, receipt: grant.receipt }
          : { outcome: "ignored", purchaseId: grant.purchaseId, reason: grant.reason };
    } else if (event.type === "charge.refunded") {
      const o = event.object;
      // Only a full refund takes the programme away; the app never asks for partial ones.
      if (o.refunded !== true) result = { outcome: "ignored", purchaseId: null, reason: "partial refund" };
      else {
        const r = await revokeForRefund(trx, { paymentIntentId: str(o.payment_intent) ?? undefined }, null);
        result = r.changed && r.purchaseId ? { outcome: "refunded", purchaseId: r.purchaseId } : { outcome: "ignored", purchaseId: r.purchaseId, reason: "no paid purchase for that payment" };
      }
    } else {
      result = { outcome: "ignored", purchaseId: null, reason: `not an event we act on (${event.type})` };
    }
    const outcome = result.outcome === "ignored" ? `ignored: ${result.reason}` : result.outcome;
    await trx
      .updateTable("webhook_events")
      .set({ outcome: outcome.slice(0, 200), purchase_id: "purchaseId" in result ? result.purchaseId : null })
      .where("id", "=", event.id)
      .execute();
    return result;
  });
}
