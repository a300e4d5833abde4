/**
 * A worked session as plain text lines: what a calendar event's description
 * carries (no markup survives there) and what a copy-paste gets.
 *
 * @example
 * planLines(session);
 * // ["Warm-up: 5 min bike", "A1 Bench press — 2 RIR · rest 90 s", "  ramp 40 kg×5 · 55 kg×3", "  4 × 5–7 @ 80 kg (per side 25 · 5)", …]
 */
import type { ExerciseOut, Session, SetOut, SubstituteOut } from "@/lib/load/types";
import { groupSets, loadText, platesText, repsText, restText } from "@/components/preview/format";

/** "2 RIR · tempo 3110 · pause 1 s · rest 3 min" — the extras printed beside a lift's name. */
export function exerciseExtras(ex: ExerciseOut): string[] {
  return [
    ex.effort,
    ex.tempo ? `tempo ${ex.tempo}` : null,
    ex.pauseSeconds ? `pause ${ex.pauseSeconds} s` : null,
    ex.restSeconds ? `rest ${restText(ex.restSeconds)}` : null,
  ].filter((x): x is string => Boolean(x));
}

/** "40 kg×5 · 55 kg×3" — the warm-up ramp on one line; empty when there is none. */
export function rampText(sets: readonly SetOut[], units: string): string {
  return sets
    .filter((s) => s.kind === "warmup")
    .map((w) => `${loadText(w, units) || "—"}×${repsText(w)}`)
    .join(" · ");
}

/** "4 × 5–7 @ 80 kg (per side 25 · 5)" — one line per group of equal working sets. */
export function workLines(sets: readonly SetOut[], units: string): string[] {
  return groupSets(sets.filter((s) => s.kind === "work")).map((g) => {
    const load = loadText(g.set, units);
    const plates = platesText(g.set);
    return `${g.count} × ${repsText(g.set)}${load ? ` @ ${load}` : ", load: your pick"}${plates ? ` (per side ${plates})` : ""}`;
  });
}

/** "machine row 3 × 10 @ 45 kg" — a substitute with its own loads. */
export function substituteText(sub: SubstituteOut, units: string): string {
  const lines = workLines(sub.sets, units);
  return lines.length > 0 ? `${sub.name} ${lines.join(", ")}` : sub.name;
}

/** "back squat" → "Back squat". */
export const upperFirst = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

/** The whole session, one idea per line, for plain-text places. */
export function planLines(plan: Session): string[] {
  const out: string[] = [];
  if (plan.deload) out.push("Deload week");
  if (plan.warmupNotes.length > 0) out.push(`Warm-up: ${plan.warmupNotes.join(" · ")}`);
  for (const ex of plan.exercises) {
    const extras = exerciseExtras(ex);
    out.push(`${ex.label ? `${ex.label} ` : ""}${upperFirst(ex.name)}${extras.length ? ` — ${extras.join(" · ")}` : ""}`);
    const ramp = rampText(ex.sets, plan.units);
    if (ramp) out.push(`  ramp ${ramp}`);
    for (const line of workLines(ex.sets, plan.units)) out.push(`  ${line}`);
    if (ex.loadNote) out.push(`  ${ex.loadNote}`);
    if (ex.cue) out.push(`  “${ex.cue}”`);
    if (ex.substitutes.length > 0) out.push(`  or ${ex.substitutes.map((s) => substituteText(s, plan.units)).join("; ")}`);
  }
  return out;
}
