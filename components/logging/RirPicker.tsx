"use client";

const CHOICES = [0, 1, 2, 3, 4, 5] as const;

/**
 * Reps in reserve after the set: 0 (nothing left) to 5+ (five or more). The
 * plan's target is ringed; tapping the chosen chip again clears it.
 */
export function RirPicker({ value, target, onChange, name }: { value: number | null; target: number | null; onChange: (v: number | null) => void; name: string }) {
  return (
    <div role="radiogroup" aria-label={`Reps in reserve for ${name}`}>
      <span className="block text-[11px] font-semibold uppercase tracking-wider text-iron-500">
        Reps in reserve{target !== null ? <span className="ml-1 font-normal normal-case tracking-normal text-iron-400">(target {target})</span> : null}
      </span>
      <div className="mt-1 grid grid-cols-6 gap-1.5">
        {CHOICES.map((n) => {
          const chosen = value !== null && (n === 5 ? value >= 5 : value === n);
          const isTarget = target !== null && Math.round(target) === n;
          return (
            <button
              key={n}
              type="button"
              role="radio"
              aria-checked={chosen}
              aria-label={`RIR ${n === 5 ? "5 or more" : n}`}
              onClick={() => onChange(chosen ? null : n)}
              className={`h-12 rounded-lg font-mono text-base font-bold transition-colors ${
                chosen ? "bg-iron text-white" : `bg-white text-iron ${isTarget ? "border-2 border-dashed border-ember-400" : "border border-iron-200"}`
              }`}
            >
              {n === 5 ? "5+" : n}
            </button>
          );
        })}
      </div>
    </div>
  );
}
