import "server-only";
import { sql } from "kysely";
import type { PurchaseStatus } from "./database";
import { DomainError } from "./domainError";
import type { Actor, Db } from "./templateAccess";
import { isUuid } from "./templateRules";

/**
 * The seller's side of purchases: every paid or refunded sale of their
 * listings, and totals per calendar month (UTC) and currency, all in integer
 * minor units. An admin sees every seller's sales.
 *
 * @example
 * const { rows, months } = await listSales(db, coach);
 * months[0]; // { month: "2027-01", currency: "eur", sold: 3, grossMinor: 7200, refundedMinor: 2400, netMinor: 4800 }
 */

export type SaleRow = {
  id: string;
  number: string;
  date: Date;
  title: string;
  buyerName: string;
  buyerEmail: string;
  sellerName: string;
  amountMinor: number;
  currency: string;
  status: Exclude<PurchaseStatus, "pending">;
  refundedAt: Date | null;
};

export type MonthTotal = { month: string; currency: string; sold: number; grossMinor: number; refundedMinor: number; netMinor: number };

function scope(actor: Actor) {
  if (actor.role !== "coach" && actor.role !== "admin") throw new DomainError("forbidden", "Only coaches and admins see sales.");
  return actor.role === "admin" ? null : actor.id;
}

export async function listSales(db: Db, actor: Actor): Promise<{ rows: SaleRow[]; months: MonthTotal[] }> {
  const seller = scope(actor);
  let rowsQ = db
    .selectFrom("purchases as p")
    .innerJoin("users as b", "b.id", "p.buyer_id")
    .innerJoin("users as s", "s.id", "p.seller_id")
    .select(["p.id", "p.number", "p.paid_at", "p.title", "b.name as buyer_name", "b.email as buyer_email", "s.name as seller_name", "p.amount_minor", "p.currency", "p.status", "p.refunded_at"])
    .where("p.status", "<>", "pending")
    .orderBy("p.paid_at", "desc")
    .limit(1000);
  if (seller) rowsQ = rowsQ.where("p.seller_id", "=", seller);

  // Sums of integers stay integers (bigint in SQL, text on the wire, Number here: far below 2^53).
  let monthsQ = db
    .selectFrom("purchases as p")
    .select([
      sql<string>`to_char(p.paid_at at time zone 'UTC', 'YYYY-MM')`.as("month"),
      "p.currency",
      sql<string>`count(*)`.as("sold"),
      sql<string>`sum(p.amount_minor)`.as("gross"),
      sql<string>`coalesce(sum(p.amount_minor) filter (where p.status = 'refunded'), 0)`.as("refunded"),
    ])
    .where("p.status", "<>", "pending")
    .groupBy([sql`1`, "p.currency"])
    .orderBy(sql`1`, "desc")
    .orderBy("p.currency");
  if (seller) monthsQ = monthsQ.where("p.seller_id", "=", seller);

  const [rows, months] = await Promise.all([rowsQ.execute(), monthsQ.execute()]);
  return {
    rows: rows.map((r) => ({
      id: r.id,
      number: String(r.number),
      date: r.paid_at!,
      title: r.title,
      buyerName: r.buyer_name,
      buyerEmail: r.buyer_email,
      sellerName: r.seller_name,
      amountMinor: r.amount_minor,
      currency: r.currency,
      status: r.status as SaleRow["status"],
      refundedAt: r.refunded_at,
    })),
    months: months.map((m) => {
      const gross = Number(m.gross);
      const refunded = Number(m.refunded);
      return { month: m.month, currency: m.currency, sold: Number(m.sold), grossMinor: gross, refundedMinor: refunded, netMinor: gross - refunded };
    }),
  };
}

export type RefundTarget = { id: string; paymentIntentId: string; amountMinor: number; currency: string };

/** A paid sale the actor may refund: their own (as its seller) or any (as an admin). */
export async function refundTarget(db: Db, actor: Actor, purchaseId: string): Promise<RefundTarget> {
  const seller = scope(actor);
  const missing = new DomainError("not_found", "That sale does not exist or is not yours.");
  if (!isUuid(purchaseId)) throw missing;
  let q = db.selectFrom("purchases").select(["id", "status", "payment_intent_id", "amount_minor", "currency"]).where("id", "=", purchaseId);
  if (seller) q = q.where("seller_id", "=", seller);
  const p = await q.executeTakeFirst();
  if (!p) throw missing;
  if (p.status === "refunded") throw new DomainError("conflict", "This sale was refunded already.");
  if (p.status !== "paid" || !p.payment_intent_id) throw new DomainError("conflict", "This checkout was never paid, so there is nothing to refund.");
  return { id: p.id, paymentIntentId: p.payment_intent_id, amountMinor: p.amount_minor, currency: p.currency };
}
