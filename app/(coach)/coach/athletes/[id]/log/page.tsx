import Link from "next/link";
import { notFound } from "next/navigation";
import { PageTitle } from "@/components/AppShell";
import { LogSession } from "@/components/logging/LogSession";
import { ProgressView } from "@/components/progress/ProgressView";
import { ProposalPanel } from "@/components/progress/ProposalPanel";
import { getDb } from "@/db/client";
import { DomainError } from "@/db/domainError";
import { getLogSheet } from "@/db/logs";
import { listProposals } from "@/db/maxProposals";
import { athleteProgress, sessionSummary } from "@/db/progress";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Training log" };

function missing(e: unknown): never {
  if (e instanceof DomainError && e.code === "not_found") notFound();
  throw e;
}

/** One athlete's log for their coach: progress, proposed max changes, and any session's sets (`?session=`). */
export default async function AthleteLogPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ session?: string }> }) {
  const { id } = await params;
  const { session } = await searchParams;
  const viewer = await pageViewer(["coach"], `/coach/athletes/${id}/log`);
  const db = getDb();
  const [progress, proposals] = await Promise.all([athleteProgress(db, viewer, id), listProposals(db, viewer, id)]).catch(missing);
  const sheet = session ? await getLogSheet(db, viewer, session).catch(missing) : null;
  if (sheet && sheet.session.athleteId !== id) notFound();
  const summary = sheet?.session.completedAt ? await sessionSummary(db, viewer, sheet.session.id) : null;
  return (
    <>
      <PageTitle
        title={`${progress.athlete.name}: training log`}
        lead="Estimated maxes, volume, personal bests and every session logged."
        actions={
          <Link href="/coach/dashboard" className="btn-quiet">
            ← Roster
          </Link>
        }
      />
      {proposals.length > 0 ? (
        <div className="mb-4">
          <ProposalPanel proposals={proposals} canDecide />
        </div>
      ) : null}
      {sheet ? (
        <section className="mb-6" aria-label="Session log" data-testid="coach-session-log">
          <div className="mb-2 flex justify-end">
            <Link href={`/coach/athletes/${id}/log`} className="text-sm font-semibold text-ember-600">
              Close this session
            </Link>
          </div>
          <LogSession key={sheet.session.id} initial={sheet} initialSummary={null} historyHref={`/coach/athletes/${id}/log`} />
          {summary ? <p className="mx-auto mt-2 max-w-2xl text-sm text-iron-500">Finished: {summary.totals.workSetsDone} of {summary.totals.workSetsPlanned} work sets, {summary.totals.volume.toLocaleString("en-GB")} {summary.units} volume.</p> : null}
        </section>
      ) : null}
      <ProgressView progress={progress} sessionHref={(sid) => `/coach/athletes/${id}/log?session=${sid}`} emptyText={`When ${progress.athlete.name} logs a session, their estimated maxes, volume and personal bests show here.`} />
    </>
  );
}
