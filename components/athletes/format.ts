/**
 * Display helpers for the athlete profile panels: masses with their unit, the
 * same mass in the athlete's own unit, and what a change did to upcoming sessions.
 */
import type { CurrentMax, MaxEntry, MaxesResponse, Units } from "@/app/api/athletes/types";
import { convertMass } from "@/lib/load/units";

export function mass(value: number, unit: string): string {
  return `${Number.isInteger(value) ? value : Math.round(value * 100) / 100} ${unit}`;
}

/** "(308.6 lb)" when the max was entered in the other unit; loads are worked from the converted value. */
export function inAthleteUnit(m: Pick<CurrentMax, "value" | "units">, athleteUnits: Units): string | null {
  if (m.units === athleteUnits) return null;
  return `≈ ${mass(Math.round(convertMass(m.value, m.units, athleteUnits) * 10) / 10, athleteUnits)}`;
}

export const KIND_LABEL = { "1rm": "1RM", tm: "Training max" } as const;
export const SOURCE_LABEL = { tested: "Tested", estimated: "Estimated", logs: "From logs" } as const;

/** "12 upcoming sessions updated." — what a change did, for the status line. */
export function recomputedText(n: number): string {
  if (n === 0) return "No upcoming sessions needed new loads.";
  return n === 1 ? "1 upcoming session updated with the new loads." : `${n} upcoming sessions updated with the new loads.`;
}

type ServerEntry = Omit<MaxEntry, "createdAt"> & { createdAt: Date | string };
type ServerView = Omit<MaxesResponse, "history"> & { history: { exerciseKey: string; exercise: string; entries: ServerEntry[] }[] };

/** The maxes as the API sends them (entry times as ISO strings), from what the server page read. */
export function maxesForClient(view: ServerView): MaxesResponse {
  return {
    units: view.units,
    current: view.current,
    history: view.history.map((g) => ({
      ...g,
      entries: g.entries.map((e) => ({ ...e, createdAt: typeof e.createdAt === "string" ? e.createdAt : e.createdAt.toISOString() })),
    })),
  };
}
