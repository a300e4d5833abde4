import Link from "next/link";
import { notFound } from "next/navigation";
import { PageTitle } from "@/components/AppShell";
import { LineDiff } from "@/components/templates/LineDiff";
import { getDb } from "@/db/client";
import { isUuid } from "@/db/templateRules";
import { getVersion } from "@/db/templateVersions";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Compare versions" };

function versionParam(raw: string | string[] | undefined): number | null {
  const n = Number(Array.isArray(raw) ? raw[0] : raw);
  return Number.isInteger(n) && n >= 1 ? n : null;
}

export default async function DiffPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { id } = await params;
  const viewer = await pageViewer(["coach"], `/coach/templates/${id}`);
  const q = await searchParams;
  const a = versionParam(q.a);
  const b = versionParam(q.b);
  if (!isUuid(id) || a === null || b === null) notFound();
  const db = getDb();
  const [va, vb] = await Promise.all([getVersion(db, viewer, id, a), getVersion(db, viewer, id, b)]);
  if (!va || !vb) notFound();
  return (
    <>
      <PageTitle
        title={`${va.templateTitle}: v${a} → v${b}`}
        lead={[va.note && `v${a}: ${va.note}`, vb.note && `v${b}: ${vb.note}`].filter(Boolean).join(" · ") || "Lines removed and added between the two versions."}
        actions={<Link href={`/coach/templates/${id}`} className="btn-quiet">Back to the template</Link>}
      />
      <LineDiff before={va.source} after={vb.source} />
    </>
  );
}
