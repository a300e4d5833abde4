import "server-only";
import { sql } from "kysely";
import { addDays } from "../lib/dates/date";
import { parseEquipment } from "../lib/athlete/equipment";
import { exerciseMatcher, type ExerciseResolver } from "../lib/athlete/exerciseMatch";
import { type CheckedMax, checkMax, MAX_FIELDS, type MaxDraft, type MaxRules } from "../lib/athlete/maxEntry";
import { type CsvResult, describeCsvProblem, parseMaxesCsv } from "../lib/athlete/maxesCsv";
import { maxIdentity, repeatedLines } from "../lib/athlete/maxRepeats";
import { matchingPreset } from "../lib/athlete/presets";
import { type Actor, type Db, requireAthleteFor } from "./athleteAccess";
import { type CurrentMax, currentMaxes, type Equipment, getEquipment } from "./athleteProfiles";
import type { Units } from "./database";
import { DomainError } from "./domainError";
import { exerciseNamesFor } from "./exercises";
import { recomputeFutureSessions, todayUtc } from "./recompute";
import { inTransaction } from "./templateAccess";
import { isUuid } from "./templateRules";

/**
 * Changes to an athlete's profile — equipment and maxes — by the athlete or
 * their coach. Each change re-plans the athlete's upcoming unlogged sessions in
 * the same transaction (db/recompute.ts) and says how many it re-planned, so
 * the person who made it can see the effect. Past and logged sessions never change.
 */

export type MaxEntry = CurrentMax & { note: string | null; createdAt: Date; createdBy: string | null };
export type MaxHistory = { exerciseKey: string; exercise: string; entries: MaxEntry[] };
export type MaxesView = { units: Units; current: CurrentMax[]; history: MaxHistory[] };

/** Serialises changes to one athlete, so two saves cannot re-plan from each other's half-written state. */
async function lockAthlete(db: Db, athleteId: string): Promise<void> {
  await sql`select pg_advisory_xact_lock(hashtext('athlete_profile'), hashtext(${athleteId}))`.execute(db);
}

/**
 * A measured date may be tomorrow by the server's UTC clock: an athlete east
 * of Greenwich can already be in tomorrow when they type today's test.
 */
export function maxRules(now = new Date()): MaxRules {
  return { latestDate: addDays(todayUtc(now), 1) };
}

/** Names the athlete's maxes may be filed under: their coach's library, then the built-in catalogue. */
export async function exerciseResolverFor(db: Db, athleteId: string): Promise<ExerciseResolver> {
  return exerciseMatcher(await exerciseNamesFor(db, { id: athleteId, role: "athlete" }));
}

/** Current maxes and, per exercise, every entry newest first (the first entry is the current one). */
export async function maxesView(db: Db, actor: Actor, athleteId: string): Promise<MaxesView> {
  const athlete = await requireAthleteFor(db, actor, athleteId);
  const [equipment, current, rows] = await Promise.all([
    getEquipment(db, athlete.id),
    currentMaxes(db, athlete.id),
    db
      .selectFrom("athlete_maxes as m")
      .leftJoin("users as u", "u.id", "m.created_by")
      .select(["m.id", "m.exercise", "m.exercise_key", "m.kind", "m.value", "m.units", "m.measured_on", "m.source", "m.note", "m.created_at", "u.name as created_by_name"])
      .where("m.athlete_id", "=", athlete.id)
      .orderBy("m.exercise_key")
      .orderBy("m.measured_on", "desc")
      .orderBy("m.created_at", "desc")
      .execute(),
  ]);
  const groups = new Map<string, MaxHistory>();
  for (const r of rows) {
    let g = groups.get(r.exercise_key);
    if (!g) groups.set(r.exercise_key, (g = { exerciseKey: r.exercise_key, exercise: r.exercise, entries: [] }));
    g.entries.push({
      id: r.id,
      exercise: r.exercise,
      exerciseKey: r.exercise_key,
      kind: r.kind,
      value: r.value,
      units: r.units,
      measuredOn: r.measured_on,
      source: r.source,
      note: r.note,
      createdAt: r.created_at,
      createdBy: r.created_by_name,
    });
  }
  const history = [...groups.values()].sort((a, b) => a.exercise.localeCompare(b.exercise));
  return { units: equipment.units, current, history };
}

function invalidMax(errors: Partial<Record<string, string>>): DomainError {
  const fields = Object.fromEntries(MAX_FIELDS.filter((f) => errors[f]).map((f) => [f, errors[f] as string]));
  const [field, message] = Object.entries(fields)[0] ?? ["_", "The max is not valid"];
  return new DomainError("invalid_input", `${field}: ${message}`, fields);
}

function maxRow(athleteId: string, actor: Actor, m: CheckedMax) {
  return {
    athlete_id: athleteId,
    exercise: m.exercise,
    exercise_key: m.exerciseKey,
    kind: m.kind,
    value: m.value,
    units: m.unit,
    measured_on: m.date,
    source: m.source,
    note: m.note,
    created_by: actor.id,
  };
}

/** Adds one max to the athlete's history; it is current when it is the latest measured for its exercise. */
export async function addMax(db: Db, actor: Actor, athleteId: string, draft: MaxDraft): Promise<{ max: CurrentMax; recomputed: number }> {
  return inTransaction(db, async (trx) => {
    const athlete = await requireAthleteFor(trx, actor, athleteId);
    const checked = checkMax(draft, await exerciseResolverFor(trx, athlete.id), maxRules());
    if (!checked.ok) throw invalidMax(checked.errors);
    await lockAthlete(trx, athlete.id);
    const r = await trx.insertInto("athlete_maxes").values(maxRow(athlete.id, actor, checked.max)).returningAll().executeTakeFirstOrThrow();
    const { updated } = await recomputeFutureSessions(trx, athlete.id);
    return {
      max: { id: r.id, exercise: r.exercise, exerciseKey: r.exercise_key, kind: r.kind, value: r.value, units: r.units, measuredOn: r.measured_on, source: r.source },
      recomputed: updated,
    };
  });
}

