/**
 * The expanded sessions: what the preview, the server, the cards and `iq expand --json` show.
 * All loads are in the athlete's unit.
 *
 * @example
 * const set: SetOut = { kind: "work", repsMin: 5, repsMax: 7, amrap: false, seconds: null, load: 82.5,
 *   bodyweight: false, perSide: [25, 5, 1.25], rir: 2, percent1RM: 0.8333 };
 */
import type { Unit, Weekday } from "../notation/model";
import type { EquipmentKind } from "../exercises/catalogue";
import type { LibraryName } from "../exercises/resolve";

export interface SetOut {
  kind: "warmup" | "work";
  /** Null for a timed set. */
  repsMin: number | null;
  /** Null for a timed set and for an AMRAP set (no ceiling). */
  repsMax: number | null;
  /** As many reps as possible, at least repsMin; only ever the last work set. */
  amrap: boolean;
  /** Duration of a timed set; null for rep sets. */
  seconds: number | null;
  /** Load to lift; with `bodyweight` it is the load added to the body. Null when it cannot be worked out. */
  load: number | null;
  bodyweight: boolean;
  /** Plates on each side of the bar, heaviest first; null off the barbell or without a load. */
  perSide: number[] | null;
  /** Reps-in-reserve target of the set. */
  rir: number | null;
  /** Target as a fraction of 1RM (0.8333), rounded to four places, after any deload scaling; null for fixed and bodyweight loads. */
  percent1RM: number | null;
}

export interface SubstituteOut {
  name: string;
  exerciseId: string | null;
  equipment: EquipmentKind;
  /** 1RM used for this substitute's loads, if on file. */
  max: number | null;
  loadNote: string | null;
  sets: SetOut[];
}

export interface ExerciseOut extends SubstituteOut {
  /** Source line of the exercise. */
  line: number;
  label: string | null;
  cue: string | null;
  /** The effort target as printed: "2 RIR", "RPE 8", "75% 1RM". */
  effort: string | null;
  restSeconds: number | null;
  tempo: string | null;
  pauseSeconds: number | null;
  /** Which variation of a rotation this week uses (0-based). */
  variationIndex: number;
  substitutes: SubstituteOut[];
}

export interface Session {
  date: string;
  /** ISO 8601 week label, "2027-W01". */
  isoWeek: string;
  weekday: Weekday;
  block: string;
  blockIndex: number;
  /** Week of the block, from 1. */
  week: number;
  /** Week of the programme, from 1, counted across blocks. */
  weekInProgramme: number;
  deload: boolean;
  day: string;
  dayLine: number;
  units: Unit;
  /** General warm-up lines of the day, printed before the first exercise. */
  warmupNotes: string[];
  exercises: ExerciseOut[];
}

export interface ExpandDiagnostic {
  severity: "error" | "warning" | "info";
  /** Stable machine-readable kind, e.g. "no-max", "reps-outside-model". */
  code: string;
  message: string;
  /** Source line it concerns, when there is one. */
  line: number | null;
}

export interface ExpandOptions {
  /** First day of week 1, `YYYY-MM-DD`. */
  start: string;
  /** Weekdays for days without a weekday tag, in order. */
  days?: Weekday[];
  /** Expand only this many programme weeks. */
  weeks?: number;
  /**
   * The coach's own exercises, by every name they answer to: their equipment
   * decides the rounding, and a max filed under one is found for any alias.
   */
  library?: readonly LibraryName[];
}

export interface ExpandResult {
  sessions: Session[];
  diagnostics: ExpandDiagnostic[];
}
