import Link from "next/link";
import { PageTitle } from "@/components/AppShell";
import { EmptyState } from "@/components/EmptyState";
import { getDb } from "@/db/client";
import { listAthletesOfCoach } from "@/db/users";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Coach desk" };

export default async function CoachHome() {
  const viewer = await pageViewer(["coach"], "/coach");
  const athletes = await listAthletesOfCoach(getDb(), viewer.id);
  const first = viewer.name.split(" ")[0] || "coach";
  return (
    <>
      <PageTitle title={`Good to see you, ${first}`} lead="Your templates, your athletes and this week's training at a glance." />
      <div className="grid gap-6 lg:grid-cols-2">
        <section aria-labelledby="tpl-h">
          <h2 id="tpl-h" className="mb-3 text-sm font-semibold uppercase tracking-wider text-iron-400">Templates</h2>
          <EmptyState
            title="No templates yet"
            action={<Link href="/coach/templates" className="btn-primary">Write your first template</Link>}
          >
            A template is a programme written once in Ironquill notation — blocks, days, lifts, sets × reps and effort. Start from a blank page or one of the samples.
          </EmptyState>
        </section>
        <section aria-labelledby="ath-h">
          <h2 id="ath-h" className="mb-3 text-sm font-semibold uppercase tracking-wider text-iron-400">Athletes</h2>
          {athletes.length === 0 ? (
            <EmptyState title="No athletes yet" action={<Link href="/coach/athletes" className="btn-quiet">Invite an athlete</Link>}>
              Invite athletes by e-mail, record their maxes and plates, then assign a template to give each of them dated sessions with their own loads.
            </EmptyState>
          ) : (
            <ul className="panel divide-y divide-chalk-200" data-testid="athlete-list">
              {athletes.map((a) => (
                <li key={a.id} className="flex items-center justify-between px-4 py-3">
                  <span className="font-medium">{a.name}</span>
                  <span className="truncate text-sm text-iron-400">{a.email}</span>
                </li>
              ))}
            </ul>
          )}
        </section>
      </div>
    </>
  );
}
