import Link from "next/link";
import { notFound } from "next/navigation";
import { PageTitle } from "@/components/AppShell";
import { SessionCardDownload } from "@/components/cards/CardDownload";
import { Caution } from "@/components/Caution";
import { MoveSession } from "@/components/session/MoveSession";
import { SessionMeta } from "@/components/session/SessionMeta";
import { SessionPlan } from "@/components/session/SessionPlan";
import { getDb } from "@/db/client";
import { DomainError } from "@/db/domainError";
import { getSession, type SessionDetail } from "@/db/sessions";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Athlete session" };
export const dynamic = "force-dynamic";

/** The coach's view of one of their athlete's sessions: the same plan the athlete sees, and the move control. */
export default async function CoachSessionPage({ params }: { params: Promise<{ id: string; sessionId: string }> }) {
  const { id, sessionId } = await params;
  const viewer = await pageViewer(["coach"], `/coach/athletes/${id}/sessions/${sessionId}`);
  let session: SessionDetail;
  try {
    session = await getSession(getDb(), viewer, sessionId);
  } catch (err) {
    if (err instanceof DomainError && err.code === "not_found") notFound();
    throw err;
  }
  // The path names the athlete; a session of another athlete is not at this address.
  if (session.athleteId !== id) notFound();
  return (
    <div className="mx-auto max-w-3xl">
      <p className="mb-2">
        <Link href={`/coach/athletes/${id}/calendar?month=${session.date.slice(0, 7)}`} className="text-sm font-semibold text-ember-700 underline">
          ← {session.athleteName}’s calendar
        </Link>
      </p>
      <PageTitle title={`${session.athleteName} · ${session.day}`} />
      <div className="-mt-4 mb-4">
        <SessionMeta session={session} />
      </div>
      <div className="mb-4 flex flex-wrap gap-3" data-testid="session-actions">
        <Link href={`/coach/athletes/${id}/log?session=${session.id}`} className="btn">
          Logged sets
        </Link>
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
