import Link from "next/link";
import { PageTitle } from "@/components/AppShell";
import { Caution } from "@/components/Caution";
import { EmptyState } from "@/components/EmptyState";
import { dayDate, longDate } from "@/components/session/dates";
import { SessionMeta } from "@/components/session/SessionMeta";
import { SessionPlan } from "@/components/session/SessionPlan";
import { getDb } from "@/db/client";
import { nextSession, sessionsOn } from "@/db/sessions";
import { addDays } from "@/lib/dates";
import { pageViewer } from "@/server/guard";
import { TimeZoneSync } from "@/components/calendar/TimeZoneSync";
import { viewerToday } from "@/components/calendar/viewerToday";

export const metadata = { title: "Today" };
export const dynamic = "force-dynamic";

/** What to lift today, readable at arm's length between sets; on a rest day, when the next session is. */
export default async function AthleteToday() {
  const viewer = await pageViewer(["athlete"], "/athlete");
  const db = getDb();
  const today = await viewerToday();
  const [sessions, next] = await Promise.all([sessionsOn(db, viewer, viewer.id, today), nextSession(db, viewer, viewer.id, addDays(today, 1))]);
  return (
    <div className="mx-auto max-w-3xl">
      <TimeZoneSync />
      <PageTitle title="Today" lead={longDate(today)} />
      {sessions.length > 0 ? (
        <>
          <Caution className="mb-4" />
          <div className="space-y-8">
            {sessions.map((s) => (
              <article key={s.id} aria-labelledby={`today-${s.id}`} data-testid="today-session">
                <header className="mb-3">
                  <h2 id={`today-${s.id}`} className="text-2xl font-bold text-iron">
                    {s.day}
                  </h2>
                  <SessionMeta session={s} />
                </header>
                <SessionPlan plan={s.plan} />
                <div className="mt-4 flex flex-col gap-3 sm:flex-row">
                  <Link href={`/athlete/sessions/${s.id}/log`} className="btn-primary min-h-14 w-full text-lg sm:w-auto" data-testid="log-today">
                    {s.completed ? "See what you logged" : "Log this session"}
                  </Link>
                  <Link href={`/athlete/sessions/${s.id}`} className="btn min-h-14 w-full text-lg sm:w-auto" data-testid="open-session">
                    Session details
                  </Link>
                </div>
              </article>
            ))}
          </div>
          {next ? <NextUp date={next.date} title={next.title} id={next.id} /> : null}
        </>
      ) : next ? (
        <section className="panel px-5 py-8 text-center" data-testid="rest-day">
          <h2 className="text-2xl font-bold text-iron">Rest day</h2>
          <p className="mt-2 text-lg text-iron">
            Next session: <span className="font-semibold">{dayDate(next.date)}</span>
          </p>
          <p className="text-base text-iron-700">{next.title}</p>
          <Link href={`/athlete/sessions/${next.id}`} className="btn-primary mt-5 min-h-14 px-6 text-lg" data-testid="next-session-link">
            See the next session
          </Link>
        </section>
      ) : (
        <EmptyState title="Nothing planned for today">
          When your coach assigns you a programme, today&apos;s session shows here with your own loads and the plates for each side of the bar.
        </EmptyState>
      )}
      {/* The caution stays on a rest day too: the next session's loads are a tap away. */}
      {sessions.length === 0 ? <Caution className="mt-6" /> : null}
      <p className="mt-6 text-center">
        <Link href="/athlete/calendar" className="inline-flex min-h-11 items-center text-base font-semibold text-ember-700 underline">
          Calendar
        </Link>
      </p>
    </div>
  );
}

function NextUp({ id, date, title }: { id: string; date: string; title: string }) {
  return (
    <p className="mt-8 border-t border-chalk-300 pt-4 text-base text-iron">
      Next:{" "}
      <Link href={`/athlete/sessions/${id}`} className="font-semibold text-ember-700 underline" data-testid="next-session-link">
        {dayDate(date)} — {title}
      </Link>
    </p>
  );
}
