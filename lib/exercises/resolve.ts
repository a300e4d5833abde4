/**
 * Name → catalogue entry. Coaches type names by hand, on phones, so matching ignores case,
 * surrounding and repeated spaces, hyphens versus spaces, and apostrophes.
 *
 * @example
 * resolveExercise("Squat")?.id;        // "back-squat"
 * resolveExercise("Pull Up")?.name;    // "pull-up"
 * resolveExercise("zercher carry");    // null
 */
import { CATALOGUE, type CatalogueEntry } from "./catalogue";

/**
 * The comparison form of an exercise name.
 * @example normaliseExerciseName("  Farmer's   Walk "); // "farmers walk"
 */
export function normaliseExerciseName(name: string): string {
  return name
    .toLowerCase()
    .replace(/['’`]/g, "")
    .replace(/[-_]+/g, " ")
    .replace(/\s+/g, " ")
    .trim();
}

function buildIndex(entries: readonly CatalogueEntry[]): Map<string, CatalogueEntry> {
  const index = new Map<string, CatalogueEntry>();
  for (const entry of entries) {
    for (const n of [entry.name, entry.id, ...entry.aliases]) {
      const key = normaliseExerciseName(n);
      // First writer wins so that a later alias can never steal a display name.
      if (!index.has(key)) index.set(key, entry);
    }
  }
  return index;
}

const INDEX = buildIndex(CATALOGUE);

/**
 * The catalogue entry for a written name or alias, or null when the name is not built in.
 * @example resolveExercise("incline press")?.id; // "incline-bench-press"
 */
export function resolveExercise(name: string): CatalogueEntry | null {
  return INDEX.get(normaliseExerciseName(name)) ?? null;
}

/**
 * One key per movement: the catalogue id when known, else the normalised name, so that a
 * max recorded under "squat" is found for a line written "Back Squat".
 * @example exerciseKey("Squat") === exerciseKey("back squat"); // true
 */
export function exerciseKey(name: string): string {
  return resolveExercise(name)?.id ?? normaliseExerciseName(name);
}

/** A name from a coach's own library: the name or alias written, the exercise it means, its equipment. */
export type LibraryName = { name: string; exercise: string; equipment: CatalogueEntry["equipment"] };

/**
 * Name → entry over the built-in catalogue plus a coach's library. A built-in
 * name keeps its meaning; a library name or alias resolves to its exercise,
 * keyed like `exerciseKey` of that exercise's name, so a max filed under the
 * exercise is found for any of its aliases.
 *
 * @example
 * const resolve = exerciseResolver([{ name: "ssb", exercise: "safety bar squat", equipment: "barbell" }]);
 * resolve("SSB"); // { id: "safety bar squat", name: "safety bar squat", aliases: [], equipment: "barbell" }
 * resolve("rdl")?.id; // "romanian-deadlift"
 */
export function exerciseResolver(library: readonly LibraryName[]): (name: string) => CatalogueEntry | null {
  if (library.length === 0) return resolveExercise;
  const own = new Map<string, CatalogueEntry>();
  for (const n of library) {
    const key = normaliseExerciseName(n.name);
    if (key && !own.has(key)) own.set(key, { id: exerciseKey(n.exercise), name: n.exercise, aliases: [], equipment: n.equipment });
  }
  return (name) => resolveExercise(name) ?? own.get(normaliseExerciseName(name)) ?? null;
}
