import Link from "next/link";
import { formatMoney } from "./format";

export type ListingSummary = { state: "on_sale" | "withdrawn" | "unlisted_by_admin"; priceMinor: number; currency: string; slug: string } | null;

/**
 * A small card for the template page: whether the template is in the store
 * and at what price, with the way to the listing editor
 * (/coach/templates/[id]/listing). The page passes what
 * db/listings.ts getListingForTemplate answered.
 */
export function ListingPanel({ templateId, listing }: { templateId: string; listing: ListingSummary }) {
  return (
    <div className="space-y-3 text-sm" data-testid="listing-panel">
      {listing === null ? (
        <p className="text-iron-500">Not in the store. Set a price and a public description to sell copies of a version.</p>
      ) : listing.state === "on_sale" ? (
        <p className="text-moss-700">
          On sale at <span className="font-mono font-semibold">{formatMoney(listing.priceMinor, listing.currency)}</span> ·{" "}
          <Link href={`/store/${listing.slug}`} className="font-semibold underline">store page</Link>
        </p>
      ) : listing.state === "unlisted_by_admin" ? (
        <p className="text-ember-700">Taken out of the store by an admin.</p>
      ) : (
        <p className="text-iron-500">Listed at {formatMoney(listing.priceMinor, listing.currency)}, but not on sale now.</p>
      )}
      <div className="flex flex-wrap gap-2">
        <Link href={`/coach/templates/${templateId}/listing`} className="btn-quiet">{listing ? "Edit listing" : "Sell in the store"}</Link>
        {listing ? <Link href="/coach/sales" className="btn-quiet">Sales</Link> : null}
      </div>
    </div>
  );
}
