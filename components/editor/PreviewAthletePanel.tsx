"use client";
import { useState } from "react";

/** The preview athlete: units and the 1RMs the preview works loads from, editable in place. */
export function PreviewAthletePanel(props: {
  units: "kg" | "lb";
  onUnits(u: "kg" | "lb"): void;
  maxes: Record<string, number>;
  onMaxes(m: Record<string, number>): void;
  names: readonly string[];
}) {
  const [open, setOpen] = useState(false);
  const rows = [...new Set([...props.names])].sort();
  return (
    <div className="panel px-3 py-2 text-sm">
      <div className="flex flex-wrap items-center gap-3">
        <span className="font-semibold">Sample athlete</span>
        <label className="flex items-center gap-1 text-iron-500">
          units
          <select value={props.units} onChange={(e) => props.onUnits(e.target.value as "kg" | "lb")} className="rounded border border-iron-200 bg-white px-1.5 py-1 text-iron">
            <option value="kg">kg</option>
            <option value="lb">lb</option>
          </select>
        </label>
        <button type="button" className="ml-auto text-sm font-semibold text-ember-600 hover:underline" aria-expanded={open} onClick={() => setOpen(!open)}>
          {open ? "Hide maxes" : "Edit maxes"}
        </button>
      </div>
      {open ? (
        rows.length === 0 ? (
          <p className="mt-2 text-iron-400">Lifts with a % or effort target appear here.</p>
        ) : (
          <div className="mt-2 grid grid-cols-1 gap-x-4 gap-y-1.5 sm:grid-cols-2">
            {rows.map((name) => (
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
        )
      ) : null}
    </div>
  );
}
