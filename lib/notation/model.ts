/**
 * The typed programme model: what a `.iq` file means once parsed.
 *
 * The browser preview, the server and the command line all consume this one
 * shape, so it is validated with zod at the boundaries (stored versions are
 * re-read from the database as JSON). Positions are 1-based line numbers into
 * the source so a preview row can point back at the line that made it.
 *
 * @example
 * const p: Programme = programmeSchema.parse(json);
 * p.blocks[0].days[0].exercises[0].sets; // 4
 */
import { z } from "zod";

export const WEEKDAYS = ["mon", "tue", "wed", "thu", "fri", "sat", "sun"] as const;
export const weekdaySchema = z.enum(WEEKDAYS);
export type Weekday = z.infer<typeof weekdaySchema>;

export const unitSchema = z.enum(["kg", "lb"]);
export type Unit = z.infer<typeof unitSchema>;

/** Models that turn reps to failure into a fraction of 1RM. */
export const LOAD_MODELS = ["brzycki", "epley", "nsca"] as const;
export const loadModelSchema = z.enum(LOAD_MODELS);
export type LoadModel = z.infer<typeof loadModelSchema>;

/** A mass written in the source, in the unit it was written in. */
export const massSchema = z.object({ value: z.number(), unit: unitSchema });
export type Mass = z.infer<typeof massSchema>;

export const repsSchema = z.discriminatedUnion("kind", [
  /** `5`, `6-8`, `10+` (amrap: the last set goes to as many reps as possible, min is the floor). */
  z.object({ kind: z.literal("reps"), min: z.number().int(), max: z.number().int(), amrap: z.boolean() }),
  /** `30s`, `2m`: a timed set. */
  z.object({ kind: z.literal("time"), seconds: z.number() }),
]);
export type Reps = z.infer<typeof repsSchema>;

export const intensitySchema = z.discriminatedUnion("kind", [
  /** `@75%`: percent of the athlete's 1RM for the exercise (75, not 0.75). */
  z.object({ kind: z.literal("percent"), value: z.number() }),
  /** `@2rir`: reps left in the tank at the end of each work set. */
  z.object({ kind: z.literal("rir"), value: z.number() }),
  /** `@rpe8`, `@rpe8.5`: rating of perceived exertion; RIR = 10 − value. */
  z.object({ kind: z.literal("rpe"), value: z.number() }),
]);
export type Intensity = z.infer<typeof intensitySchema>;

export const loadSchema = z.discriminatedUnion("kind", [
  /** `80kg`, `175lb`: a fixed load. */
  z.object({ kind: z.literal("fixed"), mass: massSchema }),
  /** `bw`, `bw+10kg`: bodyweight, optionally with added load. */
  z.object({ kind: z.literal("bodyweight"), plus: massSchema.nullable() }),
]);
export type Load = z.infer<typeof loadSchema>;

/** One warm-up step: a percentage of the first working load and, when written, its reps. */
export const rampStepSchema = z.object({ percent: z.number(), reps: z.number().int().nullable() });
export type RampStep = z.infer<typeof rampStepSchema>;

export const progressionSchema = z.discriminatedUnion("kind", [
  /** `+2.5kg/wk`: add this mass per week of the block. */
  z.object({ kind: z.literal("load"), mass: massSchema }),
  /** `+5%/wk`: add percentage points of 1RM per week (on a %-based line), or 5 % of the week-1 load. */
  z.object({ kind: z.literal("percent"), value: z.number() }),
  /** `+1rep/wk`: add reps per week. */
  z.object({ kind: z.literal("reps"), value: z.number().int() }),
]);
export type Progression = z.infer<typeof progressionSchema>;

export const exerciseSchema = z.object({
  line: z.number().int(),
  /** Pairing label such as `A1`, `B2`; exercises sharing a letter are done alternately. */
  label: z.string().nullable(),
  /** The exercise as written; with a rotation, the list of variations in order. */
  variations: z.array(z.string()).min(1),
  /** `rotate 2w`: move to the next variation every N weeks, counted from the programme's week 1. */
  rotateWeeks: z.number().int().nullable(),
  sets: z.number().int(),
  reps: repsSchema,
  intensity: intensitySchema.nullable(),
  load: loadSchema.nullable(),
  ramp: z.array(rampStepSchema).nullable(),
  pauseSeconds: z.number().nullable(),
  /** Four digits: lowering, pause at the bottom, lifting, pause at the top (seconds; `x` = explosive). */
  tempo: z.string().nullable(),
  restSeconds: z.number().nullable(),
  progression: z.array(progressionSchema),
  /** `or machine row, dumbbell row`: what to do when the first choice is not available. */
  substitutes: z.array(z.string()),
  cue: z.string().nullable(),
});
export type Exercise = z.infer<typeof exerciseSchema>;

export const daySchema = z.object({
  line: z.number().int(),
  name: z.string(),
  weekday: weekdaySchema.nullable(),
  /** General warm-up lines (`warmup "..."`), printed before the first exercise. */
  warmups: z.array(z.string()),
  exercises: z.array(exerciseSchema),
});
export type Day = z.infer<typeof daySchema>;

export const blockSchema = z.object({
  /** Line of the `block` header; null for the implicit block of a file without one. */
  line: z.number().int().nullable(),
  name: z.string(),
  weeks: z.number().int(),
  /** 1-based week numbers inside this block that are deloads. */
  deloadWeeks: z.array(z.number().int()),
  days: z.array(daySchema),
});
export type Block = z.infer<typeof blockSchema>;

export const programmeSchema = z.object({
  title: z.string().nullable(),
  units: unitSchema,
  /** Rounding step for loads with no equipment of their own; null = 2.5 kg / 5 lb. */
  round: z.number().nullable(),
  model: loadModelSchema,
  /** Other `key: value` metadata lines (description, level, tags…), keys lower-cased. */
  meta: z.record(z.string(), z.string()),
  blocks: z.array(blockSchema),
});
export type Programme = z.infer<typeof programmeSchema>;

export const severitySchema = z.enum(["error", "warning", "info"]);
export type Severity = z.infer<typeof severitySchema>;

/** A positioned problem: 1-based line and column, length in characters, a coach-readable message. */
export const diagnosticSchema = z.object({
  from: z.number().int(),
  to: z.number().int(),
  line: z.number().int(),
  column: z.number().int(),
  length: z.number().int(),
  severity: severitySchema,
  message: z.string(),
});
export type Diagnostic = z.infer<typeof diagnosticSchema>;
