/**
 * One programme week as the athlete will get it: each day with its lifts,
 * warm-up ramps, worked loads and plates per side, rotations and substitutes.
 */
import { memo } from "react";
import type { ExerciseOut, Session } from "@/lib/load/types";
import { groupSets, loadText, platesText, repsText, restText } from "./format";
import { sameData } from "./sameData";

const DATE = new Intl.DateTimeFormat("en-GB", { weekday: "short", day: "numeric", month: "short", timeZone: "UTC" });

type Rotations = ReadonlyMap<number, readonly string[]>;
type Variations = readonly (readonly string[] | undefined)[];
type OnLine = (line: number) => void;

/**
 * The editor works a new week on every keystroke, most of it equal to the last:
 * days and rows are memoised on their content so only what changed renders again
 * (a handler passed in must keep its identity between renders for this to work).
 */
export const WeekPreview = memo(function WeekPreview({ sessions, rotations, onLine }: { sessions: readonly Session[]; rotations?: Rotations; onLine?: OnLine }) {
  if (sessions.length === 0) {
    return <p className="px-4 py-8 text-center text-sm text-iron-400">No training days in this week yet. Add a <code className="font-mono">day</code> line and some lifts.</p>;
  }
  return (
    <div className="grid gap-3" data-testid="week-preview">
      {sessions.map((s) => (
        <SessionCard key={`${s.date}-${s.dayLine}`} s={s} variations={s.exercises.map((ex) => rotations?.get(ex.line))} onLine={onLine} />
      ))}
    </div>
  );
});

const SessionCard = memo(
  function SessionCard({ s, variations, onLine }: { s: Session; variations: Variations; onLine?: OnLine }) {
    // A week can hold dozens of days; the browser lays out and paints only those in view.
    return (
      <section className="rounded-lg border border-chalk-300 bg-white [contain-intrinsic-size:auto_24rem] [content-visibility:auto]" aria-label={`${s.day}, ${s.date}`}>
        <header className="flex flex-wrap items-baseline justify-between gap-2 border-b border-chalk-200 px-3 py-2">
          <h3 className="text-sm font-bold text-iron">
            {s.day}
            {s.deload ? <span className="ml-2 rounded bg-moss-100 px-1.5 py-0.5 text-[10px] font-semibold uppercase tracking-wider text-moss-700">deload</span> : null}
          </h3>
          <span className="font-mono text-[11px] text-iron-400">
            {DATE.format(new Date(`${s.date}T00:00:00Z`))} · {s.block} wk {s.week}
          </span>
        </header>
        {s.warmupNotes.length > 0 ? <p className="border-b border-chalk-200 px-3 py-1.5 text-xs text-iron-500">Warm-up: {s.warmupNotes.join(" · ")}</p> : null}
        <ol className="divide-y divide-chalk-200">
          {s.exercises.map((ex, i) => (
            <ExerciseRow key={i} ex={ex} units={s.units} variations={variations[i]} onLine={onLine} />
          ))}
        </ol>
      </section>
    );
  },
  (a, b) => a.onLine === b.onLine && sameData(a.variations, b.variations) && sameData(a.s, b.s),
);

type RowProps = { ex: ExerciseOut; units: string; variations?: readonly string[]; onLine?: OnLine };

const ExerciseRow = memo(function ExerciseRow({ ex, units, variations, onLine }: RowProps) {
  const warmups = ex.sets.filter((s) => s.kind === "warmup");
  const work = groupSets(ex.sets.filter((s) => s.kind === "work"));
  const extras = [ex.effort, ex.tempo ? `tempo ${ex.tempo}` : null, ex.pauseSeconds ? `pause ${ex.pauseSeconds} s` : null, ex.restSeconds ? `rest ${restText(ex.restSeconds)}` : null].filter(Boolean);
  return (
    <li className="px-3 py-2" data-testid="preview-exercise">
      <div className="flex items-baseline gap-2">
        {ex.label ? <span className="font-mono text-xs font-bold text-brass-500">{ex.label}</span> : null}
        {/* Only the editor can jump to a line; read-only pages render this on the server, where no handler may pass. */}
        {onLine ? (
          <button type="button" onClick={() => onLine(ex.line)} className="text-left text-sm font-semibold text-iron first-letter:uppercase hover:text-ember-600" title="Show this line in the editor">
            {ex.name}
          </button>
        ) : (
          <span className="text-sm font-semibold text-iron first-letter:uppercase">{ex.name}</span>
        )}
        {extras.length ? <span className="text-xs text-iron-500">{extras.join(" · ")}</span> : null}
      </div>
      {variations && variations.length > 1 ? (
        <p className="mt-0.5 text-[11px] text-iron-500" data-testid="preview-rotation">
          rotation:{" "}
          {variations.map((v, k) => (
            <span key={k} className={k === ex.variationIndex ? "font-semibold text-moss-700" : ""}>
              {k > 0 ? " → " : ""}
              {v}
            </span>
          ))}
        </p>
      ) : null}
      {warmups.length > 0 ? (
        <p className="mt-1 font-mono text-[11px] text-iron-400" data-testid="preview-ramp">
          ramp {warmups.map((w) => `${loadText(w, "").trim() || "—"}×${repsText(w)}`).join(" · ")}
        </p>
      ) : null}
      <table className="mt-1 w-full font-mono text-xs">
        <tbody>
          {work.map((g, j) => (
            <tr key={j}>
              <td className="w-20 py-0.5 text-iron-600">
                {g.count} × {repsText(g.set)}
              </td>
              <td className="py-0.5 text-right font-bold text-iron" data-testid="preview-load">
                {loadText(g.set, units) || <span className="font-normal text-iron-300">— load</span>}
              </td>
              <td className="w-36 py-0.5 pl-3 text-right text-iron-500">{platesText(g.set)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {ex.cue ? <p className="mt-1 text-xs italic text-iron-600">“{ex.cue}”</p> : null}
      {ex.loadNote ? <p className="mt-1 text-[11px] text-brass-500">{ex.loadNote}</p> : null}
      {ex.substitutes.length > 0 ? (
        <p className="mt-1 text-[11px] text-iron-500">
          or{" "}
          {ex.substitutes
            .map((sub) => {
              const w = sub.sets.find((x) => x.kind === "work");
              const l = w ? loadText(w, units) : "";
              return l ? `${sub.name} (${l})` : sub.name;
            })
            .join(", ")}
        </p>
      ) : null}
    </li>
  );
}, sameRow);

function sameRow(a: RowProps, b: RowProps): boolean {
  return a.onLine === b.onLine && a.units === b.units && sameData(a.variations, b.variations) && sameData(a.ex, b.ex);
}
