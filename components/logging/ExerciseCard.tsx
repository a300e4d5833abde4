"use client";
import { useState } from "react";
import { restText } from "@/components/preview/format";
import type { ExerciseOut } from "@/lib/load/types";
import { fmt, setLabels, variantOf } from "./plan";
import { SetRow } from "./SetRow";
import type { LogSync } from "./useLogSync";
import type { SetValues, Units } from "./types";

function firstWorkLoad(sets: ExerciseOut["sets"], units: Units): string {
  const w = sets.find((s) => s.kind === "work");
  if (!w) return "";
  if (w.bodyweight) return w.load ? `BW + ${fmt(w.load)} ${units}` : "bodyweight";
  return w.load !== null ? `${fmt(w.load)} ${units}` : "no load on file";
}

/**
 * One exercise of the session: what the plan asks (effort, rest, tempo, cue),
 * a swap to a listed substitute, its sets, and a note.
 */
export function ExerciseCard({
  index,
  ex,
  units,
  sync,
  drafts,
  setDraft,
  openKey,
  setOpenKey,
  onTicked,
  readOnly,
}: {
  index: number;
  ex: ExerciseOut;
  units: Units;
  sync: LogSync;
  drafts: Record<string, SetValues>;
  setDraft: (key: string, v: SetValues | null) => void;
  openKey: string | null;
  setOpenKey: (key: string | null) => void;
  onTicked: (index: number, setIndex: number, done: boolean) => void;
  readOnly: boolean;
}) {
  const chosen = sync.chosenExercise(index);
  const variant = variantOf(ex, chosen);
  const swapped = variant.name !== ex.name;
  const labels = setLabels(variant.sets);
  const [swapping, setSwapping] = useState(false);
  const savedNote = sync.noteOf(index);
  const [noteOpen, setNoteOpen] = useState(savedNote !== "");
  const [note, setNote] = useState(savedNote);
  const rows = variant.sets.map((set, s) => {
    const key = `${index}:${s}`;
    const shown = sync.valuesOf(index, s);
    const values = shown.state === "plan" && drafts[key] ? drafts[key] : shown.values;
    return { set, s, key, shown, values };
  });
  const anyDone = rows.some((r) => r.values.done);
  const work = rows.filter((r) => r.set.kind === "work");
  const doneWork = work.filter((r) => r.values.done).length;
  const extras = [ex.effort, ex.restSeconds ? `rest ${restText(ex.restSeconds)}` : null, ex.tempo ? `tempo ${ex.tempo}` : null, ex.pauseSeconds ? `pause ${ex.pauseSeconds} s` : null].filter(Boolean);

  const change = (r: (typeof rows)[number], v: SetValues) => {
    if (r.values.done) sync.saveSet(index, r.s, v);
    else setDraft(r.key, v);
  };
  const tick = (r: (typeof rows)[number]) => {
    const next = { ...r.values, done: !r.values.done };
    sync.saveSet(index, r.s, next);
    setDraft(r.key, null);
    onTicked(index, r.s, next.done);
  };

  return (
    <section className="panel overflow-hidden" data-testid="log-exercise" data-exercise-index={index} aria-labelledby={`ex-${index}`}>
      <header className="border-b border-chalk-200 px-4 pt-3 pb-2">
        <div className="flex items-start gap-2">
          {ex.label ? <span className="mt-1 rounded bg-brass-100 px-1.5 font-mono text-xs font-bold text-brass-500">{ex.label}</span> : null}
          <div className="min-w-0 flex-1">
            <h2 id={`ex-${index}`} className="text-lg leading-tight font-bold text-iron first-letter:uppercase" data-testid="log-exercise-name">
              {variant.name}
            </h2>
            {swapped ? <p className="text-xs text-iron-500">instead of {ex.name}</p> : null}
            {extras.length ? <p className="mt-0.5 text-xs text-iron-500">{extras.join(" · ")}</p> : null}
          </div>
          <span className={`shrink-0 rounded-full px-2 py-0.5 font-mono text-xs font-semibold ${doneWork === work.length && work.length > 0 ? "bg-moss-100 text-moss-700" : "bg-chalk-200 text-iron-600"}`}>
            {doneWork}/{work.length}
          </span>
        </div>
        {ex.cue ? <p className="mt-1 text-sm text-iron-600 italic">“{ex.cue}”</p> : null}
        {variant.loadNote ? <p className="mt-1 text-xs text-brass-500">{variant.loadNote}</p> : null}
        {ex.substitutes.length > 0 && !readOnly ? (
          <div className="mt-2">
            <button type="button" className="btn-quiet h-11 px-3 py-1 text-sm" data-testid="swap-button" aria-expanded={swapping} onClick={() => setSwapping(!swapping)} disabled={anyDone && !swapping}>
              ⇄ Swap exercise
            </button>
            {anyDone ? <span className="ml-2 text-xs text-iron-400">untick its sets to swap</span> : null}
            {swapping ? (
              <ul className="mt-2 grid gap-1.5" aria-label={`Exercises that can stand in for ${ex.name}`}>
                {[ex, ...ex.substitutes].map((v) => {
                  const current = v.name === variant.name;
                  return (
                    <li key={v.name}>
                      <button
                        type="button"
                        data-testid="swap-choice"
                        aria-label={current ? `${v.name} (chosen)` : `Do ${v.name} instead`}
                        aria-pressed={current}
                        disabled={current || anyDone}
                        onClick={() => {
                          sync.saveExercise(index, { exercise: v.name });
                          setSwapping(false);
                          setOpenKey(null);
                        }}
                        className={`flex min-h-12 w-full items-center justify-between rounded-lg border px-3 text-left text-sm ${current ? "border-iron bg-iron text-white" : "border-iron-200 bg-white text-iron"}`}
                      >
                        <span className="font-semibold first-letter:uppercase">{v.name}</span>
                        <span className={`font-mono text-xs ${current ? "text-iron-200" : "text-iron-500"}`}>{firstWorkLoad(v.sets, units)}</span>
                      </button>
                    </li>
                  );
                })}
              </ul>
            ) : null}
          </div>
        ) : null}
      </header>
      <ol className="space-y-2 px-3 py-3">
        {rows.map((r) => (
          <SetRow
            key={`${variant.name}-${r.s}`}
            label={labels[r.s]}
            exercise={variant.name}
            set={r.set}
            units={units}
            values={r.values}
            state={r.shown.state}
            error={r.shown.error}
            open={openKey === r.key}
            readOnly={readOnly}
            onOpen={() => setOpenKey(openKey === r.key ? null : r.key)}
            onChange={(v) => change(r, v)}
            onTick={() => tick(r)}
            onRetry={() => sync.retry(`set:${index}:${r.s}`)}
            onDiscard={() => sync.discard(`set:${index}:${r.s}`)}
          />
        ))}
      </ol>
      <div className="border-t border-chalk-200 px-4 py-2">
        {readOnly ? (
          savedNote ? <p className="text-sm text-iron-600">Note: {savedNote}</p> : null
        ) : noteOpen ? (
          <label className="block">
            <span className="field-label">Note</span>
            <textarea
              className="field-input min-h-20"
              value={note}
              maxLength={1000}
              aria-label={`Note for ${variant.name}`}
              placeholder="How it moved, what hurt, what to change"
              onChange={(e) => setNote(e.target.value)}
              onBlur={() => note !== savedNote && sync.saveExercise(index, { note: note.trim() === "" ? null : note })}
            />
          </label>
        ) : (
          <button type="button" className="h-11 text-sm font-semibold text-ember-600" onClick={() => setNoteOpen(true)}>
            + Add a note
          </button>
        )}
      </div>
    </section>
  );
}
