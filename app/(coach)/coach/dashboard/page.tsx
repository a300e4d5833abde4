import Link from "next/link";
import { PageTitle } from "@/components/AppShell";
import { EmptyState } from "@/components/EmptyState";
import { DashboardTable } from "@/components/progress/DashboardTable";
import { getDb } from "@/db/client";
import { coachDashboard } from "@/db/dashboard";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Who trained" };

/** Who trained this week, who missed, whose sets fell short, whose lifts stalled. */
export default async function DashboardPage() {
  const viewer = await pageViewer(["coach"], "/coach/dashboard");
  const dashboard = await coachDashboard(getDb(), viewer);
  const flagged = dashboard.rows.filter((r) => r.flags.length > 0).length;
  return (
    <>
      <PageTitle
        title="Who trained"
        lead={dashboard.rows.length === 0 ? "How your athletes' training is going." : `${dashboard.rows.length} athlete${dashboard.rows.length === 1 ? "" : "s"}; ${flagged === 0 ? "nobody needs a look right now" : `${flagged} need${flagged === 1 ? "s" : ""} a look`}.`}
      />
      {dashboard.rows.length === 0 ? (
        <EmptyState title="No athletes on your roster" action={<Link href="/coach/athletes" className="btn-primary">Go to athletes</Link>}>
          Once athletes accept your invitation and start logging, this table shows who trained, who missed and whose lifts stalled.
        </EmptyState>
      ) : (
        <DashboardTable rows={dashboard.rows} weekOf={dashboard.weekOf} />
      )}
    </>
  );
}
