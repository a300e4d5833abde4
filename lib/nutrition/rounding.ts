/**
 * Rounding for display, following the EU rounding guidelines for nutrition
 * labels (European Commission (2012) Guidance document for competent
 * authorities … tolerances for nutrient values declared on a label, rounding
 * table; from memory): energy to the nearest 1 kcal; protein, carbohydrate,
 * fat and fibre to the nearest 1 g from 10 g, to 0.1 g below 10 g, and as
 * "<0.5 g" below 0.5 g (the guidance allows "0 g" or "<0.5 g"; we keep the
 * hint that there is some). Exact zero shows as "0 g". Halves round up.
 *
 * @example
 * grams(12.46); // "12 g"
 * grams(4.25); // "4.3 g"
 * grams(0.3); // "<0.5 g"
 * kcal(511.5); // "512 kcal"
 */

/** Rounds half away from zero at `decimals`, immune to binary fractions like 4.25 → 4.2499999. */
export function roundTo(value: number, decimals: number): number {
  const scale = 10 ** decimals;
  const scaled = Number((Math.abs(value) * scale).toPrecision(12));
  return (Math.sign(value) * Math.round(scaled)) / scale;
}

/** Energy as a whole number of kcal. */
export function roundEnergy(kcal: number): number {
  return roundTo(kcal, 0);
}

/** A macro's displayed number: null means "less than 0.5 g" (but not none). */
export function roundMacro(g: number): number | null {
  if (g === 0) return 0;
  if (g < 0.5) return null;
  const tenth = roundTo(g, 1);
  return tenth >= 10 ? roundTo(g, 0) : tenth;
}

export function kcal(value: number): string {
  return `${roundEnergy(value)} kcal`;
}

export function grams(value: number): string {
  const r = roundMacro(value);
  return r === null ? "<0.5 g" : `${r} g`;
}
