/**
 * The load engine: from a programme and an athlete to dated sessions with loads the athlete
 * can put on the bar.
 *
 * @example
 * import { expandProgramme } from "../load";
 * const { sessions, diagnostics } = expandProgramme(programme, athlete, { start: "2027-01-04" });
 */
export { expandProgramme, variationFor, MAX_WEEKS } from "./expand";
export { e1rm, percentOf1RM, checkRepsToFailure, NSCA_TABLE, TRUSTED_REPS, DOMAIN_REPS, type RepsCheck } from "./models";
export { rpeToRir, rirToRpe, rirOf, effortText } from "./effort";
export { KG_PER_LB, convertMass, massIn, defaultRoundStep } from "./units";
export { roundLoad, roundToStep, type RoundingRule, type RoundedLoad } from "./round";
export { platesPerSide, nearestBarbellLoad, type PlateSet, type BarbellLoad } from "./plates";
export { warmupRamp, defaultRampReps, DEFAULT_RAMP_REPS, type RampSet } from "./ramp";
export { weekProgression, deloadSets, DELOAD, type WeekProgression } from "./progression";
export { scheduleWeeks, blockWeekdays, DEFAULT_WEEKDAYS } from "./schedule";
export { MAX_SETS } from "./prescription";
export type { Session, ExerciseOut, SubstituteOut, SetOut, ExpandDiagnostic, ExpandOptions, ExpandResult } from "./types";
export type { AthleteProfile } from "../athlete/profile";
