import Link from "next/link";
import { PageTitle } from "@/components/AppShell";
import { ImportButton } from "@/components/templates/ImportButton";
import { TemplateList } from "@/components/templates/TemplateList";
import { listSamples } from "@/app/api/templates/_lib/samples";
import { getDb } from "@/db/client";
import { listTemplates } from "@/db/templates";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Templates" };

export default async function TemplatesPage() {
  const viewer = await pageViewer(["coach"], "/coach/templates");
  const [first, samples] = await Promise.all([listTemplates(getDb(), viewer, { page: 1, pageSize: 20 }), listSamples()]);
  const initial = {
    ...first,
    items: first.items.map((t) => ({ ...t, updatedAt: t.updatedAt.toISOString(), latestVersion: t.latestVersion && { ...t.latestVersion, createdAt: t.latestVersion.createdAt.toISOString() } })),
  };
  return (
    <>
      <PageTitle
        title="Templates"
        lead="Programmes you write once and hand to many athletes. Every save keeps a version."
        actions={
          <div className="flex flex-wrap items-start gap-2">
            <ImportButton />
            <Link href="/coach/templates/new" className="btn-primary">New template</Link>
          </div>
        }
      />
      <TemplateList initial={initial} />
      <section className="mt-8" aria-labelledby="samples-h">
        <h2 id="samples-h" className="mb-3 text-sm font-semibold uppercase tracking-wider text-iron-400">Start from a sample</h2>
        <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
          {samples.map((s) => (
            <li key={s.name}>
              <Link href={`/coach/templates/new?sample=${s.name}`} className="panel block h-full p-4 hover:border-ember-400">
                <span className="block font-semibold text-iron">{s.title}</span>
                <span className="mt-1 block text-sm leading-snug text-iron-500">{s.description}</span>
              </Link>
            </li>
          ))}
        </ul>
      </section>
    </>
  );
}
