import Link from "next/link";
import { notFound } from "next/navigation";
import { PageTitle } from "@/components/AppShell";
import { ListingEditor } from "@/components/store/ListingEditor";
import { ListingPreview } from "@/components/store/ListingPreview";
import { getDb } from "@/db/client";
import { getListingForTemplate } from "@/db/listings";
import { isUuid } from "@/db/templateRules";
import { getTemplate } from "@/db/templates";
import { getVersion } from "@/db/templateVersions";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Sell in the store" };

export default async function ListingEditorPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const viewer = await pageViewer(["coach"], `/coach/templates/${id}/listing`);
  if (!isUuid(id)) notFound();
  const db = getDb();
  const template = await getTemplate(db, viewer, id);
  if (!template) notFound();
  const listing = await getListingForTemplate(db, viewer, id);
  const pinned = await getVersion(db, viewer, id, listing?.versionNumber ?? "latest");
  const versions = template.versions.map((v) => ({ number: v.number, note: v.note }));
  return (
    <>
      <PageTitle
        title={`Sell “${template.title}”`}
        lead="Buyers get their own copy of the version you pick, worked out with their own maxes. The store shows the description below and week 1 for a sample athlete."
        actions={<Link href={`/coach/templates/${id}`} className="btn-quiet">Back to the template</Link>}
      />
      <div className="grid gap-6 lg:grid-cols-2">
        <section className="panel p-4" aria-label="Listing">
          {versions.length === 0 ? (
            <p className="text-sm text-iron-500">Save a version of this template first; buyers get a saved version.</p>
          ) : (
            <ListingEditor templateId={id} listing={listing ? { ...listing, updatedAt: listing.updatedAt.toISOString() } : null} versions={versions} />
          )}
        </section>
        <section aria-labelledby="lp-h" className="min-w-0">
          <h2 id="lp-h" className="mb-2 text-sm font-semibold uppercase tracking-wider text-iron-400">
            Store preview{pinned ? ` · version ${pinned.number}` : ""}
          </h2>
          {pinned ? <ListingPreview programme={pinned.model} /> : <p className="text-sm text-iron-500">Nothing to preview yet.</p>}
        </section>
      </div>
    </>
  );
}
