/**
 * What the progress computations read: one logged set with the plan it was logged against.
 * All loads are in `unit`; callers convert when they mix units.
 *
 * @example
 * const set: LoggedSet = { sessionId: "s1", date: "2027-01-04", exercise: "back squat", exerciseKey: "back-squat",
 *   kind: "work", done: true, reps: 5, load: 100, rir: 2, unit: "kg", bodyweight: false, plannedReps: 5, plannedLoad: 100, model: "brzycki" };
 */
import type { LoadModel, Unit } from "../notation/model";

export interface LoggedSet {
  sessionId: string;
  /** The session's calendar date, `YYYY-MM-DD`. */
  date: string;
  /** The exercise actually done (the substitute's name when swapped). */
  exercise: string;
  exerciseKey: string;
  kind: "warmup" | "work";
  done: boolean;
  reps: number;
  /** Load lifted; for a bodyweight set, the load added to the body. */
  load: number;
  /** Reps in reserve the athlete reported; null when they did not say. */
  rir: number | null;
  unit: Unit;
  bodyweight: boolean;
  /** Lower end of the planned reps; null for timed sets. */
  plannedReps: number | null;
  plannedLoad: number | null;
  /** The programme's model that turns reps to failure into a fraction of 1RM. */
  model: LoadModel;
}

/** The best estimated 1RM of one exercise in one session. */
export interface SessionBest {
  sessionId: string;
  date: string;
  exercise: string;
  exerciseKey: string;
  e1rm: number;
  /** The set it came from. */
  reps: number;
  load: number;
  rir: number | null;
}

/**
 * Bounds of a logged set, shared by the server's checks and the logging steppers. The load
 * bound is a sanity limit in either unit (well above any lift on record), not a physiological one.
 */
export const LOG_LIMITS = { repsMax: 100, loadMax: 1500, rirMax: 10 } as const;
