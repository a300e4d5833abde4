"use client";
import { useEffect, useState } from "react";
import { mmss } from "./plan";

export type Rest = { endsAt: number; total: number; after: string };

/**
 * The rest between sets, counted down from the plan's rest time and pinned
 * to the bottom of the screen. It runs on the clock (not on ticks) so a
 * locked phone still shows the right time when woken. Silent by design.
 */
export function RestTimer({ rest, onChange }: { rest: Rest | null; onChange: (r: Rest | null) => void }) {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    if (!rest) return;
    const id = setInterval(() => setNow(Date.now()), 250);
    return () => clearInterval(id);
  }, [rest]);
  if (!rest) return null;
  const left = Math.max(0, (rest.endsAt - now) / 1000);
  const over = left <= 0;
  const share = rest.total > 0 ? Math.min(1, left / rest.total) : 0;
  const shift = (s: number) => onChange({ ...rest, endsAt: Math.max(Date.now(), rest.endsAt + s * 1000), total: Math.max(rest.total + s, 1) });
  const small = "h-12 min-w-12 rounded-lg px-3 text-sm font-semibold";
  return (
    <div className="fixed inset-x-0 bottom-0 z-30 border-t border-iron-700 bg-iron text-white shadow-[0_-4px_16px_rgba(0,0,0,0.25)]" data-testid="rest-timer" role="timer" aria-live="off">
      <div className="h-1 bg-iron-700">
        <div className={`h-1 ${over ? "bg-moss-500" : "bg-ember"}`} style={{ width: `${share * 100}%` }} />
      </div>
      <div className="mx-auto flex max-w-2xl items-center gap-2 px-4 py-2.5">
        <div className="min-w-0 flex-1">
          <p className="text-[11px] font-semibold uppercase tracking-wider text-iron-300">{over ? "Rest over" : "Rest"}</p>
          <p className="truncate text-xs text-iron-300">after {rest.after}</p>
        </div>
        <span className={`font-mono text-3xl font-bold tabular-nums ${over ? "text-moss-100" : "text-white"}`} data-testid="rest-left">
          {mmss(left)}
        </span>
        <button type="button" className={`${small} bg-iron-700`} onClick={() => shift(-15)} aria-label="15 seconds less rest">
          −15
        </button>
        <button type="button" className={`${small} bg-iron-700`} onClick={() => shift(15)} aria-label="15 seconds more rest">
          +15
        </button>
        <button type="button" className={`${small} bg-white text-iron`} onClick={() => onChange(null)}>
          {over ? "Close" : "Skip"}
        </button>
      </div>
    </div>
  );
}
