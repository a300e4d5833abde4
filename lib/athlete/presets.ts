/**
 * Equipment presets a coach or athlete starts from and then edits: the bar, the
 * plates on hand and the steps of dumbbells and machine stacks.
 *
 * @example
 * const club = equipmentPreset("kg-club");
 * club.bar; // 20
 */
import type { AthleteProfile } from "./profile";

export type EquipmentPresetId = "kg-club" | "kg-home" | "lb-club" | "lb-garage";

export interface EquipmentPreset {
  id: EquipmentPresetId;
  label: string;
  units: "kg" | "lb";
  bar: number;
  plates: AthleteProfile["plates"];
  dumbbellStep: number;
  machineStep: number;
}

/**
 * kg discs follow the IWF/IPF series (IWF Technical and Competition Rules, "Sport equipment";
 * IPF Technical Rules, "Bars and discs"); the lb set is common practice, no single source.
 * The pairs on hand in the home and garage presets, and the dumbbell and stack steps,
 * are common practice, no source.
 */
export const EQUIPMENT_PRESETS: readonly EquipmentPreset[] = [
  { id: "kg-club", label: "Club gym (kg): 20 kg bar, full disc set", units: "kg", bar: 20, plates: [25, 20, 15, 10, 5, 2.5, 1.25], dumbbellStep: 2, machineStep: 5 },
  {
    id: "kg-home",
    label: "Home rack (kg): 20 kg bar, a few pairs of each",
    units: "kg",
    bar: 20,
    plates: [
      { weight: 20, pairs: 3 },
      { weight: 10, pairs: 2 },
      { weight: 5, pairs: 2 },
      { weight: 2.5, pairs: 2 },
      { weight: 1.25, pairs: 2 },
    ],
    dumbbellStep: 2.5,
    machineStep: 5,
  },
  { id: "lb-club", label: "Club gym (lb): 45 lb bar, full plate set", units: "lb", bar: 45, plates: [45, 35, 25, 10, 5, 2.5], dumbbellStep: 5, machineStep: 10 },
  {
    id: "lb-garage",
    label: "Garage gym (lb): 45 lb bar, a few pairs of each",
    units: "lb",
    bar: 45,
    plates: [
      { weight: 45, pairs: 4 },
      { weight: 25, pairs: 2 },
      { weight: 10, pairs: 2 },
      { weight: 5, pairs: 2 },
      { weight: 2.5, pairs: 2 },
    ],
    dumbbellStep: 5,
    machineStep: 10,
  },
];

/** The preset with this id; unknown ids fall back to the kg club gym. */
export function equipmentPreset(id: string): EquipmentPreset {
  return EQUIPMENT_PRESETS.find((p) => p.id === id) ?? EQUIPMENT_PRESETS[0];
}

/** The preset to start from for a unit. */
export function defaultPresetFor(units: "kg" | "lb"): EquipmentPreset {
  return equipmentPreset(units === "kg" ? "kg-club" : "lb-club");
}

/**
 * The preset these values are exactly, or null once anything was changed by
 * hand (plates compared heaviest first, so their order does not matter).
 * @example matchingPreset({ units: "kg", bar: 20, plates: [1.25, 2.5, 5, 10, 15, 20, 25], dumbbellStep: 2, machineStep: 5 }); // "kg-club"
 */
export function matchingPreset(e: Omit<EquipmentPreset, "id" | "label">): EquipmentPresetId | null {
  // Compared as [weight, pairs] pairs: jsonb does not keep an object's key order.
  const sorted = (plates: AthleteProfile["plates"]) =>
    JSON.stringify(plates.map((x) => (typeof x === "number" ? x : [x.weight, x.pairs])).sort((a, b) => (typeof b === "number" ? b : b[0]) - (typeof a === "number" ? a : a[0])));
  const hit = EQUIPMENT_PRESETS.find(
    (p) => p.units === e.units && p.bar === e.bar && p.dumbbellStep === e.dumbbellStep && p.machineStep === e.machineStep && sorted(p.plates) === sorted(e.plates),
  );
  return hit?.id ?? null;
}
