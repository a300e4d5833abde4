/**
 * Effort targets: RPE and reps in reserve.
 *
 * RPE 10 = 0 RIR, 9 = 1, 8 = 2 … (Zourdos et al. 2016, J Strength Cond Res 30(1):267–275).
 * Half points map to half reps (RPE 8.5 → 1.5 RIR), which the load models accept as
 * fractional reps to failure.
 *
 * @example
 * rpeToRir(8);   // 2
 * effortText({ kind: "rpe", value: 8.5 }); // "RPE 8.5"
 */
import type { Intensity } from "../notation/model";

/** @example rpeToRir(9.5); // 0.5 */
export function rpeToRir(rpe: number): number {
  return 10 - rpe;
}

/** @example rirToRpe(3); // 7 */
export function rirToRpe(rir: number): number {
  return 10 - rir;
}

/**
 * The reps-in-reserve target of an intensity, or null when it is a percentage.
 * @example rirOf({ kind: "rir", value: 2 }); // 2
 */
export function rirOf(intensity: Intensity | null): number | null {
  if (!intensity) return null;
  if (intensity.kind === "rir") return intensity.value;
  if (intensity.kind === "rpe") return rpeToRir(intensity.value);
  return null;
}

const num = (v: number) => String(Math.round(v * 100) / 100);

/**
 * How the effort target reads on a card.
 * @example effortText({ kind: "percent", value: 75 }); // "75% 1RM"
 */
export function effortText(intensity: Intensity | null, percentStep = 0): string | null {
  if (!intensity) return null;
  switch (intensity.kind) {
    case "percent":
      return `${num(intensity.value + percentStep)}% 1RM`;
    case "rir":
      return `${num(intensity.value)} RIR`;
    case "rpe":
      return `RPE ${num(intensity.value)}`;
  }
}
