import Link from "next/link";
import { Caution } from "@/components/Caution";
import { Nameplate } from "@/components/Nameplate";
import { SharedPreview } from "@/components/templates/SharedPreview";
import { getDb } from "@/db/client";
import { getSharedVersion } from "@/db/shareLinks";

export const metadata = { title: "Shared programme", robots: { index: false } };
export const dynamic = "force-dynamic";

const WHEN = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "long", year: "numeric" });

export default async function SharedTemplatePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const shared = /^[A-Za-z0-9_-]{16,100}$/.test(token) ? await getSharedVersion(getDb(), token) : null;
  return (
    <div className="min-h-dvh">
      <header className="border-b border-chalk-300 bg-white">
        <div className="mx-auto flex max-w-6xl items-center justify-between px-4 py-3">
          <Link href="/" aria-label="Ironquill home"><Nameplate subtitle="shared programme" /></Link>
          <span className="rounded bg-chalk-200 px-2 py-1 text-xs font-semibold uppercase tracking-wider text-iron-600">Read-only</span>
        </div>
      </header>
      <main className="mx-auto max-w-6xl px-4 py-8">
        {!shared ? (
          <div className="panel mx-auto max-w-md p-8 text-center" data-testid="share-gone">
            <h1 className="text-xl font-bold">This link no longer works</h1>
            <p className="mt-2 text-sm text-iron-500">The coach who shared it may have withdrawn it. Ask them for a new link.</p>
          </div>
        ) : (
          <>
            <h1 className="text-3xl font-bold tracking-tight">{shared.title}</h1>
            <p className="mt-1 text-sm text-iron-500">
              Shared by {shared.ownerName} · version {shared.versionNumber} of {WHEN.format(new Date(shared.versionCreatedAt))}
            </p>
            {shared.description ? <p className="mt-3 max-w-3xl text-iron-700">{shared.description}</p> : null}
            <div className="mt-6 grid gap-6 lg:grid-cols-2">
              <section aria-label="Programme text" className="min-w-0">
                <h2 className="mb-2 text-sm font-semibold uppercase tracking-wider text-iron-400">As written</h2>
                <pre className="overflow-x-auto rounded-xl bg-iron p-4 font-mono text-[13px] leading-6 text-chalk" data-testid="shared-source">{shared.source}</pre>
              </section>
              <section aria-label="Preview" className="min-w-0">
                <h2 className="mb-2 text-sm font-semibold uppercase tracking-wider text-iron-400">What an athlete gets</h2>
                <SharedPreview programme={shared.model} />
              </section>
            </div>
            <Caution className="mt-8" />
          </>
        )}
      </main>
    </div>
  );
}
