/**
 * An athlete's gym as they (or their coach) edit it: unit, bodyweight, bar,
 * plates and the steps of dumbbells and machine stacks. The field rules are the
 * athlete profile's (./profile.ts), tightened to what the athlete_profiles
 * table accepts, so a bad value is a message on its field and never a refused
 * database write.
 *
 * Changing the unit does not touch stored maxes: each keeps the unit it was
 * entered in and is converted when loads are worked out (db/athleteProfiles.ts
 * `expansionProfile`). The bar, plates and steps are in the new unit.
 *
 * @example
 * const r = parseEquipment({ units: "kg", bodyweight: 82.5, bar: 20, plates: [25, 20, 10, 5, 2.5, 1.25], dumbbellStep: 2, machineStep: 5 });
 * r.ok && r.equipment.plates.length; // 6
 */
import { z } from "zod";
import { convertMass } from "../load/units";
import { athleteProfileSchema } from "./profile";

const p = athleteProfileSchema.shape;

export const BAR_MAX = 100;
export const STEP_MAX = 50;
export const PLATES_MAX = 20;

export const equipmentSchema = z
  .object(
    {
      units: p.units,
      /** Left out or null when not on file. */
      bodyweight: p.bodyweight.unwrap().nullable().default(null),
      bar: p.bar.max(BAR_MAX, { error: `must be at most ${BAR_MAX}` }),
      plates: p.plates,
      dumbbellStep: p.dumbbellStep.unwrap().max(STEP_MAX, { error: `must be at most ${STEP_MAX}` }),
      machineStep: p.machineStep.unwrap().max(STEP_MAX, { error: `must be at most ${STEP_MAX}` }),
    },
    // Only the wrong-type message is ours; an unknown key keeps zod's own message, which names the key.
    { error: (issue) => (issue.code === "invalid_type" ? "expected a JSON object" : undefined) },
  )
  .strict()
  .superRefine((e, ctx) => {
    if (e.plates.length === 0) ctx.addIssue({ code: "custom", message: "list at least one plate", path: ["plates"] });
    if (e.plates.length > PLATES_MAX) ctx.addIssue({ code: "custom", message: `list at most ${PLATES_MAX} plate sizes`, path: ["plates"] });
    const seen = new Set<number>();
    e.plates.forEach((plate, i) => {
      const w = typeof plate === "number" ? plate : plate.weight;
      if (seen.has(w)) ctx.addIssue({ code: "custom", message: `${w} is listed twice`, path: ["plates", i] });
      seen.add(w);
    });
  });

export type EquipmentInput = z.input<typeof equipmentSchema>;
export type EquipmentValues = z.output<typeof equipmentSchema>;

export type EquipmentResult = { ok: true; equipment: EquipmentValues } | { ok: false; fields: Record<string, string> };

/**
 * Validates equipment; problems are keyed by field path the way the API
 * reports them ("plates.2.pairs"). Plates are sorted heaviest first.
 * @example parseEquipment({ units: "st" }).ok; // false
 */
export function parseEquipment(input: unknown): EquipmentResult {
  const r = equipmentSchema.safeParse(input);
  if (!r.success) {
    const fields: Record<string, string> = {};
    for (const issue of r.error.issues) {
      const key = issue.path.join(".") || "_";
      const message = issue.code === "unrecognized_keys" ? `unknown field ${issue.keys.map((k) => `"${k}"`).join(", ")}` : issue.message;
      fields[key] ??= message;
    }
    return { ok: false, fields };
  }
  const plates = [...r.data.plates].sort((a, b) => weightOf(b) - weightOf(a)) as EquipmentValues["plates"];
  return { ok: true, equipment: { ...r.data, plates } };
}

function weightOf(plate: number | { weight: number }): number {
  return typeof plate === "number" ? plate : plate.weight;
}

/**
 * Bodyweight carried over to the other unit when the athlete switches, to one
 * decimal (1 lb = 0.45359237 kg, NIST SP 811 Appendix B).
 * @example convertBodyweight(80, "kg", "lb"); // 176.4
 */
export function convertBodyweight(value: number, from: "kg" | "lb", to: "kg" | "lb"): number {
  if (from === to) return value;
  return Math.round(convertMass(value, from, to) * 10) / 10;
}
