/**
 * One dated session as its athlete and their coach both see it: heading,
 * card download, the caution, the whole plan and the move control. The page
 * gives what differs: the way back, the title and its own first action.
 */
import type { ReactNode } from "react";
import { PageTitle } from "@/components/AppShell";
import { SessionCardDownload } from "@/components/cards/CardDownload";
import { Caution } from "@/components/Caution";
import type { SessionDetail } from "@/db/sessions";
import { MoveSession } from "./MoveSession";
import { SessionMeta } from "./SessionMeta";
import { SessionPlan } from "./SessionPlan";

export function SessionDetailView({ session, back, title, action }: { session: SessionDetail; back: ReactNode; title: string; action: ReactNode }) {
  return (
    <div className="mx-auto max-w-3xl">
      <p className="mb-2">{back}</p>
      <PageTitle title={title} />
      <div className="-mt-4 mb-4">
        <SessionMeta session={session} />
      </div>
      <div className="mb-4 flex flex-wrap gap-3" data-testid="session-actions">
        {action}
        <SessionCardDownload sessionId={session.id} />
      </div>
      <Caution className="mb-4" />
      <SessionPlan plan={session.plan} />
      <section className="panel mt-8 p-4" aria-labelledby="move-heading">
        <h2 id="move-heading" className="mb-2 text-lg font-bold text-iron">
          Move to another date
        </h2>
        <MoveSession sessionId={session.id} date={session.date} completed={session.completed} />
      </section>
    </div>
  );
}
