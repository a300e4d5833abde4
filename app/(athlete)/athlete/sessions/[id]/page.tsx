import Link from "next/link";
import { notFound } from "next/navigation";
import { SessionDetailView } from "@/components/session/SessionDetailView";
import { getDb } from "@/db/client";
import { DomainError } from "@/db/domainError";
import { getSession, type SessionDetail } from "@/db/sessions";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Session" };
export const dynamic = "force-dynamic";

export default async function AthleteSessionPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const viewer = await pageViewer(["athlete"], `/athlete/sessions/${id}`);
  let session: SessionDetail;
  try {
    session = await getSession(getDb(), viewer, id);
  } catch (err) {
    if (err instanceof DomainError && err.code === "not_found") notFound();
    throw err;
  }
  return (
    <SessionDetailView
      session={session}
      title={session.day}
      back={
        <Link href={`/athlete/calendar?month=${session.date.slice(0, 7)}`} className="inline-flex min-h-11 items-center text-base font-semibold text-ember-700 underline">
          ← Calendar
        </Link>
      }
      action={
        <Link href={`/athlete/sessions/${session.id}/log`} className="btn-primary min-h-12 px-5 text-base" data-testid="log-session">
          {session.completed ? "See what you logged" : "Log this session"}
        </Link>
      }
    />
  );
}
