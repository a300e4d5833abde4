import "server-only";
import type { AthleteProfile } from "../lib/athlete/profile";
import { defaultPresetFor } from "../lib/athlete/presets";
import { toExpansionProfile } from "../lib/athlete/expansion";
import type { MaxKind, MaxSource, PlateSet, Units } from "./database";
import { type Actor, type Db, requireAthleteFor } from "./athleteAccess";

export type Equipment = {
  units: Units;
  bodyweight: number | null;
  bar: number;
  plates: PlateSet;
  dumbbellStep: number;
  machineStep: number;
  preset: string | null;
  /** False when nothing is stored yet and these are the defaults for kg. */
  stored: boolean;
};

export type CurrentMax = {
  id: string;
  exercise: string;
  exerciseKey: string;
  kind: MaxKind;
  value: number;
  units: Units;
  measuredOn: string;
  source: MaxSource;
};

/**
 * The athlete's equipment, or the kg club preset when none is stored yet.
 * Access is the caller's business (db/athleteAccess.ts).
 */
export async function getEquipment(db: Db, athleteId: string): Promise<Equipment> {
  const row = await db.selectFrom("athlete_profiles").selectAll().where("user_id", "=", athleteId).executeTakeFirst();
  if (!row) {
    const p = defaultPresetFor("kg");
    return { units: p.units, bodyweight: null, bar: p.bar, plates: p.plates, dumbbellStep: p.dumbbellStep, machineStep: p.machineStep, preset: p.id, stored: false };
  }
  return {
    units: row.units,
    bodyweight: row.bodyweight,
    bar: row.bar,
    plates: row.plates,
    dumbbellStep: row.dumbbell_step,
    machineStep: row.machine_step,
    preset: row.preset,
    stored: true,
  };
}

/** The latest max per exercise (by date measured, then by entry time). */
export async function currentMaxes(db: Db, athleteId: string): Promise<CurrentMax[]> {
  const rows = await db
    .selectFrom("athlete_maxes")
    .select(["id", "exercise", "exercise_key", "kind", "value", "units", "measured_on", "source"])
    .distinctOn("exercise_key")
    .where("athlete_id", "=", athleteId)
    .orderBy("exercise_key")
    .orderBy("measured_on", "desc")
    .orderBy("created_at", "desc")
    .execute();
  return rows
    .map((r) => ({ id: r.id, exercise: r.exercise, exerciseKey: r.exercise_key, kind: r.kind, value: r.value, units: r.units, measuredOn: r.measured_on, source: r.source }))
    .sort((a, b) => a.exercise.localeCompare(b.exercise));
}

/**
 * The profile lib/load expands with (lib/athlete/expansion.ts), for an athlete
 * whose access the caller has checked.
 *
 * @example
 * const profile = await expansionProfile(db, athlete.id, athlete.name);
 * expandProgramme(programme, profile, { start: "2027-01-04" });
 */
export async function expansionProfile(db: Db, athleteId: string, name: string): Promise<AthleteProfile> {
  const [eq, maxes] = await Promise.all([getEquipment(db, athleteId), currentMaxes(db, athleteId)]);
  return toExpansionProfile(name, eq, maxes);
}

export type AthleteOverview = { athlete: { id: string; name: string; email: string }; equipment: Equipment; maxes: CurrentMax[] };

/**
 * Name, e-mail, equipment and current maxes; not_found for anyone but the
 * athlete and their coach. Changes go through db/athleteMaxes.ts.
 */
export async function athleteOverview(db: Db, actor: Actor, athleteId: string): Promise<AthleteOverview> {
  const a = await requireAthleteFor(db, actor, athleteId);
  const [equipment, maxes] = await Promise.all([getEquipment(db, a.id), currentMaxes(db, a.id)]);
  return { athlete: { id: a.id, name: a.name, email: a.email }, equipment, maxes };
}
