/**
 * The profile lib/load expands with, made from what is stored for an athlete:
 * their gym (unit, bar, plates, steps, bodyweight) and their current maxes,
 * each max brought into the gym's unit. The server plans sessions with it and
 * the workbench preview uses it for a coach's athlete, so both work the same
 * loads from the same numbers.
 *
 * A training max is used as given: percentages then apply to it, which is
 * what a coach who enters one intends.
 *
 * @example
 * toExpansionProfile("Maya", { units: "lb", bar: 45, plates: [45, 25, 10, 5, 2.5], dumbbellStep: 5, machineStep: 10, bodyweight: null },
 *   [{ exercise: "back squat", value: 100, units: "kg" }]);
 * // { name: "Maya", units: "lb", …, maxes: { "back squat": 220.46 } }
 */
import { convertMass } from "../load/units";
import type { AthleteProfile } from "./profile";

export type StoredGym = {
  units: "kg" | "lb";
  bar: number;
  plates: AthleteProfile["plates"];
  dumbbellStep: number;
  machineStep: number;
  bodyweight: number | null;
};

export type StoredMax = { exercise: string; value: number; units: "kg" | "lb" };

export function toExpansionProfile(name: string, gym: StoredGym, maxes: readonly StoredMax[]): AthleteProfile {
  const byName: Record<string, number> = {};
  // Hundredths keep a converted max exact enough for any percentage and plate rounding after it.
  for (const m of maxes) byName[m.exercise] = m.units === gym.units ? m.value : Math.round(convertMass(m.value, m.units, gym.units) * 100) / 100;
  return {
    name,
    units: gym.units,
    bar: gym.bar,
    plates: gym.plates,
    dumbbellStep: gym.dumbbellStep,
    machineStep: gym.machineStep,
    maxes: byName,
    ...(gym.bodyweight !== null ? { bodyweight: gym.bodyweight } : {}),
  };
}
