import Link from "next/link";
import { toItem } from "@/app/api/invitations/wire";
import { PageTitle } from "@/components/AppShell";
import { EmptyState } from "@/components/EmptyState";
import { InvitationList } from "@/components/invitations/InvitationList";
import { InviteForm } from "@/components/invitations/InviteForm";
import { getDb } from "@/db/client";
import { listInvitations } from "@/db/invitations";
import { listRoster } from "@/db/athleteAccess";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Athletes" };

export default async function AthletesPage() {
  const viewer = await pageViewer(["coach"], "/coach/athletes");
  const db = getDb();
  const [athletes, invitations] = await Promise.all([listRoster(db, viewer), listInvitations(db, viewer)]);
  return (
    <>
      <PageTitle title="Athletes" lead="The people you coach, their maxes, their plates and how their training is going." />
      <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <section aria-labelledby="roster-h" className="min-w-0">
          <h2 id="roster-h" className="mb-3 text-sm font-semibold uppercase tracking-wider text-iron-400">
            Roster <span className="font-normal normal-case tracking-normal">· {athletes.length}</span>
          </h2>
          {athletes.length === 0 ? (
            <EmptyState title="No athletes on your roster">
              Invite someone by e-mail. When they accept, they appear here, ready for their maxes and a template.
            </EmptyState>
          ) : (
            <ul className="panel divide-y divide-chalk-200" data-testid="athlete-list">
              {athletes.map((a) => (
                <li key={a.id}>
                  <Link href={`/coach/athletes/${a.id}`} className="flex flex-wrap items-center justify-between gap-x-3 gap-y-0.5 px-4 py-3 hover:bg-chalk-50">
                    <span className="font-medium text-iron">{a.name}</span>
                    <span className="min-w-0 break-all text-sm text-iron-400">{a.email}</span>
                  </Link>
                </li>
              ))}
            </ul>
          )}
        </section>
        <div className="min-w-0 space-y-6">
          <section aria-labelledby="invite-h" className="panel p-4 sm:p-5">
            <h2 id="invite-h" className="text-base font-semibold text-iron">Invite an athlete</h2>
            <p className="mb-3 mt-1 text-sm text-iron-500">They get an e-mail with a link to set their password and join your roster. The link works once, for 7 days.</p>
            <InviteForm />
          </section>
          <section aria-labelledby="invitations-h" className="panel p-4 sm:p-5">
            <h2 id="invitations-h" className="text-base font-semibold text-iron">Invitations</h2>
            <InvitationList initial={{ invitations: invitations.map(toItem) }} />
          </section>
        </div>
      </div>
    </>
  );
}
