import "server-only";
import type { Transaction } from "kysely";
import type { Programme } from "../lib/notation/model";
import { endAssignment } from "./assignments";
import type { Database, PurchaseStatus } from "./database";
import { DomainError } from "./domainError";
import { type Actor, type Db, inTransaction } from "./templateAccess";
import { isUuid } from "./templateRules";
import { insertVersion, readModel } from "./templateVersions";

/**
 * A purchase goes pending (checkout started) → paid (the provider's signed
 * event arrived; the buyer gets an entitlement and a copy of the pinned
 * version as a template of their own) → refunded (entitlement revoked, copy
 * archived). Only the webhook path moves a purchase to paid.
 *
 * The copy is an ordinary template row owned by the buyer, so the assignment
 * code (db/assignments.ts, which hands out versions of the actor's own
 * templates) lets a self-coached athlete give it to themself unchanged.
 */

function notFound(): DomainError {
  return new DomainError("not_found", "That purchase does not exist or is not yours.");
}

export type StartedPurchase = {
  id: string;
  title: string;
  amountMinor: number;
  currency: string;
  versionId: string;
  listingSlug: string;
  buyerEmail: string;
  checkoutSessionId: string | null;
};

/**
 * A pending purchase for one checkout attempt. The same attempt id answers
 * the same purchase (a double click or a retried request starts nothing new).
 */
export async function startPurchase(db: Db, actor: Actor, input: { listingId: string; attemptId: string }): Promise<StartedPurchase> {
  if (actor.role !== "athlete") throw new DomainError("forbidden", "Programmes are bought with an athlete account. Sign in as an athlete (or create one) to buy.");
  if (!isUuid(input.listingId)) throw new DomainError("not_found", "That programme is not on sale.", { listingId: "Not on sale" });
  if (!isUuid(input.attemptId)) throw new DomainError("invalid_input", "attemptId: send a fresh id for each checkout attempt", { attemptId: "Not an id" });
  return inTransaction(db, async (trx) => {
    const listing = await trx
      .selectFrom("listings as l")
      .innerJoin("templates as t", "t.id", "l.template_id")
      .innerJoin("users as s", "s.id", "l.seller_id")
      .select(["l.id", "l.slug", "l.seller_id", "l.version_id", "l.price_minor", "l.currency", "t.title"])
      .where("l.id", "=", input.listingId)
      .where("l.listed_at", "is not", null)
      .where("l.unlisted_at", "is", null)
      .where("t.archived_at", "is", null)
      .where("t.visibility", "=", "listed")
      .where("s.disabled_at", "is", null)
      .executeTakeFirst();
    if (!listing) throw new DomainError("not_found", "That programme is not on sale any more.", { listingId: "Not on sale" });
    const owned = await trx
      .selectFrom("purchases as p")
      .innerJoin("entitlements as e", "e.purchase_id", "p.id")
      .select("p.id")
      .where("p.buyer_id", "=", actor.id)
      .where("p.listing_id", "=", listing.id)
      .where("e.revoked_at", "is", null)
      .executeTakeFirst();
    if (owned) throw new DomainError("conflict", "You already own this programme; it is under your purchases.", { listingId: `Already bought (purchase ${owned.id})` });
    const buyer = await trx.selectFrom("users").select("email").where("id", "=", actor.id).executeTakeFirstOrThrow();
    await trx
      .insertInto("purchases")
      .values({
        listing_id: listing.id,
        version_id: listing.version_id,
        buyer_id: actor.id,
        seller_id: listing.seller_id,
        title: listing.title,
        amount_minor: listing.price_minor,
        currency: listing.currency,
        attempt_id: input.attemptId,
        checkout_session_id: null,
        payment_intent_id: null,
        refund_id: null,
        copy_template_id: null,
        paid_at: null,
        refunded_at: null,
      })
      .onConflict((oc) => oc.columns(["buyer_id", "attempt_id"]).doNothing())
      .execute();
    const p = await trx
      .selectFrom("purchases")
      .select(["id", "listing_id", "status", "title", "amount_minor", "currency", "version_id", "checkout_session_id"])
      .where("buyer_id", "=", actor.id)
      .where("attempt_id", "=", input.attemptId)
      .executeTakeFirstOrThrow();
    if (p.listing_id !== listing.id) throw new DomainError("conflict", "That checkout attempt was for another programme; reload the page and try again.", { attemptId: "Used for another programme" });
    if (p.status !== "pending") throw new DomainError("conflict", "That checkout is already finished; see your purchases.", { attemptId: "Already finished" });
    return {
      id: p.id,
      title: p.title,
      amountMinor: p.amount_minor,
      currency: p.currency,
      versionId: p.version_id ?? listing.version_id,
      listingSlug: listing.slug,
      buyerEmail: buyer.email,
      checkoutSessionId: p.checkout_session_id,
    };
  });
}

