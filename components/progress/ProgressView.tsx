import Link from "next/link";
import type { ReactNode } from "react";
import { Caution } from "@/components/Caution";
import { EmptyState } from "@/components/EmptyState";
import type { AthleteProgress } from "@/db/progress";
import { E1rmChart } from "./E1rmChart";
import { VolumeChart } from "./VolumeChart";

const DATE = new Intl.DateTimeFormat("en-GB", { weekday: "short", day: "numeric", month: "short", timeZone: "UTC" });
const day = (d: string) => DATE.format(new Date(`${d}T00:00:00Z`));
const fmt = (n: number) => (Number.isInteger(n) ? String(n) : n.toFixed(1));

function Card({ title, children, testId }: { title: string; children: ReactNode; testId?: string }) {
  return (
    <section className="panel p-4" data-testid={testId}>
      <h2 className="mb-2 text-base font-bold text-iron">{title}</h2>
      {children}
    </section>
  );
}

/**
 * An athlete's progress, the same for them and their coach: estimated 1RM per
 * exercise, weekly volume, personal bests, stalled lifts and the sessions
 * logged, each linking to its log.
 */
export function ProgressView({ progress, sessionHref, emptyText }: { progress: AthleteProgress; sessionHref: (id: string) => string; emptyText: string }) {
  const { units } = progress;
  if (progress.sessions.length === 0) {
    return <EmptyState title="Nothing logged yet">{emptyText}</EmptyState>;
  }
  const pbs = progress.exercises
    .flatMap((e) => e.points.filter((p) => p.pb).map((p) => ({ ...p, name: e.name })))
    .sort((a, b) => b.date.localeCompare(a.date))
    .slice(0, 8);
  return (
    <div className="grid gap-4 lg:grid-cols-2">
      {progress.exercises.length > 0 ? (
        <Card title="Estimated 1RM">
          <E1rmChart exercises={progress.exercises} units={units} />
        </Card>
      ) : null}
      <Card title="Weekly volume">
        <VolumeChart weeks={progress.weeks} units={units} />
        <p className="mt-1 text-xs text-iron-400">Reps × load of work sets, per week (Monday to Sunday), in {units}.</p>
      </Card>
      {pbs.length > 0 || progress.stalls.length > 0 ? (
        <Card title="Personal bests" testId="personal-bests">
          {pbs.length > 0 ? (
            <ul className="divide-y divide-chalk-200">
              {pbs.map((p) => (
                <li key={`${p.sessionId}-${p.name}`} className="flex items-baseline justify-between gap-2 py-1.5 text-sm">
                  <span>
                    <span className="mr-1 text-brass-500">★</span>
                    <span className="font-semibold first-letter:uppercase">{p.name}</span>
                  </span>
                  <span className="font-mono text-iron-600">
                    {fmt(p.e1rm)} {units} <span className="text-xs text-iron-400">({fmt(p.load)}×{p.reps}, {day(p.date)})</span>
                  </span>
                </li>
              ))}
            </ul>
          ) : (
            <p className="text-sm text-iron-500">No new bests yet: they show when a session beats every earlier one.</p>
          )}
          {progress.stalls.length > 0 ? (
            <p className="mt-3 rounded-lg bg-chalk-100 px-3 py-2 text-sm text-iron-600" data-testid="stalls">
              No new best in three weeks: {progress.stalls.map((s) => `${s.exercise} (${fmt(s.best)} ${units} since ${day(s.since)})`).join(", ")}.
            </p>
          ) : null}
        </Card>
      ) : null}
      <section className="panel lg:col-span-2" data-testid="logged-sessions">
        <h2 className="border-b border-chalk-200 px-4 py-3 text-base font-bold text-iron">Logged sessions</h2>
        <ul className="divide-y divide-chalk-200">
          {progress.sessions.map((s) => (
            <li key={s.id} data-testid="logged-session">
              <Link href={sessionHref(s.id)} className="block px-4 py-3 hover:bg-chalk-50">
                <div className="flex flex-wrap items-baseline justify-between gap-2">
                  <span className="font-semibold text-iron">{s.title}</span>
                  <span className="text-sm text-iron-500">
                    {day(s.date)}
                    {s.completed ? <span className="ml-2 rounded bg-moss-100 px-1.5 py-0.5 text-[10px] font-semibold uppercase text-moss-700">finished</span> : <span className="ml-2 rounded bg-chalk-200 px-1.5 py-0.5 text-[10px] font-semibold uppercase text-iron-500">in progress</span>}
                  </span>
                </div>
                <ul className="mt-1 space-y-0.5">
                  {s.exercises.map((e, i) => (
                    <li key={i} className="text-sm">
                      <span className="font-medium first-letter:uppercase">{e.name}</span>
                      {e.swappedFrom ? <span className="text-xs text-iron-400"> (for {e.swappedFrom})</span> : null}
                      {e.pb ? <span className="ml-1 rounded bg-brass-100 px-1 text-[10px] font-bold uppercase text-brass-500">best</span> : null}
                      <span className="ml-2 font-mono text-xs text-iron-500">{e.sets}</span>
                    </li>
                  ))}
                </ul>
                <p className="mt-1 font-mono text-xs text-iron-400">
                  {s.setsDone} work sets · {s.volume.toLocaleString("en-GB")} {units}
                </p>
              </Link>
            </li>
          ))}
        </ul>
      </section>
      <Caution className="lg:col-span-2" />
    </div>
  );
}
