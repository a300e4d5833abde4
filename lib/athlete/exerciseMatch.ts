/**
 * Matches a written exercise name against the names an athlete's maxes may be
 * filed under (the built-in catalogue plus their coach's library), so that a
 * max typed as "Squat" and one typed as "back-squat" land on the same movement.
 *
 * @example
 * const match = exerciseMatcher([{ name: "squat", exercise: "back squat" }, { name: "back squat", exercise: "back squat" }]);
 * match("Squat");      // { ok: true, exercise: "back squat", key: "back-squat" }
 * match("bak squat");  // { ok: false, suggestions: ["back squat"] }
 */
import { exerciseKey, normaliseExerciseName } from "../exercises/resolve";
import { nearest } from "../notation/suggest";

/** One name an exercise answers to, and the exercise's own (display) name. */
export type KnownName = { name: string; exercise: string };

export type ExerciseMatch = { ok: true; exercise: string; key: string } | { ok: false; suggestions: string[] };

/** Turns a written name into the exercise it means, or the nearest names when it means none. */
export type ExerciseResolver = (name: string) => ExerciseMatch;

/**
 * A resolver over these names. The first entry for a name wins, so list the
 * coach's own names before the catalogue's (as db/exercises.ts does). The key is
 * lib/exercises' `exerciseKey` of the exercise's own name — the key the load
 * engine looks maxes up by.
 */
export function exerciseMatcher(names: readonly KnownName[]): ExerciseResolver {
  const index = new Map<string, { exercise: string; shown: string }>();
  for (const n of names) {
    const k = normaliseExerciseName(n.name);
    if (k && !index.has(k)) index.set(k, { exercise: n.exercise, shown: n.name });
  }
  const keys = [...index.keys()];
  return (name) => {
    const k = normaliseExerciseName(name);
    const hit = k ? index.get(k) : undefined;
    if (hit) return { ok: true, exercise: hit.exercise, key: exerciseKey(hit.exercise) };
    // Suggestions are shown as the names were listed ("pull-up"), not in their comparison form.
    return { ok: false, suggestions: k ? suggestNames(k, keys).map((s) => index.get(s)!.shown) : [] };
  };
}

/**
 * Close spellings first; when none is close, names that contain what was
 * written ("curl" → "barbell curl", "dumbbell curl"…), shortest first.
 */
function suggestNames(written: string, candidates: readonly string[]): string[] {
  const near = nearest(written, candidates, 3);
  if (near.length > 0) return near;
  if (written.length < 3) return [];
  return candidates
    .filter((c) => c.includes(written))
    .sort((a, b) => a.length - b.length || a.localeCompare(b))
    .slice(0, 3);
}

/**
 * The message for a name that matched nothing.
 * @example unknownExerciseMessage("bak squat", ["back squat"]); // "“bak squat” is not a known exercise — did you mean back squat?"
 */
export function unknownExerciseMessage(name: string, suggestions: readonly string[]): string {
  const base = `“${name}” is not a known exercise`;
  if (suggestions.length === 0) return `${base}; use a built-in name or add it to the exercise library first`;
  const last = suggestions.length > 1 ? ` or ${suggestions[suggestions.length - 1]}` : "";
  return `${base} — did you mean ${suggestions.slice(0, suggestions.length > 1 ? -1 : 1).join(", ")}${last}?`;
}
