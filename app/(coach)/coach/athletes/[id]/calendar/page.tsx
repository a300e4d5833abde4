import Link from "next/link";
import { notFound } from "next/navigation";
import { PageTitle } from "@/components/AppShell";
import { CalendarBody } from "@/components/calendar/CalendarBody";
import { FeedPanel } from "@/components/calendar/FeedPanel";
import { getDb } from "@/db/client";
import { findAthleteFor } from "@/db/athleteAccess";
import { getFeed } from "@/db/calendarFeeds";
import { listSessions } from "@/db/sessions";
import { feedPath } from "@/app/api/calendar/_lib/paths";
import { calendarView } from "@/lib/calendar";
import { pageViewer } from "@/server/guard";
import { TimeZoneSync } from "@/components/calendar/TimeZoneSync";
import { viewerToday } from "@/components/calendar/viewerToday";

export const metadata = { title: "Athlete calendar" };
export const dynamic = "force-dynamic";

type Search = Promise<Record<string, string | string[] | undefined>>;
const first = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

export default async function CoachAthleteCalendarPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Search }) {
  const { id } = await params;
  const viewer = await pageViewer(["coach"], `/coach/athletes/${id}/calendar`);
  const db = getDb();
  const athlete = await findAthleteFor(db, viewer, id);
  if (!athlete) notFound();
  const sp = await searchParams;
  const view = calendarView({ month: first(sp.month), week: first(sp.week) }, await viewerToday());
  const [items, feed] = await Promise.all([listSessions(db, viewer, id, view.from, view.to), getFeed(db, viewer, id)]);
  const base = `/coach/athletes/${id}`;
  return (
    <>
      <p className="mb-2">
        <Link href={base} className="text-sm font-semibold text-ember-700 underline">
          ← {athlete.name}
        </Link>
      </p>
      <PageTitle title={`${athlete.name} · calendar`} lead="Their sessions by week and month. Open one to see its loads or move it to another day." />
      <TimeZoneSync />
      <CalendarBody view={view} items={items} basePath={`${base}/calendar`} sessionHref={`${base}/sessions/`} />
      <div className="mt-8">
        <FeedPanel athleteId={id} athleteName={athlete.name} initial={feed ? { url: feedPath(feed.token) } : null} />
      </div>
    </>
  );
}
