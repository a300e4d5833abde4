"use client";
import type { SetOut } from "@/lib/load/types";
import { LOG_LIMITS } from "@/lib/progress/types";
import { loadStep, fmt } from "./plan";
import { RirPicker } from "./RirPicker";
import { Stepper } from "./Stepper";
import type { SetValues, Units } from "./types";

type State = "saved" | "pending" | "error" | "plan";

function plannedText(set: SetOut, units: Units): string {
  const reps = set.seconds !== null ? `${set.seconds} s` : set.amrap ? `${set.repsMin}+ reps` : set.repsMax !== null && set.repsMax !== set.repsMin ? `${set.repsMin}–${set.repsMax} reps` : `${set.repsMin} reps`;
  const load = set.bodyweight ? (set.load ? `BW + ${fmt(set.load)} ${units}` : "bodyweight") : set.load !== null ? `${fmt(set.load)} ${units}` : "no load planned";
  return `${reps} · ${load}`;
}

function loggedText(v: SetValues, set: SetOut, units: Units): string {
  const load = set.bodyweight ? (v.load ? `BW+${fmt(v.load)}` : "BW") : `${fmt(v.load)} ${units}`;
  const reps = set.seconds !== null ? "done" : `${v.reps} × ${load}`;
  return v.rir !== null ? `${reps} · RIR ${v.rir >= 5 ? "5+" : v.rir}` : reps;
}

/**
 * One set: collapsed it is a line and a big tick; open it has steppers for
 * reps and load and the RIR chips. Ticking saves it; a ticked set saves
 * again whenever it is changed.
 */
export function SetRow({
  label,
  exercise,
  set,
  units,
  values,
  state,
  error,
  open,
  readOnly,
  onOpen,
  onChange,
  onTick,
  onRetry,
  onDiscard,
}: {
  label: string;
  exercise: string;
  set: SetOut;
  units: Units;
  values: SetValues;
  state: State;
  error: string | null;
  open: boolean;
  readOnly: boolean;
  onOpen: () => void;
  onChange: (v: SetValues) => void;
  onTick: () => void;
  onRetry: () => void;
  onDiscard: () => void;
}) {
  const warm = set.kind === "warmup";
  const done = values.done;
  const timed = set.seconds !== null;
  return (
    <li
      data-testid="log-set"
      data-kind={set.kind}
      data-done={done ? "true" : "false"}
      data-state={state}
      className={`rounded-lg border ${error ? "border-ember-400 bg-ember-50" : done ? "border-moss-500/40 bg-moss-100/50" : open ? "border-iron-300 bg-white shadow-sm" : "border-chalk-300 bg-white"}`}
    >
      <div className="flex items-center gap-2 pl-3">
        <button type="button" onClick={onOpen} className="min-h-14 min-w-0 flex-1 py-2 text-left" aria-expanded={open} aria-label={`${label} of ${exercise}: ${open ? "close" : "adjust"}`}>
          <span className={`block text-xs font-semibold ${warm ? "text-iron-400" : "text-iron-600"}`}>
            {label}
            {warm ? <span className="ml-1 font-normal">· optional</span> : null}
            {state === "pending" ? <span className="ml-2 font-normal text-brass-500">saving…</span> : null}
          </span>
          <span className={`block truncate font-mono ${done ? "text-base font-bold text-moss-700" : warm ? "text-sm text-iron-500" : "text-base font-semibold text-iron"}`}>
            {done ? loggedText(values, set, units) : plannedText(set, units)}
          </span>
          {set.perSide && !done ? <span className="block font-mono text-[11px] text-iron-400">per side {set.perSide.length ? set.perSide.map(fmt).join(" · ") : "bar only"}</span> : null}
          {done ? <span className="block font-mono text-[11px] text-iron-500">plan {plannedText(set, units)}</span> : null}
        </button>
        {readOnly ? (
          <span className={`mr-3 text-sm font-semibold ${done ? "text-moss-700" : "text-iron-300"}`}>{done ? "✓" : "—"}</span>
        ) : (
          <button
            type="button"
            data-testid="set-done"
            aria-pressed={done}
            aria-label={`${done ? "Untick" : "Tick"} ${label.toLowerCase()} of ${exercise}`}
            onClick={onTick}
            className={`m-1 flex h-14 w-14 shrink-0 items-center justify-center rounded-lg text-2xl font-bold transition-colors ${
              done ? "bg-moss-500 text-white" : warm ? "border-2 border-iron-200 bg-white text-iron-300" : "border-2 border-iron-300 bg-white text-iron-300 active:bg-chalk-200"
            }`}
          >
            ✓
          </button>
        )}
      </div>
      {error ? (
        <div className="flex flex-wrap items-center gap-2 border-t border-ember-400/40 px-3 py-2 text-sm text-ember-700" role="alert">
          <span className="flex-1">Not saved: {error}</span>
          <button type="button" className="btn-quiet h-10 py-1" onClick={onRetry}>
            Try again
          </button>
          <button type="button" className="btn-quiet h-10 py-1" onClick={onDiscard}>
            Discard
          </button>
        </div>
      ) : null}
      {open && !readOnly ? (
        <div className="space-y-3 border-t border-chalk-200 px-3 pt-3 pb-3">
          <div className="flex flex-col gap-3 sm:flex-row">
            {timed ? null : (
              <Stepper label="Reps" value={values.reps} step={1} min={0} max={LOG_LIMITS.repsMax} less="Fewer reps" more="More reps" onChange={(reps) => onChange({ ...values, reps })} />
            )}
            <Stepper
              label={set.bodyweight ? "Added load" : "Load"}
              value={values.load}
              step={loadStep(units, set)}
              min={0}
              max={LOG_LIMITS.loadMax}
              unit={units}
              less="Lighter"
              more="Heavier"
              decimals
              onChange={(load) => onChange({ ...values, load })}
            />
          </div>
          {warm || timed ? null : <RirPicker name={`${label} of ${exercise}`} value={values.rir} target={set.rir} onChange={(rir) => onChange({ ...values, rir })} />}
        </div>
      ) : null}
    </li>
  );
}
