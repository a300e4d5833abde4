import Link from "next/link";
import { PageTitle } from "@/components/AppShell";
import { AssignPanel } from "@/components/assignments/AssignPanel";
import { EmptyState } from "@/components/EmptyState";
import { getDb } from "@/db/client";
import { listRoster } from "@/db/athleteAccess";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Assign a template" };

export default async function AssignPage() {
  const viewer = await pageViewer(["coach"], "/coach/assign");
  const athletes = await listRoster(getDb(), viewer);
  return (
    <>
      <PageTitle title="Assign a template" lead="Pick athletes and a template version; each athlete gets their own dated sessions, worked from their maxes and plates." />
      {athletes.length === 0 ? (
        <EmptyState title="No athletes to assign yet" action={<Link href="/coach/athletes" className="btn-quiet">Go to athletes</Link>}>
          Once someone you invited has joined, you can give them a template here.
        </EmptyState>
      ) : (
        <AssignPanel athletes={athletes.map((a) => ({ id: a.id, name: a.name }))} selectable />
      )}
    </>
  );
}
