"use client";
import Link from "next/link";
import { memo, useMemo, useState } from "react";
import { exerciseKey } from "@/lib/exercises/resolve";
import type { PreviewAthlete } from "./usePreviewAthlete";

type Units = "kg" | "lb";

/**
 * Who the preview works loads for: the sample athlete, whose unit and 1RMs are
 * edited in place, or one of the coach's athletes, shown with their own gym
 * and current maxes (changed on the athlete's page, not here).
 */
export const PreviewAthletePanel = memo(function PreviewAthletePanel(props: {
  athlete: PreviewAthlete;
  units: Units;
  onUnits(u: Units): void;
  maxes: Record<string, number>;
  onMaxes(m: Record<string, number>): void;
  names: readonly string[];
}) {
  const { athlete } = props;
  const [open, setOpen] = useState(false);
  const rows = [...new Set(props.names)].sort();
  const real = athlete.chosenId !== null ? athlete.profile : null;
  // Found the way lib/load finds a max: a max stored as "incline press" serves "incline bench press".
  const maxOf = useMemo(() => {
    const byKey = new Map(Object.entries(real?.maxes ?? {}).map(([name, v]) => [exerciseKey(name), v]));
    return (name: string) => byKey.get(exerciseKey(name));
  }, [real]);
  const missing = real ? rows.filter((n) => maxOf(n) === undefined) : [];

  return (
    <div className="panel px-3 py-2 text-sm">
      <div className="flex flex-wrap items-center gap-x-3 gap-y-2">
        <label className="flex items-center gap-1.5 font-semibold">
          Preview for
          <select
            value={athlete.chosenId ?? ""}
            onChange={(e) => athlete.choose(e.target.value || null)}
            className="max-w-[12rem] rounded border border-iron-200 bg-white px-1.5 py-1 font-normal text-iron"
          >
            <option value="">Sample athlete</option>
            {athlete.roster.map((a) => (
              <option key={a.id} value={a.id}>{a.name}</option>
            ))}
          </select>
        </label>
        {athlete.chosenId === null ? (
          <label className="flex items-center gap-1 text-iron-500">
            units
            <select value={props.units} onChange={(e) => props.onUnits(e.target.value as Units)} className="rounded border border-iron-200 bg-white px-1.5 py-1 text-iron">
              <option value="kg">kg</option>
              <option value="lb">lb</option>
            </select>
          </label>
        ) : real ? (
          <span className="text-iron-500" data-testid="preview-gym">{real.units} · {real.bar} {real.units} bar</span>
        ) : athlete.loading ? (
          <span className="text-iron-400" role="status">Loading maxes…</span>
        ) : null}
        <button type="button" className="ml-auto text-sm font-semibold text-ember-600 hover:underline" aria-expanded={open} onClick={() => setOpen(!open)}>
          {open ? "Hide maxes" : athlete.chosenId === null ? "Edit maxes" : "Show maxes"}
        </button>
      </div>
      {athlete.problem ? <p className="mt-1.5 text-ember-700" role="alert">{athlete.problem}</p> : null}
      {missing.length > 0 ? (
        <p className="mt-1.5 text-iron-500" data-testid="preview-missing">
          No max on file for {missing.length === 1 ? missing[0] : `${missing.length} of these lifts`}, so {missing.length === 1 ? "its load is" : "their loads are"} left empty.
        </p>
      ) : null}
      {open && rows.length === 0 ? <p className="mt-2 text-iron-400">Lifts with a % or effort target appear here.</p> : null}
      {open && rows.length > 0 && athlete.chosenId === null ? <SampleMaxes rows={rows} {...props} /> : null}
      {open && rows.length > 0 && real ? (
        <>
          <dl className="mt-2 grid grid-cols-1 gap-x-4 gap-y-1.5 sm:grid-cols-2">
            {rows.map((name) => (
              <div key={name} className="flex items-center justify-between gap-2">
                <dt className="truncate capitalize">{name}</dt>
                <dd className={maxOf(name) === undefined ? "text-iron-400" : "font-mono"}>
                  {maxOf(name) === undefined ? "no max" : `${maxOf(name)} ${real.units}`}
                </dd>
              </div>
            ))}
          </dl>
          {/* A new tab keeps the editor as it is; the maxes are fetched again when the coach comes back. */}
          <Link href={`/coach/athletes/${athlete.chosenId}`} target="_blank" rel="noopener" className="mt-2 inline-block font-semibold text-ember-600 hover:underline">
            Change {real.name.split(" ")[0]}&rsquo;s maxes<span className="sr-only"> (opens in a new tab)</span>
          </Link>
        </>
      ) : null}
    </div>
  );
});

function SampleMaxes(props: { rows: string[]; units: Units; maxes: Record<string, number>; onMaxes(m: Record<string, number>): void }) {
  return (
    <div className="mt-2 grid grid-cols-1 gap-x-4 gap-y-1.5 sm:grid-cols-2">
      {props.rows.map((name) => (
        <label key={name} className="flex items-center justify-between gap-2">
          <span className="truncate capitalize">{name}</span>
          <span className="flex items-center gap-1">
            <input
              type="number"
              inputMode="decimal"
              min={0}
              step="any"
              aria-label={`1RM for ${name}`}
              value={props.maxes[name] ?? ""}
              placeholder="1RM"
              onChange={(e) => {
                const v = e.target.valueAsNumber;
                const next = { ...props.maxes };
                if (Number.isFinite(v) && v > 0) next[name] = v;
                else delete next[name];
                props.onMaxes(next);
              }}
              className="w-20 rounded border border-iron-200 px-2 py-1 text-right font-mono"
            />
            <span className="w-5 text-xs text-iron-400">{props.units}</span>
          </span>
        </label>
      ))}
    </div>
  );
}
