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
    <div className="mx-auto max-w-3xl">
      <p className="mb-2">
        <Link href={`/athlete/calendar?month=${session.date.slice(0, 7)}`} className="inline-flex min-h-11 items-center text-base font-semibold text-ember-700 underline">
          ← Calendar
        </Link>
      </p>
      <PageTitle title={session.day} />
      <div className="-mt-4 mb-4">
        <SessionMeta session={session} />
      </div>
      <div className="mb-4 flex flex-wrap gap-3" data-testid="session-actions">
        <Link href={`/athlete/sessions/${session.id}/log`} className="btn-primary min-h-12 px-5 text-base" data-testid="log-session">
          {session.completed ? "See what you logged" : "Log this session"}
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
