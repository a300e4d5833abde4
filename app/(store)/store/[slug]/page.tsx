import { notFound } from "next/navigation";
import { BuyPanel } from "@/components/store/BuyPanel";
import { daysText, formatMoney, LEVEL_LABEL, weeksText } from "@/components/store/format";
import { ListingPreview } from "@/components/store/ListingPreview";
import { getListingPage } from "@/db/catalogue";
import { getDb } from "@/db/client";
import { ownedPurchaseForListing } from "@/db/purchases";
import { getViewer } from "@/server/auth";

export const dynamic = "force-dynamic";

export async function generateMetadata({ params }: { params: Promise<{ slug: string }> }) {
  const { slug } = await params;
  const listing = await getListingPage(getDb(), slug, null);
  return { title: listing ? `${listing.title} — programme store` : "Programme store" };
}

export default async function ListingPage({ params }: { params: Promise<{ slug: string }> }) {
  const { slug } = await params;
  const viewer = await getViewer();
  const db = getDb();
  const listing = await getListingPage(db, slug, viewer);
  if (!listing) notFound();
  const owned = viewer ? await ownedPurchaseForListing(db, viewer, listing.id) : null;
  const price = formatMoney(listing.priceMinor, listing.currency);
  return (
    <article>
      {!listing.onSale ? (
        <p role="note" className="mb-4 rounded-md bg-brass-100 px-3 py-2 text-sm text-iron-700">
          Only you see this page: the listing is not on sale at the moment{viewer?.role === "admin" ? "" : " (withdrawn, or taken out by an admin)"}.
        </p>
      ) : null}
      <div className="grid gap-8 lg:grid-cols-[1fr_20rem]">
        <div className="min-w-0">
          <p className="text-xs font-semibold uppercase tracking-[0.14em] text-ember-600">{LEVEL_LABEL[listing.level]} · {weeksText(listing.weeks)} · {daysText(listing.daysPerWeek)}</p>
          <h1 className="mt-2 text-3xl font-bold tracking-tight text-iron">{listing.title}</h1>
          <p className="mt-1 text-sm text-iron-500">by {listing.coachName}</p>
          {listing.summary ? <p className="mt-4 max-w-3xl whitespace-pre-line leading-relaxed text-iron-700">{listing.summary}</p> : null}
          {listing.tags.length ? (
            <ul className="mt-4 flex flex-wrap gap-1" aria-label="Tags">
              {listing.tags.map((t) => <li key={t} className="rounded bg-chalk-200 px-1.5 py-0.5 text-xs text-iron-600">{t}</li>)}
            </ul>
          ) : null}
          <section aria-labelledby="preview-h" className="mt-8">
            <h2 id="preview-h" className="mb-2 text-sm font-semibold uppercase tracking-wider text-iron-400">A look at week 1</h2>
            <ListingPreview programme={listing.programme} />
          </section>
        </div>
        <aside className="lg:sticky lg:top-6 lg:self-start">
          <div className="panel p-4">
            <p className="font-mono text-3xl font-bold text-iron" data-testid="listing-price">{price}</p>
            <p className="mb-4 mt-1 text-xs text-iron-400">One payment. You get your own copy of version {listing.versionNumber} to start whenever you like.</p>
            <BuyPanel listingId={listing.id} slug={listing.slug} price={price} viewerRole={viewer?.role ?? null} ownedPurchaseId={owned} onSale={listing.onSale} />
          </div>
        </aside>
      </div>
    </article>
  );
}