/** Remembers the provider's checkout session of a pending purchase (once; the same id again is fine). */
export async function attachCheckoutSession(db: Db, purchaseId: string, sessionId: string): Promise<void> {
  await db
    .updateTable("purchases")
    .set({ checkout_session_id: sessionId })
    .where("id", "=", purchaseId)
    .where((eb) => eb.or([eb("checkout_session_id", "is", null), eb("checkout_session_id", "=", sessionId)]))
    .execute();
}

/** The buyer's standing purchase of a listing (paid, not refunded), for the listing page's "you own this". */
export async function ownedPurchaseForListing(db: Db, actor: Actor, listingId: string): Promise<string | null> {
  if (actor.role !== "athlete" || !isUuid(listingId)) return null;
  const r = await db
    .selectFrom("purchases as p")
    .innerJoin("entitlements as e", "e.purchase_id", "p.id")
    .select("p.id")
    .where("p.buyer_id", "=", actor.id)
    .where("p.listing_id", "=", listingId)
    .where("e.revoked_at", "is", null)
    .executeTakeFirst();
  return r?.id ?? null;
}

export type PurchaseStatusView = { purchaseId: string; status: PurchaseStatus; title: string; copyTemplateId: string | null };

/** The buyer's own purchase behind a checkout session, for the page that waits for the payment to be confirmed. */
export async function purchaseForSession(db: Db, actor: Actor, sessionId: string): Promise<PurchaseStatusView | null> {
  if (!/^[\w-]{1,255}$/.test(sessionId)) return null;
  const r = await db
    .selectFrom("purchases")
    .select(["id", "status", "title", "copy_template_id"])
    .where("checkout_session_id", "=", sessionId)
    .where("buyer_id", "=", actor.id)
    .executeTakeFirst();
  return r ? { purchaseId: r.id, status: r.status, title: r.title, copyTemplateId: r.copy_template_id } : null;
}

export type Receipt = {
  purchaseId: string;
  number: string;
  title: string;
  amountMinor: number;
  currency: string;
  status: PurchaseStatus;
  paidAt: Date | null;
  refundedAt: Date | null;
  buyerName: string;
  buyerEmail: string;
  sellerName: string;
  paymentReference: string | null;
};

function receiptQuery(db: Db) {
  return db
    .selectFrom("purchases as p")
    .innerJoin("users as b", "b.id", "p.buyer_id")
    .innerJoin("users as s", "s.id", "p.seller_id")
    .select(["p.id", "p.number", "p.title", "p.amount_minor", "p.currency", "p.status", "p.paid_at", "p.refunded_at", "p.payment_intent_id", "p.copy_template_id", "b.name as buyer_name", "b.email as buyer_email", "s.name as seller_name"]);
}

type ReceiptRow = Awaited<ReturnType<ReturnType<typeof receiptQuery>["executeTakeFirstOrThrow"]>>;

function toReceipt(r: ReceiptRow): Receipt {
  return {
    purchaseId: r.id,
    number: String(r.number),
    title: r.title,
    amountMinor: r.amount_minor,
    currency: r.currency,
    status: r.status,
    paidAt: r.paid_at,
    refundedAt: r.refunded_at,
    buyerName: r.buyer_name,
    buyerEmail: r.buyer_email,
    sellerName: r.seller_name,
    paymentReference: r.payment_intent_id,
  };
}

/**
 * The receipt of a paid purchase while its e-mail has not gone out yet; null
 * once mailed, or for a purchase that is not paid (pending, or refunded since).
 *
 * @example
 * const r = await receiptToMail(db, purchaseId);
 * if (r) { await sendReceipt(r, baseUrl); await markReceiptMailed(db, r.purchaseId); }
 */
export async function receiptToMail(db: Db, purchaseId: string): Promise<Receipt | null> {
  if (!isUuid(purchaseId)) return null;
  const row = await receiptQuery(db).where("p.id", "=", purchaseId).where("p.status", "=", "paid").where("p.receipt_mailed_at", "is", null).executeTakeFirst();
  return row ? toReceipt(row) : null;
}

/** Records that the receipt e-mail went out. */
export async function markReceiptMailed(db: Db, purchaseId: string): Promise<void> {
  await db.updateTable("purchases").set({ receipt_mailed_at: new Date() }).where("id", "=", purchaseId).execute();
}

