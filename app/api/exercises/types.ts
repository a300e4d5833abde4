/**
 * JSON shapes of the exercise library API, for the pages that call it.
 * Types only. Dates travel as ISO 8601 strings; failures are the shared
 * `ApiError` (see app/api/templates/types.ts).
 */
export type Equipment = "barbell" | "dumbbell" | "cable" | "machine" | "bodyweight" | "other";
export type MediaType = "image/jpeg" | "image/png" | "image/webp" | "video/mp4" | "video/webm";

export type LibraryEntry = {
  id: string;
  builtIn: boolean;
  name: string;
  aliases: string[];
  equipment: Equipment;
  primaryMuscles: string[];
  movementPattern: string | null;
  cues: string;
  substitutionGroup: string | null;
  media: { url: string; type: MediaType } | null;
  updatedAt: string | null;
};

export type LibraryResponse = { items: LibraryEntry[]; total: number; page: number; pageSize: number };
export type ExerciseResponse = { exercise: LibraryEntry };
export type NamesResponse = { names: { name: string; exercise: string; builtIn: boolean; equipment: Equipment }[] };
