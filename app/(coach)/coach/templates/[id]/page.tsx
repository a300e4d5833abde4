import { notFound } from "next/navigation";
import type { ReactNode } from "react";
import { PageTitle } from "@/components/AppShell";
import { ListingPanel } from "@/components/store/ListingPanel";
import { DetailsForm } from "@/components/templates/DetailsForm";
import { SharePanel } from "@/components/templates/SharePanel";
import { TemplateActions } from "@/components/templates/TemplateActions";
import { TemplateEditor } from "@/components/templates/TemplateEditor";
import { VersionList } from "@/components/templates/VersionList";
import { getDb } from "@/db/client";
import { getListingForTemplate } from "@/db/listings";
import { getDraft } from "@/db/templateDrafts";
import { isUuid } from "@/db/templateRules";
import { getTemplate } from "@/db/templates";
import { getVersion } from "@/db/templateVersions";
import { exerciseNamesFor } from "@/db/exercises";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Template" };

export default async function TemplatePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const viewer = await pageViewer(["coach"], `/coach/templates/${id}`);
  if (!isUuid(id)) notFound();
  const db = getDb();
  const template = await getTemplate(db, viewer, id);
  if (!template) notFound();
  const [latest, draft, names, listing] = await Promise.all([getVersion(db, viewer, id, "latest"), getDraft(db, viewer, id), exerciseNamesFor(db, viewer), getListingForTemplate(db, viewer, id)]);
  const library = names.filter((n) => !n.builtIn).map(({ name, exercise, equipment }) => ({ name, exercise, equipment }));
  // An unsaved draft newer than the latest version is what the coach was last typing.
  const text = draft && (!latest || draft.updatedAt > latest.createdAt) ? draft.source : (latest?.source ?? "");
  const versions = template.versions.map((v) => ({ number: v.number, note: v.note, createdAt: v.createdAt.toISOString(), authorName: v.authorName }));
  return (
    <>
      <PageTitle
        title={template.title}
        lead={`${latest ? `Version ${latest.number}` : "Not saved yet"}${template.archived ? " · archived" : ""}${draft && text === draft.source && latest && draft.source !== latest.source ? " · unsaved changes restored" : ""}`}
      />
      <TemplateEditor id={id} initialText={text} baseVersion={latest?.number ?? null} library={library} />
      <div className="mt-8 grid gap-4 md:grid-cols-2 xl:grid-cols-4">
        <Card title="Versions">
          <VersionList templateId={id} versions={versions} />
        </Card>
        <Card title="Sharing">
          <SharePanel templateId={id} latestVersion={latest?.number ?? null} />
        </Card>
        <Card title="Store">
          <ListingPanel templateId={id} listing={listing} />
        </Card>
        <Card title="Details">
          <DetailsForm id={id} initial={{ title: template.title, description: template.description, tags: template.tags, visibility: template.visibility }} />
          <div className="mt-6 border-t border-chalk-200 pt-4">
            <TemplateActions id={id} title={template.title} />
          </div>
        </Card>
      </div>
    </>
  );
}

function Card({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="panel p-4" aria-label={title}>
      <h2 className="mb-3 text-sm font-semibold uppercase tracking-wider text-iron-400">{title}</h2>
      {children}
    </section>
  );
}
