/**
 * JSON shapes of the store API, for the pages that call it. Types only.
 * Money is always an integer in the currency's minor unit (`priceMinor`,
 * `amountMinor`: 2999 = 29.99) with a lower-case ISO 4217 code; dates travel
 * as ISO 8601 strings. Failures are the app's usual `{ error: { code, message, fields } }`.
 */
import type { Programme } from "@/lib/notation/model";

export type Level = "beginner" | "intermediate" | "advanced";
export type ListingState = "on_sale" | "withdrawn" | "unlisted_by_admin";

/** GET /api/store/listings?q=&tag=&weeks=1-4|5-8|9-12|13+&days=1..7&level=&page= (public). */
export type CatalogueResponse = {
  items: {
    id: string;
    slug: string;
    title: string;
    summary: string;
    tags: string[];
    coachName: string;
    priceMinor: number;
    currency: string;
    level: Level;
    weeks: number;
    daysPerWeek: number;
  }[];
  total: number;
  page: number;
  pageSize: number;
  /** Every tag in use across the store, for the filter. */
  tags: string[];
};

export type CoachListing = {
  id: string;
  slug: string;
  priceMinor: number;
  currency: string;
  summary: string;
  level: Level;
  versionNumber: number;
  weeks: number;
  daysPerWeek: number;
  state: ListingState;
  unlistedReason: string | null;
  updatedAt: string;
};

/** GET and PUT /api/store/templates/[id]/listing (coach); PUT takes { priceMinor, currency, summary, level, versionNumber, onSale }. */
export type ListingResponse = { listing: CoachListing | null };

/** POST /api/store/account (visitor): a self-coached athlete account; sign in next. */
export type AccountResponse = { id: string };

/** POST /api/store/checkout { listingId, attemptId } (athlete, 201): send the browser to `url`. */
export type CheckoutResponse = { url: string; purchaseId: string };

/** GET /api/store/checkout/status?session_id= (athlete): "pending" until the provider's signed event arrived. */
export type CheckoutStatusResponse = { purchaseId: string; status: "pending" | "paid" | "refunded"; title: string; copyTemplateId: string | null };

export type Receipt = {
  purchaseId: string;
  number: string;
  title: string;
  amountMinor: number;
  currency: string;
  status: "pending" | "paid" | "refunded";
  paidAt: string | null;
  refundedAt: string | null;
  buyerName: string;
  buyerEmail: string;
  sellerName: string;
  paymentReference: string | null;
};

/** GET /api/store/purchases (athlete). */
export type PurchasesResponse = { purchases: (Receipt & { copyTemplateId: string | null })[] };

/** GET /api/store/purchases/[id] (athlete): `copy` is null unless paid and not refunded. */
export type PurchaseResponse = { receipt: Receipt; copy: { templateId: string; versionId: string; programme: Programme } | null };

/** POST /api/store/purchases/[id]/start { startDate, weekdays } (athlete, 201). */
export type StartResponse = { assignmentId: string; sessions: number; firstDate: string | null; diagnostics: { severity: string; code: string; message: string; line: number | null }[] };

export type SaleRow = {
  id: string;
  number: string;
  date: string;
  title: string;
  buyerName: string;
  buyerEmail: string;
  sellerName: string;
  amountMinor: number;
  currency: string;
  status: "paid" | "refunded";
  refundedAt: string | null;
};

export type MonthTotal = { month: string; currency: string; sold: number; grossMinor: number; refundedMinor: number; netMinor: number };

/** GET /api/store/sales (coach: own; admin: all). */
export type SalesResponse = { rows: SaleRow[]; months: MonthTotal[] };

/** POST /api/store/sales/[id]/refund (coach or admin). */
export type RefundResponse = { purchaseId: string; refundId: string };

export type AdminListing = {
  id: string;
  slug: string;
  title: string;
  sellerName: string;
  sellerEmail: string;
  priceMinor: number;
  currency: string;
  state: ListingState;
  unlistedReason: string | null;
  sales: number;
  updatedAt: string;
};

/** GET /api/store/admin/listings; PATCH /api/store/admin/listings/[id] { unlisted, reason } answers { listing }. */
export type AdminListingsResponse = { listings: AdminListing[] };

/** POST /api/webhooks/payments (the provider). */
export type WebhookResponse = { received: true; outcome: "granted" | "refunded" | "ignored" | "duplicate" };
