/**
 * Built-in exercises and name resolution.
 * @example
 * import { resolveExercise } from "../exercises";
 * resolveExercise("rdl")?.equipment; // "barbell"
 */
export * from "./catalogue";
export * from "./resolve";