/** The buyer's paid and refunded purchases, newest first (abandoned checkouts are not receipts). */
export async function listMyPurchases(db: Db, actor: Actor): Promise<(Receipt & { copyTemplateId: string | null })[]> {
  const rows = await receiptQuery(db).where("p.buyer_id", "=", actor.id).where("p.status", "<>", "pending").orderBy("p.paid_at", "desc").execute();
  return rows.map((r) => ({ ...toReceipt(r), copyTemplateId: r.copy_template_id }));
}

export type OwnedCopy = {
  receipt: Receipt;
  /** The buyer's template and its version to assign; null while unpaid, or once refunded. */
  copy: { templateId: string; versionId: string; programme: Programme } | null;
};

/** One of the buyer's purchases with their copy while the entitlement holds. */
export async function getMyPurchase(db: Db, actor: Actor, purchaseId: string): Promise<OwnedCopy> {
  if (!isUuid(purchaseId)) throw notFound();
  const r = await receiptQuery(db).where("p.id", "=", purchaseId).where("p.buyer_id", "=", actor.id).executeTakeFirst();
  if (!r) throw notFound();
  const copy = await db
    .selectFrom("entitlements as e")
    .innerJoin("template_versions as v", "v.template_id", "e.template_id")
    .select(["e.template_id", "v.id as version_id", "v.source", "v.model"])
    .where("e.purchase_id", "=", purchaseId)
    .where("e.user_id", "=", actor.id)
    .where("e.revoked_at", "is", null)
    .orderBy("v.number", "desc")
    .limit(1)
    .executeTakeFirst();
  return {
    receipt: toReceipt(r),
    copy: copy ? { templateId: copy.template_id, versionId: copy.version_id, programme: readModel(copy.model, copy.source) } : null,
  };
}

export type PurchasedCopy = { templateId: string; title: string; purchaseId: string; versionId: string; grantedAt: Date };

/** The templates an athlete holds through purchases that still stand (not refunded), newest first. */
export async function listPurchasedCopies(db: Db, actor: Actor): Promise<PurchasedCopy[]> {
  const rows = await db
    .selectFrom("entitlements as e")
    .innerJoin("templates as t", "t.id", "e.template_id")
    .innerJoinLateral(
      (eb) => eb.selectFrom("template_versions as v").select("v.id").whereRef("v.template_id", "=", "t.id").orderBy("v.number", "desc").limit(1).as("lv"),
      (join) => join.onTrue(),
    )
    .select(["e.template_id", "t.title", "e.purchase_id", "lv.id as version_id", "e.granted_at"])
    .where("e.user_id", "=", actor.id)
    .where("t.owner_id", "=", actor.id)
    .where("e.revoked_at", "is", null)
    .orderBy("e.granted_at", "desc")
    .execute();
  return rows.map((r) => ({ templateId: r.template_id, title: r.title, purchaseId: r.purchase_id, versionId: r.version_id, grantedAt: r.granted_at }));
}

export type CheckoutCompletion = {
  sessionId: string;
  purchaseId: string | null;
  paymentIntentId: string | null;
  amountTotal: number | null;
  currency: string | null;
  paymentStatus: string | null;
};

export type GrantResult =
  | { outcome: "granted"; purchaseId: string; receipt: Receipt }
  | { outcome: "already_done" | "ignored"; purchaseId: string | null; reason: string };

/**
 * Marks a pending purchase paid and gives the buyer an entitlement and their
 * own copy of the pinned version, all inside the caller's transaction (the
 * one that records the provider's event). Anything that does not match the
 * purchase exactly — unknown session, not paid, another amount or currency —
 * grants nothing.
 */
