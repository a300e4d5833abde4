import { PageTitle } from "@/components/AppShell";
import { CalendarBody } from "@/components/calendar/CalendarBody";
import { WeekCardsDownload } from "@/components/cards/CardDownload";
import { FeedPanel } from "@/components/calendar/FeedPanel";
import { getDb } from "@/db/client";
import { getFeed } from "@/db/calendarFeeds";
import { listSessions } from "@/db/sessions";
import { feedPath } from "@/app/api/calendar/_lib/paths";
import { calendarView } from "@/lib/calendar";
import { pageViewer } from "@/server/guard";
import { TimeZoneSync } from "@/components/calendar/TimeZoneSync";
import { viewerToday } from "@/components/calendar/viewerToday";

export const metadata = { title: "Calendar" };
export const dynamic = "force-dynamic";

type Search = Promise<Record<string, string | string[] | undefined>>;
const first = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

export default async function AthleteCalendarPage({ searchParams }: { searchParams: Search }) {
  const viewer = await pageViewer(["athlete"], "/athlete/calendar");
  const sp = await searchParams;
  const today = await viewerToday();
  const view = calendarView({ month: first(sp.month), week: first(sp.week) }, today);
  // Cards print the week in view, or this week when a month is shown.
  const cardsFrom = view.kind === "week" ? view.from : today;
  const db = getDb();
  const [items, feed] = await Promise.all([listSessions(db, viewer, viewer.id, view.from, view.to), getFeed(db, viewer, viewer.id)]);
  return (
    <>
      <PageTitle title="Calendar" lead="Your sessions by week and month. Tap one to see its lifts and loads, or to move it." />
      <TimeZoneSync />
      <CalendarBody view={view} items={items} basePath="/athlete/calendar" sessionHref="/athlete/sessions/" />
      <section className="panel mt-8 space-y-3 p-4" aria-labelledby="cards-heading">
        <h2 id="cards-heading" className="text-lg font-bold text-iron">
          Cards to print
        </h2>
        <p className="text-sm text-iron-500">One card per session with your loads, the plates for each side and boxes to write what you did.</p>
        <div className="flex flex-wrap gap-3">
          <WeekCardsDownload athleteId={viewer.id} from={cardsFrom} />
          <WeekCardsDownload athleteId={viewer.id} from={cardsFrom} weeks={4} />
        </div>
      </section>
      <div className="mt-8">
        <FeedPanel athleteId={null} initial={feed ? { url: feedPath(feed.token) } : null} />
      </div>
    </>
  );
}
