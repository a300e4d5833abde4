import { PageTitle } from "@/components/AppShell";
import { EmptyState } from "@/components/EmptyState";
import { getDb } from "@/db/client";
import { listAthletesOfCoach } from "@/db/users";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Athletes" };

export default async function AthletesPage() {
  const viewer = await pageViewer(["coach"], "/coach/athletes");
  const athletes = await listAthletesOfCoach(getDb(), viewer.id);
  return (
    <>
      <PageTitle title="Athletes" lead="The people you coach, their maxes, their plates and how their training is going." />
      {athletes.length === 0 ? (
        <EmptyState title="No athletes on your roster">
          When you invite someone by e-mail and they accept, they appear here, ready for their maxes and a template.
        </EmptyState>
      ) : (
        <ul className="panel divide-y divide-chalk-200" data-testid="athlete-list">
          {athletes.map((a) => (
            <li key={a.id} className="flex flex-wrap items-center justify-between gap-2 px-4 py-3">
              <span className="font-medium">{a.name}</span>
              <span className="text-sm text-iron-400">{a.email}</span>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
