import type { Summary } from "./types";

const fmt = (n: number) => (Number.isInteger(n) ? String(n) : String(Math.round(n * 10) / 10));
const DATE = new Intl.DateTimeFormat("en-GB", { weekday: "long", day: "numeric", month: "long", timeZone: "UTC" });

/** What a finished session came to: sets against plan, volume, best sets, estimated maxes and personal bests. */
export function SessionSummary({ summary, proposals = 0 }: { summary: Summary; proposals?: number }) {
  const { totals, units } = summary;
  const pbs = summary.exercises.filter((e) => e.pb);
  const stat = (label: string, value: string, testId?: string) => (
    <div className="rounded-lg bg-chalk-100 px-3 py-2" data-testid={testId}>
      <dt className="text-[11px] font-semibold uppercase tracking-wider text-iron-500">{label}</dt>
      <dd className="font-mono text-xl font-bold text-iron">{value}</dd>
    </div>
  );
  return (
    <section className="panel p-4" data-testid="session-summary" aria-label="Session summary">
      <p className="text-sm font-semibold text-moss-700">✓ Session finished</p>
      <h2 className="text-xl font-bold text-iron">{summary.title}</h2>
      <p className="text-sm text-iron-500">{DATE.format(new Date(`${summary.date}T00:00:00Z`))}</p>
      <dl className="mt-3 grid grid-cols-2 gap-2 sm:grid-cols-4">
        {stat("Work sets", `${totals.workSetsDone}/${totals.workSetsPlanned}`, "summary-sets")}
        {stat("Reps", String(totals.reps))}
        {stat("Volume", `${totals.volume.toLocaleString("en-GB")} ${units}`)}
        {stat("Time", summary.minutes !== null ? `${summary.minutes} min` : "—")}
      </dl>
      {pbs.length > 0 ? (
        <p className="mt-3 rounded-lg bg-brass-100 px-3 py-2 text-sm font-semibold text-iron" data-testid="summary-pbs">
          ★ Personal best{pbs.length > 1 ? "s" : ""}: {pbs.map((p) => p.name).join(", ")}
        </p>
      ) : null}
      {proposals > 0 ? (
        <p className="mt-3 rounded-lg border border-ember-400/50 bg-ember-50 px-3 py-2 text-sm text-iron-700">
          Your recent sessions suggest a change to {proposals === 1 ? "a max" : `${proposals} maxes`}: see Progress.
        </p>
      ) : null}
      <ul className="mt-4 divide-y divide-chalk-200">
        {summary.exercises.map((e) => (
          <li key={e.index} className="py-2" data-testid="summary-exercise">
            <div className="flex items-baseline justify-between gap-2">
              <span className="font-semibold text-iron first-letter:uppercase">
                {e.name}
                {e.pb ? <span className="ml-1.5 rounded bg-brass-100 px-1.5 py-0.5 text-[10px] font-bold uppercase text-brass-500">best</span> : null}
              </span>
              <span className="font-mono text-sm text-iron-500">
                {e.setsDone}/{e.workSets} sets
              </span>
            </div>
            <p className="font-mono text-xs text-iron-500">
              {e.name !== e.plannedName ? `instead of ${e.plannedName} · ` : ""}
              {e.top ? `top ${e.top.bodyweight ? `BW+${fmt(e.top.load)}` : `${fmt(e.top.load)} ${units}`} × ${e.top.reps}${e.top.rir !== null ? ` @${e.top.rir} RIR` : ""}` : "not logged"}
              {e.e1rm !== null ? ` · e1RM ${fmt(e.e1rm)} ${units}` : ""}
            </p>
            {e.note ? <p className="mt-0.5 text-xs text-iron-600 italic">{e.note}</p> : null}
          </li>
        ))}
      </ul>
    </section>
  );
}
