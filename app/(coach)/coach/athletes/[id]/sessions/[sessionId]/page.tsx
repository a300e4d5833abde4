import Link from "next/link";
import { notFound } from "next/navigation";
import { SessionDetailView } from "@/components/session/SessionDetailView";
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
    <SessionDetailView
      session={session}
      title={`${session.athleteName} · ${session.day}`}
      back={
        <Link href={`/coach/athletes/${id}/calendar?month=${session.date.slice(0, 7)}`} className="text-sm font-semibold text-ember-700 underline">
          ← {session.athleteName}’s calendar
        </Link>
      }
      action={
        <Link href={`/coach/athletes/${id}/log?session=${session.id}`} className="btn">
          Logged sets
        </Link>
      }
    />
  );
}
