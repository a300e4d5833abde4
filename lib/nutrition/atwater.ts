/**
 * Energy from macronutrients, and the check of a label's stated energy against it.
 *
 * General factors (kcal per g): protein 4, carbohydrate 4, fat 9 — the Atwater
 * general factors of Merrill & Watt (1955, rev. 1973) Energy Value of Foods,
 * USDA Agriculture Handbook No. 74. Fibre, when the label states it, counts
 * 2 kcal per g as in Regulation (EU) No 1169/2011, Annex XIV: labels that print
 * fibre apart from carbohydrate (the EU style this app asks for) also count it
 * in their energy at that rate, so leaving it out would flag every high-fibre
 * label. See README.md beside this file for the whole convention.
 *
 * @example
 * macroEnergy({ protein: 10, carbohydrate: 20, fat: 5, fibre: null }); // 4·10 + 4·20 + 9·5 = 165
 * checkLabelEnergy({ energyKcal: 400, protein: 10, carbohydrate: 20, fat: 5, fibre: null }).agrees; // false
 */
import type { Per100g } from "./types";

export const ATWATER_GENERAL = { protein: 4, carbohydrate: 4, fat: 9 } as const;

/** kcal per g of fibre on a label that lists fibre separately (EU 1169/2011 Annex XIV). */
export const FIBRE_KCAL_PER_G = 2;

/** The disagreement allowed before a label is flagged: the larger of 10 % of the label and 20 kcal per 100 g. */
export const LABEL_TOLERANCE = { fraction: 0.1, kcal: 20 } as const;

/** Energy in kcal from grams of protein, carbohydrate, fat and (optional) fibre. */
export function macroEnergy(m: { protein: number; carbohydrate: number; fat: number; fibre: number | null }): number {
  return (
    ATWATER_GENERAL.protein * m.protein +
    ATWATER_GENERAL.carbohydrate * m.carbohydrate +
    ATWATER_GENERAL.fat * m.fat +
    FIBRE_KCAL_PER_G * (m.fibre ?? 0)
  );
}

export type LabelEnergyCheck = {
  /** The label's energy per 100 g. */
  label: number;
  /** The same worked from the label's macros. */
  fromMacros: number;
  /** label − fromMacros. */
  difference: number;
  /** The largest difference still accepted for this label. */
  allowed: number;
  agrees: boolean;
};

/**
 * Compares a label's energy with the energy of its own macros. Labels use
 * food-specific factors and round each value, so small gaps are normal; a gap
 * beyond the tolerance usually means a typing slip (kJ typed as kcal, a
 * missing digit) or a label for another product.
 */
export function checkLabelEnergy(per100: Per100g): LabelEnergyCheck {
  const fromMacros = macroEnergy(per100);
  const difference = per100.energyKcal - fromMacros;
  const allowed = Math.max(LABEL_TOLERANCE.kcal, LABEL_TOLERANCE.fraction * per100.energyKcal);
  return { label: per100.energyKcal, fromMacros, difference, allowed, agrees: Math.abs(difference) <= allowed };
}
