/**
 * Display helpers for worked sessions: group equal sets, print loads and plates.
 * Shared by the live preview, the share page and (later) the cards.
 */
import type { SetOut } from "@/lib/load/types";

export type SetGroup = { count: number; set: SetOut };

/** Consecutive sets that look the same on paper collapse into one row ("4 × 5–7"). */
export function groupSets(sets: readonly SetOut[]): SetGroup[] {
  const out: SetGroup[] = [];
  for (const s of sets) {
    const last = out.at(-1);
    if (last && sameOnPaper(last.set, s)) last.count++;
    else out.push({ count: 1, set: s });
  }
  return out;
}

function sameOnPaper(a: SetOut, b: SetOut): boolean {
  return (
    a.kind === b.kind &&
    a.repsMin === b.repsMin &&
    a.repsMax === b.repsMax &&
    a.amrap === b.amrap &&
    a.seconds === b.seconds &&
    a.load === b.load &&
    a.bodyweight === b.bodyweight &&
    a.rir === b.rir
  );
}

export function repsText(s: SetOut): string {
  if (s.seconds !== null) return s.seconds >= 60 && s.seconds % 60 === 0 ? `${s.seconds / 60} min` : `${s.seconds} s`;
  if (s.repsMin === null) return "";
  if (s.amrap) return `${s.repsMin}+`;
  return s.repsMax !== null && s.repsMax !== s.repsMin ? `${s.repsMin}–${s.repsMax}` : `${s.repsMin}`;
}

export function num(n: number): string {
  return Number.isInteger(n) ? String(n) : String(Math.round(n * 100) / 100);
}

export function loadText(s: SetOut, units: string): string {
  if (s.bodyweight) return s.load ? `BW + ${num(s.load)} ${units}` : "BW";
  return s.load === null ? "" : `${num(s.load)} ${units}`;
}

export function platesText(s: SetOut): string {
  if (!s.perSide) return "";
  return s.perSide.length === 0 ? "bar only" : s.perSide.map(num).join(" · ");
}

export function restText(seconds: number | null): string | null {
  if (seconds === null) return null;
  if (seconds >= 60) return seconds % 60 === 0 ? `${seconds / 60} min` : `${Math.floor(seconds / 60)} min ${seconds % 60} s`;
  return `${seconds} s`;
}
