"use client";
import Link from "next/link";
import { useCallback, useMemo, useState } from "react";
import { Caution } from "@/components/Caution";
import { describeFailure } from "@/components/templates/api";
import { ExerciseCard } from "./ExerciseCard";
import { variantOf } from "./plan";
import { RestTimer, type Rest } from "./RestTimer";
import { SessionSummary } from "./SessionSummary";
import { SyncBanner } from "./SyncBanner";
import type { LogSheet, SetValues, Summary } from "./types";
import { useLogSync } from "./useLogSync";

// Rest used when the plan writes none. Common practice, no source.
const DEFAULT_REST_SECONDS = 120;
const DATE = new Intl.DateTimeFormat("en-GB", { weekday: "long", day: "numeric", month: "long", timeZone: "UTC" });

/**
 * The logging screen of one session, built for a phone held in one hand:
 * each set prefilled from the plan, ticked as it is done and saved at once
 * (kept on the phone when offline), a rest timer after each work set, swaps
 * to listed substitutes, notes, and a summary once finished.
 */
export function LogSession({ initial, initialSummary, historyHref }: { initial: LogSheet; initialSummary: Summary | null; historyHref: string }) {
  const sync = useLogSync(initial);
  const { sheet } = sync;
  const { session } = sheet;
  const readOnly = !sheet.canWrite;
  const [summary, setSummary] = useState<{ summary: Summary; proposals: number } | null>(initialSummary ? { summary: initialSummary, proposals: 0 } : null);
  const [drafts, setDrafts] = useState<Record<string, SetValues>>({});
  const [rest, setRest] = useState<Rest | null>(null);

  // The set that is open: the first work set not yet ticked, until the athlete opens another.
  const order = useMemo(
    () => session.plan.exercises.flatMap((ex, i) => variantOf(ex, sync.chosenExercise(i)).sets.map((s, j) => ({ key: `${i}:${j}`, i, j, work: s.kind === "work" }))),
    [session.plan, sync],
  );
  const nextOpen = order.find((o) => o.work && !sync.valuesOf(o.i, o.j).values.done)?.key ?? null;
  const [chosenOpen, setChosenOpen] = useState<string | null | undefined>(undefined);
  const openKey = chosenOpen === undefined ? nextOpen : chosenOpen;

  const setDraft = useCallback((key: string, v: SetValues | null) => {
    setDrafts((d) => {
      if (v) return { ...d, [key]: v };
      const { [key]: _gone, ...rest } = d;
      return rest;
    });
  }, []);

  const onTicked = useCallback(
    (i: number, j: number, done: boolean) => {
      setChosenOpen(undefined);
      const ex = session.plan.exercises[i];
      const set = variantOf(ex, sync.chosenExercise(i)).sets[j];
      if (done && set?.kind === "work") {
        const seconds = ex.restSeconds ?? DEFAULT_REST_SECONDS;
        setRest({ endsAt: Date.now() + seconds * 1000, total: seconds, after: `${sync.chosenExercise(i)}${ex.restSeconds ? "" : " (no rest written: 2 min)"}` });
      }
    },
    [session.plan, sync],
  );

  const counts = order.reduce((c, o) => (o.work ? { all: c.all + 1, done: c.done + (sync.valuesOf(o.i, o.j).values.done ? 1 : 0) } : c), { all: 0, done: 0 });

  if (summary) {
    return (
      <div className="mx-auto max-w-2xl space-y-4">
        <SessionSummary summary={summary.summary} proposals={summary.proposals} />
        <div className="flex flex-wrap gap-2">
          <Link href={historyHref} className="btn-primary h-12">
            See your progress
          </Link>
          {readOnly ? null : (
            <button type="button" className="btn-quiet h-12" onClick={() => setSummary(null)}>
              Back to the log
            </button>
          )}
        </div>
        <Caution />
      </div>
    );
  }

  const finish = () =>
    sync.finish.mutate(undefined, {
      onSuccess: (r) => {
        setRest(null);
        setSummary({ summary: r.summary, proposals: r.proposals });
        window.scrollTo({ top: 0 });
      },
    });
  const canFinish = sync.online && sync.pending === 0 && sync.failed.length === 0 && counts.done > 0;

  return (
    <div className="mx-auto max-w-2xl pb-32">
      {readOnly ? null : <SyncBanner online={sync.online} pending={sync.pending} failed={sync.failed.length} trouble={sync.trouble} onRetryAll={sync.flush} />}
      <header className="mb-4">
        <p className="text-sm text-iron-500">{DATE.format(new Date(`${session.date}T00:00:00Z`))}</p>
        <h1 className="text-2xl font-bold tracking-tight text-iron">{session.title}</h1>
        {readOnly ? <p className="text-sm text-iron-500">{session.athleteName}&apos;s log — read only.</p> : null}
        <div className="mt-2 flex items-center gap-3">
          <div className="h-2 flex-1 overflow-hidden rounded-full bg-chalk-300" aria-hidden="true">
            <div className="h-2 rounded-full bg-moss-500 transition-all" style={{ width: `${counts.all ? (counts.done / counts.all) * 100 : 0}%` }} />
          </div>
          <span className="font-mono text-sm text-iron-600" data-testid="log-progress">
            {counts.done} of {counts.all} sets
          </span>
        </div>
        {session.plan.deload ? <p className="mt-2 inline-block rounded bg-moss-100 px-2 py-0.5 text-xs font-semibold text-moss-700">Deload week: lighter on purpose</p> : null}
        {session.plan.warmupNotes.length ? <p className="mt-2 text-sm text-iron-600">Warm-up: {session.plan.warmupNotes.join(" · ")}</p> : null}
      </header>
      <Caution className="mb-4" />
      <div className="space-y-4">
        {session.plan.exercises.map((ex, i) => (
          <ExerciseCard
            key={i}
            index={i}
            ex={ex}
            units={session.units}
            sync={sync}
            drafts={drafts}
            setDraft={setDraft}
            openKey={openKey}
            setOpenKey={(k) => setChosenOpen(k)}
            onTicked={onTicked}
            readOnly={readOnly}
          />
        ))}
      </div>
      {readOnly ? null : (
        <div className="mt-6 space-y-2">
          <button type="button" className="btn-primary h-14 w-full text-base" data-testid="finish-session" disabled={!canFinish || sync.finish.isPending} onClick={finish}>
            {sync.finish.isPending ? "Finishing…" : session.completedAt ? "Update the summary" : "Finish session"}
          </button>
          <p className="text-center text-xs text-iron-500">
            {!sync.online
              ? "Finish when you're back online — your sets are kept on this phone."
              : counts.done === 0
                ? "Tick at least one set to finish."
                : sync.pending > 0
                  ? "Waiting for your sets to save…"
                  : `${counts.done} of ${counts.all} work sets ticked. Unticked sets count as not done.`}
          </p>
          {sync.finish.isError ? (
            <p className="field-error text-center" role="alert">
              {describeFailure(sync.finish.error)}
            </p>
          ) : null}
        </div>
      )}
      <RestTimer rest={rest} onChange={setRest} />
    </div>
  );
}
