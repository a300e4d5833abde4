import "server-only";
import type { Kysely } from "kysely";
import type { Database } from "@/db/database";
import { revokeForRefund } from "@/db/purchases";
import { refundTarget } from "@/db/sales";
import type { Actor } from "@/db/templateAccess";
import { paymentsClient, providerFailure } from "./client";

/**
 * Refunds a paid sale in full through the provider, then revokes the buyer's
 * entitlement (db/purchases.ts revokeForRefund). One idempotency key per
 * purchase: pressing twice, or retrying after a timeout, refunds once. The
 * provider's own `charge.refunded` event, arriving later, then changes nothing.
 */
export async function refundSale(db: Kysely<Database>, actor: Actor, purchaseId: string): Promise<{ purchaseId: string; refundId: string }> {
  const target = await refundTarget(db, actor, purchaseId);
  let refund;
  try {
    refund = await paymentsClient().refunds.create(
      { payment_intent: target.paymentIntentId, reason: "requested_by_customer", metadata: { purchase_id: target.id, refunded_by: actor.id } },
      { idempotencyKey: `refund:${target.id}` },
    );
  } catch (err) {
    throw providerFailure(err, "the refund", "Nothing was refunded and the buyer keeps access.");
  }
  await revokeForRefund(db, { purchaseId: target.id }, refund.id);
  return { purchaseId: target.id, refundId: refund.id };
}
