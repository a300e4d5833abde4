"use client";
import { useEffect, useState } from "react";
import { fmt } from "./plan";

/**
 * A number with big − and + either side (48 px targets, one thumb, chalky
 * fingers). The number itself is a field too, for a jump the buttons would
 * take a while to reach.
 */
export function Stepper({
  label,
  value,
  step,
  min,
  max,
  unit,
  less,
  more,
  onChange,
  decimals = false,
}: {
  label: string;
  value: number;
  step: number;
  min: number;
  max: number;
  unit?: string;
  less: string;
  more: string;
  onChange: (v: number) => void;
  decimals?: boolean;
}) {
  const [text, setText] = useState(fmt(value));
  useEffect(() => setText(fmt(value)), [value]);
  const clamp = (v: number) => Math.min(max, Math.max(min, Math.round(v * 100) / 100));
  const commit = () => {
    const v = Number(text.replace(",", "."));
    if (text.trim() === "" || !Number.isFinite(v)) return setText(fmt(value));
    const next = clamp(decimals ? v : Math.round(v));
    setText(fmt(next));
    if (next !== value) onChange(next);
  };
  const btn = "flex h-12 w-12 shrink-0 items-center justify-center rounded-lg bg-chalk-200 text-2xl font-bold text-iron active:bg-chalk-300 disabled:opacity-40";
  return (
    <div className="min-w-0 flex-1">
      <span className="block text-[11px] font-semibold uppercase tracking-wider text-iron-500">{label}</span>
      <div className="mt-1 flex items-center gap-1.5">
        <button type="button" className={btn} aria-label={less} disabled={value <= min} onClick={() => onChange(clamp(value - step))}>
          −
        </button>
        <label className="relative min-w-0 flex-1">
          <span className="sr-only">{label}</span>
          <input
            value={text}
            inputMode={decimals ? "decimal" : "numeric"}
            onChange={(e) => setText(e.target.value)}
            onBlur={commit}
            onKeyDown={(e) => e.key === "Enter" && (e.currentTarget as HTMLInputElement).blur()}
            className="h-12 w-full rounded-lg border border-iron-200 bg-white px-1 text-center font-mono text-xl font-bold text-iron focus:border-ember focus:outline-none"
          />
          {unit ? <span className="pointer-events-none absolute right-1.5 bottom-0.5 text-[10px] text-iron-400">{unit}</span> : null}
        </label>
        <button type="button" className={btn} aria-label={more} disabled={value >= max} onClick={() => onChange(clamp(value + step))}>
          +
        </button>
      </div>
    </div>
  );
}
