import "server-only";
import type { Kysely } from "kysely";
import type { Database } from "@/db/database";
import { attachCheckoutSession, startPurchase } from "@/db/purchases";
import type { Actor } from "@/db/templateAccess";
import { AppError } from "../errors";
import { paymentsClient, providerFailure } from "./client";

/**
 * Starts a checkout: a pending purchase, then a hosted checkout session at the
 * provider for exactly its price, carrying the buyer, purchase and pinned
 * version in metadata. The idempotency key is buyer + version + attempt, so a
 * retried or doubled request gets the same session back, never a second one.
 * Access is granted later, by the signed webhook only.
 */
export async function startCheckout(
  db: Kysely<Database>,
  actor: Actor,
  input: { listingId: string; attemptId: string },
  baseUrl: string,
): Promise<{ url: string; purchaseId: string }> {
  const purchase = await startPurchase(db, actor, input);
  const stripe = paymentsClient();
  const base = baseUrl.replace(/\/+$/, "");
  let session;
  try {
    session = await stripe.checkout.sessions.create(
      {
        mode: "payment",
        line_items: [{ quantity: 1, price_data: { currency: purchase.currency, unit_amount: purchase.amountMinor, product_data: { name: purchase.title } } }],
        customer_email: purchase.buyerEmail,
        client_reference_id: purchase.id,
        metadata: { purchase_id: purchase.id, buyer_id: actor.id, version_id: purchase.versionId },
        payment_intent_data: { metadata: { purchase_id: purchase.id } },
        success_url: `${base}/store/checkout/success?session_id={CHECKOUT_SESSION_ID}`,
        cancel_url: `${base}/store/checkout/cancel?listing=${encodeURIComponent(purchase.listingSlug)}`,
      },
      { idempotencyKey: `checkout:${actor.id}:${purchase.versionId}:${input.attemptId}` },
    );
  } catch (err) {
    throw providerFailure(err, "the checkout", "Nothing was charged.");
  }
  if (!session.url) throw new AppError("unavailable", "The payment provider did not give a checkout page. Nothing was charged; please try again.");
  await attachCheckoutSession(db, purchase.id, session.id);
  return { url: session.url, purchaseId: purchase.id };
}

/** Where the provider sends the buyer back to: the public address sign-in uses, else this request's origin. */
export function appBaseUrl(req: Request): string {
  const configured = process.env.NEXTAUTH_URL?.trim();
  if (configured) {
    try {
      return new URL(configured).origin;
    } catch {
      // fall through to the request's own origin
    }
  }
  return new URL(req.url).origin;
}
