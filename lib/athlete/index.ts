/**
 * Athlete profiles.
 * @example
 * import { parseAthleteProfile } from "../athlete";
 * parseAthleteProfile(JSON.parse(text));
 */
export * from "./profile";
export * from "./presets";
