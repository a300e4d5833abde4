/**
 * The preview's stand-in athlete when a coach has not picked one of theirs:
 * a kg gym with a 20 kg bar and change plates down to 1.25 kg, and round
 * maxes a coach can edit in place.
 */
import type { AthleteProfile } from "@/lib/athlete/profile";

export const SAMPLE_MAXES_KG: Record<string, number> = {
  "back squat": 140,
  "front squat": 115,
  "bench press": 100,
  "incline bench press": 85,
  "overhead press": 60,
  deadlift: 180,
  "romanian deadlift": 140,
  "barbell row": 90,
  "lat pulldown": 75,
  "cable row": 70,
};

export function sampleProfile(units: "kg" | "lb", maxes: Record<string, number>): AthleteProfile {
  return units === "kg"
    ? { name: "Sample athlete", units, bar: 20, plates: [25, 20, 15, 10, 5, 2.5, 1.25], dumbbellStep: 2, machineStep: 5, maxes, bodyweight: 80 }
    : { name: "Sample athlete", units, bar: 45, plates: [45, 35, 25, 10, 5, 2.5], dumbbellStep: 5, machineStep: 10, maxes, bodyweight: 175 };
}

/** The Monday on or after a date, as YYYY-MM-DD: previews start on a fresh week. */
export function nextMonday(today = new Date()): string {
  const d = new Date(Date.UTC(today.getUTCFullYear(), today.getUTCMonth(), today.getUTCDate()));
  const add = (8 - d.getUTCDay()) % 7;
  d.setUTCDate(d.getUTCDate() + add);
  return d.toISOString().slice(0, 10);
}
