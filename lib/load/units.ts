/**
 * Mass units. 1 lb = 0.45359237 kg exactly (international yard and pound agreement, 1959;
 * NIST SP 811, Appendix B). Conversion is exact arithmetic; rounding to loadable weights
 * happens afterwards, in the athlete's own unit.
 *
 * @example
 * convertMass(45, "lb", "kg"); // 20.41165665
 */
import type { Mass, Unit } from "../notation/model";

export const KG_PER_LB = 0.45359237;

/** @example convertMass(100, "kg", "lb"); // 220.462… */
export function convertMass(value: number, from: Unit, to: Unit): number {
  if (from === to) return value;
  return from === "lb" ? value * KG_PER_LB : value / KG_PER_LB;
}

/** @example massIn({ value: 10, unit: "lb" }, "lb"); // 10 */
export function massIn(mass: Mass, unit: Unit): number {
  return convertMass(mass.value, mass.unit, unit);
}

/**
 * Rounding step for loads with no equipment of their own: the programme's `round` when it is
 * written in the athlete's unit, otherwise 2.5 kg / 5 lb (common practice, no source). A step
 * written for kg plates means nothing on a pound bar, so it is not converted.
 * @example defaultRoundStep("lb", 2.5, "kg"); // 5
 */
export function defaultRoundStep(athleteUnit: Unit, programmeRound: number | null, programmeUnit: Unit): number {
  if (programmeRound !== null && programmeRound > 0 && Number.isFinite(programmeRound) && programmeUnit === athleteUnit) return programmeRound;
  return athleteUnit === "kg" ? 2.5 : 5;
}
