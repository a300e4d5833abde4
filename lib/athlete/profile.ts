/**
 * The athlete profile: who lifts, in which unit, on what equipment, with which maxes.
 * Read by the command line from JSON and, later, stored per athlete.
 *
 * Plates are the athlete's gym: either a list of weights (as many pairs as needed) or
 * `{ weight, pairs }` objects when the gym only has so many. Maxes are 1RMs in the
 * profile's unit, keyed by any exercise name or alias.
 *
 * @example
 * const r = parseAthleteProfile({ name: "Ana", units: "kg", bar: 20, plates: [20, 10, 5, 2.5, 1.25], maxes: { squat: 120 } });
 * r.ok && r.profile.dumbbellStep; // 2 (the kg default)
 */
import { z } from "zod";

/** Weights are given to at most three decimals so that plate sums can be worked in whole units. */
const weight = z
  .number({ error: "expected a number" })
  .positive({ error: "must be greater than 0" })
  .max(1000, { error: "must be at most 1000" })
  .refine((v) => Math.abs(v * 1000 - Math.round(v * 1000)) < 1e-6, { error: "use at most three decimals" });

const limitedPlate = z.object(
  {
    weight,
    pairs: z.number({ error: "expected a whole number" }).int({ error: "expected a whole number" }).min(0, { error: "must be 0 or more" }).max(100, { error: "must be at most 100" }),
  },
  { error: "expected {\"weight\": number, \"pairs\": number}" },
);

type PlateList = number[] | { weight: number; pairs: number }[];

/**
 * Checked element by element (rather than as a union of two list shapes) so that an error
 * names the offending plate, e.g. `plates[2].pairs`.
 */
const platesSchema = z
  .array(z.unknown(), { error: "expected a list of plate weights or of {\"weight\", \"pairs\"} objects" })
  .superRefine((items, ctx) => {
    let numbers = 0;
    let objects = 0;
    items.forEach((item, i) => {
      if (typeof item === "number") numbers++;
      else if (typeof item === "object" && item !== null) objects++;
      else return ctx.addIssue({ code: "custom", message: "expected a plate weight or {\"weight\", \"pairs\"}", path: [i] });
      const r = (typeof item === "number" ? weight : limitedPlate).safeParse(item);
      if (!r.success) for (const issue of r.error.issues) ctx.addIssue({ code: "custom", message: issue.message, path: [i, ...issue.path] });
    });
    if (numbers > 0 && objects > 0) ctx.addIssue({ code: "custom", message: "use either plain weights or {\"weight\", \"pairs\"} objects, not both" });
  })
  .transform((items) => items as PlateList);

export const athleteProfileSchema = z
  .object(
    {
      name: z.string({ error: "expected a string" }).trim().min(1, { error: "must not be empty" }),
      units: z.enum(["kg", "lb"], { error: 'expected "kg" or "lb"' }),
      bar: weight,
      plates: platesSchema,
      /** Step between dumbbells; defaults to 2 kg / 5 lb (common practice, no source). */
      dumbbellStep: weight.optional(),
      /** Step of machine and cable stacks; defaults to 5 kg / 10 lb (common practice, no source). */
      machineStep: weight.optional(),
      maxes: z.record(z.string(), z.number({ error: "expected a number" }).positive({ error: "must be greater than 0" }).max(10_000, { error: "must be at most 10000" })).default({}),
      bodyweight: weight.optional(),
    },
    { error: "expected a JSON object" },
  )
  .strict();

export type AthleteProfileInput = z.input<typeof athleteProfileSchema>;

/** A validated profile with every default filled in. */
export interface AthleteProfile {
  name: string;
  units: "kg" | "lb";
  bar: number;
  plates: number[] | { weight: number; pairs: number }[];
  dumbbellStep: number;
  machineStep: number;
  maxes: Record<string, number>;
  bodyweight?: number;
}

export type ProfileResult = { ok: true; profile: AthleteProfile } | { ok: false; errors: string[] };

function fieldPath(path: readonly PropertyKey[]): string {
  let out = "";
  for (const p of path) out += typeof p === "number" ? `[${p}]` : out ? `.${String(p)}` : String(p);
  return out || "profile";
}

/**
 * Validate unknown JSON as a profile. Errors name the field, e.g. `plates[2].pairs: expected a whole number`.
 * @example parseAthleteProfile({ name: "", units: "st" }).ok; // false
 */
export function parseAthleteProfile(input: unknown): ProfileResult {
  const r = athleteProfileSchema.safeParse(input);
  if (!r.success) {
    const errors = r.error.issues.map((i) => {
      if (i.code === "unrecognized_keys") return `${fieldPath(i.path)}: unknown field ${i.keys.map((k) => `"${k}"`).join(", ")}`;
      return `${fieldPath(i.path)}: ${i.message}`;
    });
    return { ok: false, errors };
  }
  const p = r.data;
  const kg = p.units === "kg";
  return {
    ok: true,
    profile: {
      name: p.name,
      units: p.units,
      bar: p.bar,
      plates: p.plates,
      dumbbellStep: p.dumbbellStep ?? (kg ? 2 : 5),
      machineStep: p.machineStep ?? (kg ? 5 : 10),
      maxes: p.maxes,
      ...(p.bodyweight !== undefined ? { bodyweight: p.bodyweight } : {}),
    },
  };
}
