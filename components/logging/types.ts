/**
 * What the logging screen exchanges with /api/sessions/[id]/log: the shapes
 * of db/logs.ts and db/progress.ts, imported as types only (erased from the
 * client bundle).
 */
export type { Units } from "@/db/database";
export type { ExerciseLog, LogSheet, SetLog } from "@/db/logs";
export type { SessionSummary as Summary } from "@/db/progress";

/** One set as the athlete has it on screen: saved, waiting in the queue, or a draft. */
export type SetValues = { reps: number; load: number; rir: number | null; done: boolean };
