"use client";
import { useQuery, useQueryClient } from "@tanstack/react-query";
import { Fragment, useState } from "react";
import type { DeleteMaxResponse, MaxEntry, MaxesResponse, Units } from "@/app/api/athletes/types";
import { api, describeFailure } from "@/components/templates/api";
import type { KnownName } from "@/lib/athlete/exerciseMatch";
import { AddMaxForm } from "./AddMaxForm";
import { inAthleteUnit, KIND_LABEL, mass, recomputedText, SOURCE_LABEL } from "./format";

export const maxesKey = (athleteId: string) => ["athlete-maxes", athleteId] as const;

/** Current maxes (the latest measured per exercise), each exercise's full history, and a form to add one. */
export function MaxesPanel({ athleteId, initial, names }: { athleteId: string; initial: MaxesResponse; names: KnownName[] }) {
  const client = useQueryClient();
  const query = useQuery({ queryKey: maxesKey(athleteId), queryFn: () => api<MaxesResponse>(`/api/athletes/${athleteId}/maxes`), initialData: initial });
  const [open, setOpen] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const data = query.data;

  async function changed(message: string) {
    setNotice(message);
    await client.invalidateQueries({ queryKey: maxesKey(athleteId) });
  }

  return (
    <div className="space-y-6">
      {notice ? <p role="status" className="rounded-md bg-moss-100 px-3 py-2 text-sm text-moss-700">{notice}</p> : null}
      {query.isError ? <p className="text-sm text-ember-700">The maxes could not be loaded. {describeFailure(query.error)}</p> : null}
      {data.history.length === 0 ? (
        <p className="text-sm text-iron-500">No maxes on file yet. Loads worked from a percentage of a max stay blank until one is added below or imported from a file.</p>
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full text-left text-sm" data-testid="current-maxes">
            <caption className="sr-only">Current maxes</caption>
            <thead className="border-b border-chalk-200 text-xs uppercase tracking-wider text-iron-400">
              <tr>
                <th scope="col" className="py-2 pr-3 font-semibold">Exercise</th>
                <th scope="col" className="py-2 pr-3 font-semibold">Current max</th>
                <th scope="col" className="hidden py-2 pr-3 font-semibold sm:table-cell">Measured</th>
                <th scope="col" className="hidden py-2 pr-3 font-semibold sm:table-cell">Source</th>
                <th scope="col" className="py-2 font-semibold"><span className="sr-only">History</span></th>
              </tr>
            </thead>
            <tbody className="divide-y divide-chalk-200">
              {data.history.map((g) => {
                const current = g.entries[0];
                const expanded = open === g.exerciseKey;
                return (
                  <Fragment key={g.exerciseKey}>
                    <tr>
                      <td className="py-2.5 pr-3 font-semibold text-iron">{g.exercise}</td>
                      <td className="py-2.5 pr-3">
                        <MaxValue entry={current} units={data.units} />
                        <span className="block text-xs text-iron-400 sm:hidden">{current.measuredOn}</span>
                      </td>
                      <td className="hidden py-2.5 pr-3 text-iron-600 sm:table-cell">{current.measuredOn}</td>
                      <td className="hidden py-2.5 pr-3 text-iron-600 sm:table-cell">{SOURCE_LABEL[current.source]}</td>
                      <td className="py-2.5 text-right">
                        <button type="button" className="btn-quiet px-3 py-1.5" aria-expanded={expanded} aria-controls={`hist-${g.exerciseKey}`} onClick={() => setOpen(expanded ? null : g.exerciseKey)}>
                          History ({g.entries.length})
                        </button>
                      </td>
                    </tr>
                    {expanded ? (
                      <tr id={`hist-${g.exerciseKey}`}>
                        <td colSpan={5} className="bg-chalk-50 px-2 py-3">
                          <History athleteId={athleteId} exercise={g.exercise} entries={g.entries} units={data.units} onChanged={changed} />
                        </td>
                      </tr>
                    ) : null}
                  </Fragment>
                );
              })}
            </tbody>
          </table>
        </div>
      )}
      <section aria-labelledby="add-max-h" className="border-t border-chalk-200 pt-5">
        <h3 id="add-max-h" className="mb-3 text-sm font-semibold uppercase tracking-wider text-iron-400">Add a max</h3>
        <AddMaxForm athleteId={athleteId} units={data.units} names={names} onAdded={changed} />
      </section>
    </div>
  );
}

