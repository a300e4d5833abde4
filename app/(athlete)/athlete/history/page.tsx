import { PageTitle } from "@/components/AppShell";
import { ProgressView } from "@/components/progress/ProgressView";
import { ProposalPanel } from "@/components/progress/ProposalPanel";
import { requireAthleteFor } from "@/db/athleteAccess";
import { getDb } from "@/db/client";
import { listProposals } from "@/db/maxProposals";
import { athleteProgress } from "@/db/progress";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Progress" };

/** The athlete's own progress: estimated maxes, volume, personal bests and every session logged. */
export default async function HistoryPage() {
  const viewer = await pageViewer(["athlete"], "/athlete/history");
  const db = getDb();
  const [me, progress, proposals] = await Promise.all([requireAthleteFor(db, viewer, viewer.id), athleteProgress(db, viewer, viewer.id), listProposals(db, viewer, viewer.id)]);
  return (
    <>
      <PageTitle title="Progress" lead="Your estimated maxes, weekly volume and personal bests, worked out from the sets you log." />
      {proposals.length > 0 ? (
        <div className="mb-4">
          <ProposalPanel proposals={proposals} canDecide={me.coachId === null} />
        </div>
      ) : null}
      <ProgressView progress={progress} sessionHref={(id) => `/athlete/sessions/${id}/log`} emptyText="Log a session and your estimated maxes, volume and personal bests start to show here." />
    </>
  );
}
