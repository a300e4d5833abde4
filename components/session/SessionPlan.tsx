/**
 * A worked session as the athlete reads it on the gym floor: every lift in
 * order with its pairing, sets × reps, effort, the load and the plates per
 * side, the warm-up ramp, rest/tempo/pause, the cue and substitutes with
 * their own loads. Large type and full-strength ink: nothing that matters
 * between sets is small or grey.
 */
import type { ExerciseOut, SetOut, Session, SubstituteOut } from "@/lib/load/types";
import { groupSets, loadText, platesText, repsText } from "@/components/preview/format";
import { exerciseExtras, upperFirst, workLines } from "./planText";

export function SessionPlan({ plan }: { plan: Session }) {
  return (
    <div data-testid="session-plan">
      {plan.warmupNotes.length > 0 ? (
        <p className="mb-3 rounded-lg bg-chalk-200 px-4 py-3 text-base text-iron" data-testid="session-warmup">
          <span className="font-bold">Warm-up: </span>
          {plan.warmupNotes.join(" · ")}
        </p>
      ) : null}
      {plan.exercises.length === 0 ? <p className="text-base text-iron">No lifts in this session.</p> : null}
      <ol className="space-y-3">
        {plan.exercises.map((ex, i) => (
          <ExerciseBlock key={i} ex={ex} units={plan.units} />
        ))}
      </ol>
    </div>
  );
}

function ExerciseBlock({ ex, units }: { ex: ExerciseOut; units: string }) {
  const extras = exerciseExtras(ex);
  const warmups = ex.sets.filter((s) => s.kind === "warmup");
  return (
    <li className="rounded-xl border-2 border-iron-200 bg-white p-4" data-testid="session-exercise">
      <div className="flex items-start gap-3">
        {ex.label ? (
          <span className="mt-0.5 shrink-0 rounded-md bg-iron px-2 py-1 font-mono text-base font-bold text-white" data-testid="session-pairing" title={`Paired: ${ex.label}`}>
            {ex.label}
          </span>
        ) : null}
        <div className="min-w-0">
          <h3 className="text-xl font-bold leading-tight text-iron">{upperFirst(ex.name)}</h3>
          {extras.length > 0 ? <p className="mt-1 text-base font-medium text-iron-700">{extras.join(" · ")}</p> : null}
        </div>
      </div>

      {warmups.length > 0 ? (
        <div className="mt-3" data-testid="session-ramp">
          <h4 className="text-sm font-bold uppercase tracking-wider text-iron-700">Warm-up ramp</h4>
          {/* A grid so loads, reps and plates line up in columns and a plate list never reads as reps. */}
          <ul className="mt-1 grid grid-cols-[auto_auto_1fr] gap-x-3 gap-y-0.5 font-mono text-base text-iron">
            {warmups.map((w, k) => (
              <li key={k} className="contents">
                <span className="font-semibold">{loadText(w, units) || "—"}</span>
                <span>× {repsText(w)}</span>
                <span className="text-iron-700">{platesText(w) ? plateLabel(w) : ""}</span>
              </li>
            ))}
          </ul>
        </div>
      ) : null}

      <WorkSets sets={ex.sets} units={units} />

      {ex.loadNote ? <p className="mt-2 text-base font-medium text-ember-700">{ex.loadNote}</p> : null}
      {ex.cue ? (
        <p className="mt-3 border-l-4 border-brass-500 pl-3 text-lg italic text-iron" data-testid="session-cue">
          “{ex.cue}”
        </p>
      ) : null}
      {ex.substitutes.length > 0 ? <Substitutes subs={ex.substitutes} units={units} /> : null}
    </li>
  );
}

function plateLabel(s: SetOut): string {
  const p = platesText(s);
  return p === "bar only" ? p : `${p} a side`;
}

function WorkSets({ sets, units }: { sets: readonly SetOut[]; units: string }) {
  const groups = groupSets(sets.filter((s) => s.kind === "work"));
  if (groups.length === 0) return null;
  return (
    <table className="mt-3 w-full">
      <caption className="sr-only">Working sets</caption>
      <tbody>
        {groups.map((g, j) => {
          const load = loadText(g.set, units);
          return (
            <tr key={j} className="border-t border-chalk-200 align-baseline" data-testid="session-work-set">
              <td className="w-24 py-2 pr-2 font-mono text-xl font-bold text-iron">
                {g.count} × {repsText(g.set)}
              </td>
              <td className="py-2 text-right" data-testid="session-load">
                {load ? (
                  <span className="font-mono text-2xl font-bold text-iron">{load}</span>
                ) : (
                  // No max on file: no number is invented, the athlete picks the load by the effort target.
                  <span className="inline-block min-w-24 rounded-md border-2 border-dashed border-iron-300 px-3 py-1 text-base font-semibold text-iron-700">
                    load: your pick
                  </span>
                )}
              </td>
              <td className="w-32 py-2 pl-3 text-right font-mono text-base font-semibold text-iron-700 sm:w-44" data-testid="session-plates">
                {platesText(g.set) ? plateLabel(g.set) : null}
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}

function Substitutes({ subs, units }: { subs: readonly SubstituteOut[]; units: string }) {
  return (
    <div className="mt-3 rounded-lg bg-chalk-100 px-3 py-2">
      <h4 className="text-sm font-bold uppercase tracking-wider text-iron-700">If it is taken</h4>
      <ul className="mt-1 space-y-1">
        {subs.map((sub, k) => {
          const lines = workLines(sub.sets, units);
          return (
            <li key={k} className="text-base text-iron" data-testid="session-substitute">
              <span className="font-semibold">{upperFirst(sub.name)}</span>
              {lines.length > 0 ? <span className="font-mono"> — {lines.join(", ")}</span> : null}
              {sub.loadNote ? <span className="block text-sm font-medium text-ember-700">{sub.loadNote}</span> : null}
            </li>
          );
        })}
      </ul>
    </div>
  );
}