function MaxValue({ entry, units }: { entry: MaxEntry; units: Units }) {
  const converted = inAthleteUnit(entry, units);
  return (
    <span>
      <span className="font-semibold tabular-nums">{mass(entry.value, entry.units)}</span>
      {entry.kind === "tm" ? <span className="ml-1.5 rounded bg-brass-100 px-1.5 py-0.5 text-xs font-semibold text-iron-700">{KIND_LABEL.tm}</span> : null}
      {converted ? <span className="ml-1.5 text-xs text-iron-400" title={`Loads are worked in ${units}`}>{converted}</span> : null}
    </span>
  );
}

/** Every entry for one exercise, newest first; a wrongly entered one can be deleted and the one before becomes current. */
function History({ athleteId, exercise, entries, units, onChanged }: { athleteId: string; exercise: string; entries: MaxEntry[]; units: Units; onChanged: (m: string) => Promise<void> }) {
  const [confirming, setConfirming] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);

  async function remove(entry: MaxEntry) {
    setBusy(true);
    setProblem(null);
    try {
      const res = await api<DeleteMaxResponse>(`/api/athletes/${athleteId}/maxes/${entry.id}`, { method: "DELETE" });
      setConfirming(null);
      await onChanged(`Deleted the ${exercise} entry of ${entry.measuredOn}. ${recomputedText(res.recomputed)}`);
    } catch (e) {
      setProblem(describeFailure(e));
    } finally {
      setBusy(false);
    }
  }

  return (
    <div>
      <ol className="space-y-2" aria-label={`History of ${exercise}`}>
        {entries.map((e, i) => (
          <li key={e.id} className="rounded-md border border-chalk-200 bg-white px-3 py-2">
            <div className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
              <span className="tabular-nums text-iron-600">{e.measuredOn}</span>
              <MaxValue entry={e} units={units} />
              <span className="text-xs text-iron-400">
                {KIND_LABEL[e.kind]} · {SOURCE_LABEL[e.source]}
                {e.createdBy ? ` · entered by ${e.createdBy}` : ""}
              </span>
              {i === 0 ? <span className="rounded bg-moss-100 px-1.5 py-0.5 text-xs font-semibold text-moss-700">current</span> : null}
              <span className="ml-auto">
                {confirming === e.id ? (
                  <span className="inline-flex flex-wrap items-center gap-2">
                    <span className="text-xs text-iron-600">Delete this entry?</span>
                    <button type="button" className="btn-primary px-3 py-1.5" disabled={busy} onClick={() => remove(e)}>{busy ? "Deleting…" : "Yes, delete"}</button>
                    <button type="button" className="btn-quiet px-3 py-1.5" disabled={busy} onClick={() => setConfirming(null)}>Keep</button>
                  </span>
                ) : (
                  <button type="button" className="btn-quiet px-3 py-1.5 text-ember-700" onClick={() => setConfirming(e.id)} aria-label={`Delete ${exercise} ${mass(e.value, e.units)} of ${e.measuredOn}`}>
                    Delete
                  </button>
                )}
              </span>
            </div>
            {e.note ? <p className="mt-1 text-xs text-iron-500">{e.note}</p> : null}
          </li>
        ))}
      </ol>
      {problem ? <p role="status" className="mt-2 text-sm text-ember-700">{problem}</p> : null}
    </div>
  );
}