/** Removes one wrongly entered max; the rest of the history stays, and the previous entry becomes current again. */
export async function deleteMax(db: Db, actor: Actor, athleteId: string, maxId: string): Promise<{ deleted: true; recomputed: number }> {
  return inTransaction(db, async (trx) => {
    const athlete = await requireAthleteFor(trx, actor, athleteId);
    await lockAthlete(trx, athlete.id);
    const gone = isUuid(maxId)
      ? await trx.deleteFrom("athlete_maxes").where("id", "=", maxId).where("athlete_id", "=", athlete.id).returning("id").executeTakeFirst()
      : undefined;
    if (!gone) throw new DomainError("not_found", "That max does not exist or was already deleted.");
    const { updated } = await recomputeFutureSessions(trx, athlete.id);
    return { deleted: true, recomputed: updated };
  });
}

/** Identities (lib/athlete/maxRepeats.ts) of every max the athlete has on file. */
async function storedIdentities(db: Db, athleteId: string): Promise<Set<string>> {
  const rows = await db.selectFrom("athlete_maxes").select(["exercise_key", "measured_on", "kind", "value", "units"]).where("athlete_id", "=", athleteId).execute();
  return new Set(rows.map((r) => maxIdentity({ exerciseKey: r.exercise_key, date: r.measured_on, kind: r.kind, value: r.value, unit: r.units })));
}

/**
 * Checks a CSV file of maxes row by row; writes nothing. `repeats` are the
 * lines already on file (or given twice), which adding will skip.
 */
export async function previewMaxesCsv(db: Db, actor: Actor, athleteId: string, text: string): Promise<CsvResult & { repeats: number[] }> {
  const athlete = await requireAthleteFor(db, actor, athleteId);
  const result = parseMaxesCsv(text, await exerciseResolverFor(db, athlete.id), maxRules());
  return { ...result, repeats: repeatedLines(result.rows, await storedIdentities(db, athlete.id)) };
}

/** Up to this many problems are named in an apply that was refused; the preview lists them all. */
const PROBLEMS_LISTED = 50;

/**
 * Checks the file again and adds every row in one transaction, or none: any
 * problem refuses the whole file with the problems keyed `rows.<line>.<column>`
 * (`file` for the file as a whole). Rows already on file are skipped, so the
 * same file uploaded twice adds nothing the second time.
 */
export async function applyMaxesCsv(db: Db, actor: Actor, athleteId: string, text: string): Promise<{ added: number; skipped: number; recomputed: number }> {
  return inTransaction(db, async (trx) => {
    const athlete = await requireAthleteFor(trx, actor, athleteId);
    const result = parseMaxesCsv(text, await exerciseResolverFor(trx, athlete.id), maxRules());
    if (!result.ok) {
      const fields: Record<string, string> = {};
      for (const p of result.problems.slice(0, PROBLEMS_LISTED)) {
        const key = p.field === "file" ? "file" : `rows.${p.line}.${p.field}`;
        fields[key] ??= p.message;
      }
      const first = result.problems[0];
      const count = result.problems.length;
      throw new DomainError(
        "invalid_input",
        `Nothing was imported: ${count} problem${count === 1 ? "" : "s"} in the file. ${first ? describeCsvProblem(first) : ""}`.trim(),
        fields,
      );
    }
    await lockAthlete(trx, athlete.id);
    const repeats = new Set(repeatedLines(result.rows, await storedIdentities(trx, athlete.id)));
    const rows = result.rows.filter((r) => !repeats.has(r.line)).map((r) => maxRow(athlete.id, actor, r.max as CheckedMax));
    if (rows.length === 0) return { added: 0, skipped: repeats.size, recomputed: 0 };
    await trx.insertInto("athlete_maxes").values(rows).execute();
    const { updated } = await recomputeFutureSessions(trx, athlete.id);
    return { added: rows.length, skipped: repeats.size, recomputed: updated };
  });
}

/**
 * Stores the athlete's equipment (lib/athlete/equipment.ts rules) and
 * re-plans upcoming sessions. The preset is recorded only while the values
 * are exactly a preset's. Stored maxes are left alone on a change of unit:
 * each keeps its own unit and is converted when loads are worked out.
 */
export async function saveEquipment(db: Db, actor: Actor, athleteId: string, input: unknown): Promise<{ equipment: Equipment; recomputed: number }> {
  return inTransaction(db, async (trx) => {
    const athlete = await requireAthleteFor(trx, actor, athleteId);
    const parsed = parseEquipment(input);
    if (!parsed.ok) {
      const [field, message] = Object.entries(parsed.fields)[0];
      throw new DomainError("invalid_input", `${field === "_" ? "equipment" : field}: ${message}`, parsed.fields);
    }
    const e = parsed.equipment;
    const row = {
      units: e.units,
      bodyweight: e.bodyweight,
      bar: e.bar,
      plates: JSON.stringify(e.plates),
      dumbbell_step: e.dumbbellStep,
      machine_step: e.machineStep,
      preset: matchingPreset(e),
      updated_by: actor.id,
      updated_at: new Date(),
    };
    await lockAthlete(trx, athlete.id);
    await trx
      .insertInto("athlete_profiles")
      .values({ user_id: athlete.id, ...row })
      .onConflict((oc) => oc.column("user_id").doUpdateSet(row))
      .execute();
    const { updated } = await recomputeFutureSessions(trx, athlete.id);
    return { equipment: await getEquipment(trx, athlete.id), recomputed: updated };
  });
}
