/**
 * JSON shapes of the store API, for the pages that call it. Types only.
 * Money is always an integer in the currency's minor unit (`priceMinor`,
 * `amountMinor`: 2999 = 29.99) with a lower-case ISO 4217 code; dates travel
 * as ISO 8601 strings. Failures are the app's usual `{ error: { code, message, fields } }`.
 */
import type { AssignOutcome } from "@/db/assignments";
import type { CataloguePage } from "@/db/catalogue";
import type { AdminListing as StoredAdminListing, CoachListing as StoredCoachListing } from "@/db/listings";
import type { OwnedCopy, PurchaseStatusView, Receipt as StoredReceipt } from "@/db/purchases";
import type { MonthTotal, SaleRow as StoredSaleRow } from "@/db/sales";
import type { AsJson } from "../json";

export type { ListingLevel as Level } from "@/db/database";
export type { ListingState } from "@/db/listings";
export type { MonthTotal } from "@/db/sales";

/**
 * GET /api/store/listings?q=&tag=&weeks=1-4|5-8|9-12|13+&days=1..7&level=&page= (public).
 * `tags` is every tag in use across the store, for the filter.
 */
export type CatalogueResponse = CataloguePage;

export type CoachListing = AsJson<StoredCoachListing>;

/** GET and PUT /api/store/templates/[id]/listing (coach); PUT takes { priceMinor, currency, summary, level, versionNumber, onSale }. */
export type ListingResponse = { listing: CoachListing | null };

/** POST /api/store/account (visitor): a self-coached athlete account; sign in next. */
export type AccountResponse = { id: string };

/** POST /api/store/checkout { listingId, attemptId } (athlete, 201): send the browser to `url`. */
export type CheckoutResponse = { url: string; purchaseId: string };

/** GET /api/store/checkout/status?session_id= (athlete): "pending" until the provider's signed event arrived. */
export type CheckoutStatusResponse = PurchaseStatusView;

export type Receipt = AsJson<StoredReceipt>;

/** GET /api/store/purchases (athlete). */
export type PurchasesResponse = { purchases: (Receipt & { copyTemplateId: string | null })[] };

/** GET /api/store/purchases/[id] (athlete): `copy` is null unless paid and not refunded. */
export type PurchaseResponse = AsJson<OwnedCopy>;

/** POST /api/store/purchases/[id]/start { startDate, weekdays } (athlete, 201). */
export type StartResponse = Pick<Extract<AssignOutcome, { status: "assigned" }>, "assignmentId" | "sessions" | "firstDate" | "diagnostics">;

export type SaleRow = AsJson<StoredSaleRow>;

/** GET /api/store/sales (coach: own; admin: all). */
export type SalesResponse = { rows: SaleRow[]; months: MonthTotal[] };

/** POST /api/store/sales/[id]/refund (coach or admin). */
export type RefundResponse = { purchaseId: string; refundId: string };

export type AdminListing = AsJson<StoredAdminListing>;

/** GET /api/store/admin/listings; PATCH /api/store/admin/listings/[id] { unlisted, reason } answers { listing }. */
export type AdminListingsResponse = { listings: AdminListing[] };

/** POST /api/webhooks/payments (the provider). */
export type WebhookResponse = { received: true; outcome: "granted" | "refunded" | "ignored" | "duplicate" };
