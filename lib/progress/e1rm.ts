/**
 * Estimated 1RM from logged sets, with the programme's own model (lib/load/models.ts), and the
 * best per session and exercise.
 *
 * Which sets count (common practice, no source):
 * - done work sets only: warm-ups are deliberately easy and say nothing about the max;
 * - not bodyweight sets: their load is only what was added to the body;
 * - at least 1 rep and a load above 0;
 * - reps done + reps in reserve inside the model's trusted range (TRUSTED_REPS): past it the
 *   equations drift, so a set of 20 would only add noise to a chart of maxes;
 * - a set logged without RIR counts as taken to failure (RIR 0), the lowest estimate the
 *   set allows, so a missing answer never inflates a max.
 *
 * @example
 * setE1rm({ ...set, load: 100, reps: 5, rir: 0 }, "kg"); // 112.5 with the Brzycki model
 * sessionBests(sets, "kg"); // [{ sessionId, date, exerciseKey, e1rm, … }] oldest first
 */
import { checkRepsToFailure, e1rm } from "../load/models";
import { convertMass } from "../load/units";
import type { Unit } from "../notation/model";
import type { LoggedSet, SessionBest } from "./types";

/** Whether a logged set says anything about the athlete's max. */
export function countsForE1rm(set: LoggedSet): boolean {
  if (!set.done || set.kind !== "work" || set.bodyweight) return false;
  if (!(set.reps >= 1) || !(set.load > 0)) return false;
  return checkRepsToFailure(set.reps + (set.rir ?? 0), set.model) === "ok";
}

/**
 * The set's estimated 1RM in `unit` (the set's own unit by default), or null when the set does
 * not count (see the module comment).
 * @example setE1rm({ ...set, load: 100, reps: 10, rir: 0, model: "epley" }); // 133.33…
 */
export function setE1rm(set: LoggedSet, unit: Unit = set.unit): number | null {
  if (!countsForE1rm(set)) return null;
  const value = e1rm(set.load, set.reps, set.rir ?? 0, set.model);
  return value === null ? null : convertMass(value, set.unit, unit);
}

/**
 * The highest estimated 1RM of each exercise in each session, in `unit`, oldest session first
 * (then by exercise key). Sessions where no set counts give no entry.
 */
export function sessionBests(sets: readonly LoggedSet[], unit: Unit): SessionBest[] {
  const best = new Map<string, SessionBest>();
  for (const s of sets) {
    const value = setE1rm(s, unit);
    if (value === null) continue;
    const key = `${s.sessionId}\u0000${s.exerciseKey}`;
    const prev = best.get(key);
    if (!prev || value > prev.e1rm) {
      best.set(key, { sessionId: s.sessionId, date: s.date, exercise: s.exercise, exerciseKey: s.exerciseKey, e1rm: value, reps: s.reps, load: convertMass(s.load, s.unit, unit), rir: s.rir });
    }
  }
  return [...best.values()].sort((a, b) => a.date.localeCompare(b.date) || a.exerciseKey.localeCompare(b.exerciseKey) || a.sessionId.localeCompare(b.sessionId));
}
