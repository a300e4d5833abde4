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
