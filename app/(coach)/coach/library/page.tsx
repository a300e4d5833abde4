import { PageTitle } from "@/components/AppShell";
import { Library } from "@/components/library/Library";
import { getDb } from "@/db/client";
import { listLibrary } from "@/db/exercises";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Exercise library" };

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function LibraryPage({ searchParams }: Props) {
  const viewer = await pageViewer(["coach"], "/coach/library");
  const [first, params] = await Promise.all([listLibrary(getDb(), viewer, { page: 1, pageSize: 25, sort: "name" }), searchParams]);
  const add = typeof params.add === "string" ? params.add.replace(/\s+/g, " ").trim().slice(0, 80) : null;
  const initial = { ...first, items: first.items.map((e) => ({ ...e, updatedAt: e.updatedAt ? e.updatedAt.toISOString() : null })) };
  return (
    <>
      <PageTitle
        title="Exercise library"
        lead="The built-in exercises and your own. Your exercises carry other names, cues, a swap group and a picture or clip; programmes can name them like any built-in one."
      />
      <Library initial={initial} addName={add} />
    </>
  );
}