export async function grantFromCheckout(trx: Transaction<Database>, c: CheckoutCompletion): Promise<GrantResult> {
  const p = await trx
    .selectFrom("purchases")
    .selectAll()
    .where((eb) =>
      c.purchaseId && isUuid(c.purchaseId)
        ? eb.or([eb("checkout_session_id", "=", c.sessionId), eb.and([eb("id", "=", c.purchaseId), eb("checkout_session_id", "is", null)])])
        : eb("checkout_session_id", "=", c.sessionId),
    )
    .forUpdate()
    .executeTakeFirst();
  if (!p) return { outcome: "ignored", purchaseId: null, reason: "no purchase has that checkout session" };
  if (p.status !== "pending") return { outcome: "already_done", purchaseId: p.id, reason: `purchase is already ${p.status}` };
  if (c.paymentStatus !== "paid") return { outcome: "ignored", purchaseId: p.id, reason: `payment status is ${c.paymentStatus}` };
  if (c.amountTotal !== p.amount_minor || c.currency?.toLowerCase() !== p.currency) {
    console.error(`[ironquill] checkout ${c.sessionId} paid ${c.amountTotal} ${c.currency} for purchase ${p.id} priced ${p.amount_minor} ${p.currency}; nothing granted`);
    return { outcome: "ignored", purchaseId: p.id, reason: "amount or currency differs from the purchase" };
  }
  const now = new Date();
  let copyId: string | null = null;
  const version = p.version_id
    ? await trx
        .selectFrom("template_versions as v")
        .innerJoin("templates as t", "t.id", "v.template_id")
        .select(["v.id", "v.number", "v.source", "v.model", "v.author_id", "t.tags", "t.title as origin_title"])
        .where("v.id", "=", p.version_id)
        .executeTakeFirst()
    : undefined;
  if (version) {
    const listing = p.listing_id ? await trx.selectFrom("listings").select("summary").where("id", "=", p.listing_id).executeTakeFirst() : undefined;
    const copy = await trx
      .insertInto("templates")
      .values({ owner_id: p.buyer_id, title: p.title, description: listing?.summary ?? "", tags: version.tags, visibility: "private", archived_at: null, forked_from_version_id: version.id })
      .returning("id")
      .executeTakeFirstOrThrow();
    await insertVersion(trx, {
      templateId: copy.id,
      // The coach wrote it; the buyer's copy says so in its history.
      authorId: version.author_id,
      number: 1,
      source: version.source,
      model: readModel(version.model, version.source),
      note: `Bought: “${version.origin_title}” version ${version.number}`,
    });
    await trx.insertInto("entitlements").values({ purchase_id: p.id, user_id: p.buyer_id, template_id: copy.id, source_version_id: version.id, revoked_at: null }).execute();
    copyId = copy.id;
  } else {
    // Paid for a version whose template was deleted since: the money is recorded so the coach can refund it.
    console.error(`[ironquill] purchase ${p.id} was paid but its version is gone; no copy was made`);
  }
  await trx
    .updateTable("purchases")
    .set({ status: "paid", paid_at: now, payment_intent_id: c.paymentIntentId, checkout_session_id: c.sessionId, copy_template_id: copyId })
    .where("id", "=", p.id)
    .execute();
  const receipt = toReceipt(await receiptQuery(trx).where("p.id", "=", p.id).executeTakeFirstOrThrow());
  return { outcome: "granted", purchaseId: p.id, receipt };
}

/**
 * Records a refund: the purchase is refunded, the entitlement revoked, the
 * copy archived (so it can no longer be assigned) and its running
 * assignments ended (sessions already trained stay as history). A purchase
 * that is not paid (already refunded, never paid) is left as it is.
 */
export async function revokeForRefund(db: Db, ref: { purchaseId?: string; paymentIntentId?: string }, refundId: string | null): Promise<{ purchaseId: string | null; changed: boolean }> {
  return inTransaction(db, async (trx) => {
    let q = trx.selectFrom("purchases").select(["id", "status", "buyer_id", "copy_template_id", "refund_id"]).forUpdate();
    if (ref.purchaseId && isUuid(ref.purchaseId)) q = q.where("id", "=", ref.purchaseId);
    else if (ref.paymentIntentId) q = q.where("payment_intent_id", "=", ref.paymentIntentId);
    else return { purchaseId: null, changed: false };
    const p = await q.executeTakeFirst();
    if (!p) return { purchaseId: null, changed: false };
    if (p.status !== "paid") {
      // The provider's refund event can land before the refund call returns; keep the refund's id either way.
      if (p.status === "refunded" && refundId && !p.refund_id) await trx.updateTable("purchases").set({ refund_id: refundId }).where("id", "=", p.id).execute();
      return { purchaseId: p.id, changed: false };
    }
    const now = new Date();
    await trx.updateTable("purchases").set({ status: "refunded", refunded_at: now, refund_id: refundId }).where("id", "=", p.id).execute();
    await trx.updateTable("entitlements").set({ revoked_at: now }).where("purchase_id", "=", p.id).where("revoked_at", "is", null).execute();
    if (p.copy_template_id) {
      await trx.updateTable("templates").set({ archived_at: now, updated_at: now }).where("id", "=", p.copy_template_id).where("archived_at", "is", null).execute();
      const running = await trx.selectFrom("template_assignments").select("id").where("template_id", "=", p.copy_template_id).where("status", "=", "active").execute();
      const buyer = { id: p.buyer_id, role: "athlete" as const };
      for (const a of running) {
        try {
          await endAssignment(trx, buyer, a.id);
        } catch (err) {
          // A buyer's account that was disabled since cannot be managed; the archived copy already stops new use.
          if (!(err instanceof DomainError)) throw err;
        }
      }
    }
    return { purchaseId: p.id, changed: true };
  });
}
