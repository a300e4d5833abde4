/**
 * Progress from logged sets: estimated 1RM per set and per session, weekly volume, personal
 * bests, stalled lifts, sets far off target, the coach's attention flags and the
 * auto-regulation rule. Pure; the rules and their thresholds are in README.md.
 *
 * @example
 * import { sessionBests, markPersonalBests, weeklyVolume } from "../progress";
 * const bests = markPersonalBests(sessionBests(sets, "kg"));
 */
export * from "./types";
export * from "./e1rm";
export * from "./records";
export * from "./volume";
export * from "./stall";
export * from "./targets";
export * from "./attention";
export * from "./autoRegulate";
