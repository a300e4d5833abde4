import "server-only";
import { randomBytes } from "node:crypto";
import { sql } from "kysely";
import { CATALOGUE } from "../lib/exercises/catalogue";
import { normaliseExerciseName } from "../lib/exercises/resolve";
import type { ExerciseMediaType } from "./database";
import {
  aliasesSchema,
  checkField,
  checkMedia,
  cuesSchema,
  type Equipment,
  equipmentSchema,
  ExerciseError,
  groupSchema,
  type LibrarySort,
  MEDIA_EXTENSIONS,
  MEDIA_KEY,
  type MediaStore,
  musclesSchema,
  nameSchema,
  patternSchema,
} from "./exerciseRules";
import { type Actor, type Db, inTransaction } from "./templateAccess";
import { isUuid } from "./templateRules";

export type { Actor } from "./templateAccess";

export type LibraryEntry = {
  /** A uuid for the coach's own; `builtin:<catalogue id>` for the catalogue. */
  id: string;
  builtIn: boolean;
  name: string;
  aliases: string[];
  equipment: Equipment;
  primaryMuscles: string[];
  movementPattern: string | null;
  cues: string;
  substitutionGroup: string | null;
  media: { url: string; type: ExerciseMediaType } | null;
  updatedAt: Date | null;
};

export type LibraryPage = { items: LibraryEntry[]; total: number; page: number; pageSize: number };
export type LibraryOptions = { q?: string; sort?: LibrarySort; dir?: "asc" | "desc"; page?: number; pageSize?: number };

/** Someone else's exercise answers exactly like a missing one, so ids cannot be probed. */
export function exerciseNotFound(): ExerciseError {
  return new ExerciseError("not_found", "That exercise does not exist or is not yours.");
}

export function mediaUrl(key: string): string {
  return `/api/media/${key}`;
}

const BUILT_IN: LibraryEntry[] = CATALOGUE.map((e) => ({
  id: `builtin:${e.id}`,
  builtIn: true,
  name: e.name,
  aliases: [...e.aliases],
  equipment: e.equipment,
  primaryMuscles: [],
  movementPattern: null,
  cues: "",
  substitutionGroup: null,
  media: null,
  updatedAt: null,
}));

function ownQuery(db: Db, ownerId: string) {
  return db
    .selectFrom("coach_exercises")
    .select([
      "id",
      "name",
      "aliases",
      "equipment",
      "primary_muscles",
      "movement_pattern",
      "cues",
      "substitution_group",
      "media_key",
      "media_type",
      "updated_at",
    ])
    .where("owner_id", "=", ownerId);
}

type Row = Awaited<ReturnType<ReturnType<typeof ownQuery>["executeTakeFirstOrThrow"]>>;

function toEntry(r: Row): LibraryEntry {
  return {
    id: r.id,
    builtIn: false,
    name: r.name,
    aliases: r.aliases,
    equipment: r.equipment,
    primaryMuscles: r.primary_muscles,
    movementPattern: r.movement_pattern,
    cues: r.cues,
    substitutionGroup: r.substitution_group,
    media: r.media_key && r.media_type ? { url: mediaUrl(r.media_key), type: r.media_type } : null,
    updatedAt: r.updated_at,
  };
}

function isCoach(actor: Actor): boolean {
  return actor.role === "coach";
}

const collator = new Intl.Collator("en", { sensitivity: "base", numeric: true });

function sortKey(e: LibraryEntry, sort: LibrarySort): string | null {
  if (sort === "equipment") return e.equipment;
  if (sort === "pattern") return e.movementPattern;
  return e.name;
}

/**
 * The built-in catalogue and the coach's own exercises in one list. `q`
 * matches name, alias or muscle (case, hyphens and apostrophes ignored);
 * sorting by equipment or pattern falls back to the name, and rows without a
 * pattern come last either way. A library is a few hundred rows at most, so
 * it is merged in memory rather than in SQL.
 */
export async function listLibrary(db: Db, actor: Actor, options: LibraryOptions = {}): Promise<LibraryPage> {
  const page = Math.max(1, Math.floor(options.page ?? 1));
  const pageSize = Math.min(100, Math.max(1, Math.floor(options.pageSize ?? 25)));
  if (!isCoach(actor)) return { items: [], total: 0, page, pageSize };
  const own = (await ownQuery(db, actor.id).execute()).map(toEntry);
  let all = [...own, ...BUILT_IN];
  const q = normaliseExerciseName(options.q ?? "");
  if (q) {
    all = all.filter((e) => [e.name, ...e.aliases, ...e.primaryMuscles].some((text) => normaliseExerciseName(text).includes(q)));
  }
  const sort = options.sort ?? "name";
  const sign = options.dir === "desc" ? -1 : 1;
  all.sort((a, b) => {
    const ka = sortKey(a, sort);
    const kb = sortKey(b, sort);
    if (ka === null || kb === null) {
      if (ka !== kb) return ka === null ? 1 : -1;
    } else {
      const c = collator.compare(ka, kb);
      if (c !== 0) return c * sign;
    }
    return collator.compare(a.name, b.name) || (a.builtIn === b.builtIn ? 0 : a.builtIn ? 1 : -1);
  });
  return { items: all.slice((page - 1) * pageSize, page * pageSize), total: all.length, page, pageSize };
}

/** One of the coach's own exercises; null when it is not theirs (built-in ids are not editable rows). */
export async function getExercise(db: Db, actor: Actor, id: string): Promise<LibraryEntry | null> {
  if (!isCoach(actor) || !isUuid(id)) return null;
  const row = await ownQuery(db, actor.id).where("id", "=", id).executeTakeFirst();
  return row ? toEntry(row) : null;
}

export type ExerciseInput = {
  name?: unknown;
  aliases?: unknown;
  equipment?: unknown;
  primaryMuscles?: unknown;
  movementPattern?: unknown;
  cues?: unknown;
  substitutionGroup?: unknown;
};

type Clean = {
  name?: string;
  aliases?: string[];
  equipment?: Equipment;
  primary_muscles?: string[];
  movement_pattern?: string | null;
  cues?: string;
  substitution_group?: string | null;
};

function clean(input: ExerciseInput, creating: boolean): Clean {
  const out: Clean = {};
  if (creating || input.name !== undefined) out.name = checkField(nameSchema, input.name, "name");
  if (creating || input.equipment !== undefined) out.equipment = checkField(equipmentSchema, input.equipment, "equipment");
  if (input.aliases !== undefined || creating) out.aliases = checkField(aliasesSchema, input.aliases ?? [], "aliases");
  if (input.primaryMuscles !== undefined || creating) out.primary_muscles = checkField(musclesSchema, input.primaryMuscles ?? [], "primaryMuscles");
  if (input.movementPattern !== undefined || creating) out.movement_pattern = checkField(patternSchema, input.movementPattern ?? null, "movementPattern");
  if (input.cues !== undefined || creating) out.cues = checkField(cuesSchema, input.cues ?? "", "cues");
  if (input.substitutionGroup !== undefined || creating) out.substitution_group = checkField(groupSchema, input.substitutionGroup ?? null, "substitutionGroup");
  return out;
}

const BUILT_IN_NAMES = new Map<string, string>();
for (const e of CATALOGUE) for (const n of [e.name, ...e.aliases]) if (!BUILT_IN_NAMES.has(normaliseExerciseName(n))) BUILT_IN_NAMES.set(normaliseExerciseName(n), e.name);

/**
 * Refuses a name or alias that another of the coach's exercises (or the
 * built-in catalogue) already answers to, naming the clash. Built-in names
 * are refused too: the editor resolves a written name to exactly one
 * exercise, and a built-in's equipment decides how its loads are rounded.
 * The caller holds the coach's library lock. Returns the aliases to store.
 */
async function settleNames(db: Db, ownerId: string, exceptId: string | null, name: string, given: string[]): Promise<string[]> {
  const fields: Record<string, string> = {};
  // An alias spelling the exercise's own name adds nothing; it is dropped, not refused.
  const selfName = normaliseExerciseName(name);
  const aliases = given.filter((a) => normaliseExerciseName(a) !== selfName);
  let others = ownQuery(db, ownerId);
  if (exceptId) others = others.where("id", "<>", exceptId);
  const taken = new Map<string, { exercise: string; asAlias: boolean }>();
  for (const r of await others.execute()) {
    taken.set(normaliseExerciseName(r.name), { exercise: r.name, asAlias: false });
    for (const a of r.aliases) taken.set(normaliseExerciseName(a), { exercise: r.name, asAlias: true });
  }
  const clash = (text: string): string | null => {
    const key = normaliseExerciseName(text);
    const own = taken.get(key);
    if (own) return own.asAlias ? `“${text}” is already an alias of your exercise “${own.exercise}”` : `You already have an exercise called “${own.exercise}”`;
    const builtIn = BUILT_IN_NAMES.get(key);
    if (builtIn) return builtIn === text.toLowerCase() ? `“${text}” is a built-in exercise` : `“${text}” already means the built-in exercise “${builtIn}”`;
    return null;
  };
  const nameClash = clash(name);
  if (nameClash) fields.name = nameClash;
  aliases.forEach((a, i) => {
    const c = clash(a);
    if (c) fields[`aliases.${i}`] ??= c;
  });
  const first = Object.values(fields)[0];
  if (first) throw new ExerciseError("conflict", first, fields);
  return aliases;
}

/** Serialises library writes of one coach so two saves cannot both take the same alias. */
async function lockLibrary(db: Db, ownerId: string): Promise<void> {
  await sql`select pg_advisory_xact_lock(hashtext('coach_exercises'), hashtext(${ownerId}))`.execute(db);
}

function isUniqueViolation(err: unknown): boolean {
  return typeof err === "object" && err !== null && (err as { code?: string }).code === "23505";
}

export async function createExercise(db: Db, actor: Actor, input: ExerciseInput): Promise<LibraryEntry> {
  if (!isCoach(actor)) throw exerciseNotFound();
  const values = clean(input, true) as Required<Clean>;
  return inTransaction(db, async (trx) => {
    await lockLibrary(trx, actor.id);
    values.aliases = await settleNames(trx, actor.id, null, values.name, values.aliases);
    try {
      const row = await trx
        .insertInto("coach_exercises")
        .values({ owner_id: actor.id, ...values, media_key: null, media_type: null })
        .returningAll()
        .executeTakeFirstOrThrow();
      return toEntry(row);
    } catch (err) {
      if (isUniqueViolation(err)) throw new ExerciseError("conflict", `You already have an exercise called “${values.name}”`, { name: "That name is taken" });
      throw err;
    }
  });
}

/** Changes any of the fields given; the rest stay as they are. */
export async function updateExercise(db: Db, actor: Actor, id: string, patch: ExerciseInput): Promise<LibraryEntry> {
  if (!isCoach(actor) || !isUuid(id)) throw exerciseNotFound();
  const set = clean(patch, false);
  return inTransaction(db, async (trx) => {
    await lockLibrary(trx, actor.id);
    const current = await ownQuery(trx, actor.id).where("id", "=", id).executeTakeFirst();
    if (!current) throw exerciseNotFound();
    if (set.name !== undefined || set.aliases !== undefined) {
      set.aliases = await settleNames(trx, actor.id, id, set.name ?? current.name, set.aliases ?? current.aliases);
    }
    const row = await trx
      .updateTable("coach_exercises")
      .set({ ...set, updated_at: new Date() })
      .where("id", "=", id)
      .where("owner_id", "=", actor.id)
      .returningAll()
      .executeTakeFirstOrThrow();
    return toEntry(row);
  });
}

/** Deletes the exercise and then its media file (a file left behind by a failed removal is only wasted space). */
export async function deleteExercise(db: Db, store: MediaStore, actor: Actor, id: string): Promise<{ deleted: true }> {
  if (!isCoach(actor) || !isUuid(id)) throw exerciseNotFound();
  const gone = await db.deleteFrom("coach_exercises").where("id", "=", id).where("owner_id", "=", actor.id).returning("media_key").executeTakeFirst();
  if (!gone) throw exerciseNotFound();
  if (gone.media_key) await store.remove(gone.media_key);
  return { deleted: true };
}

/**
 * Stores a picture or clip for the exercise, replacing (and removing) any
 * earlier one. The bytes decide the type; see checkMedia.
 */
export async function setExerciseMedia(
  db: Db,
  store: MediaStore,
  actor: Actor,
  id: string,
  file: { bytes: Uint8Array; declaredType: string },
): Promise<LibraryEntry> {
  if (!isCoach(actor) || !isUuid(id)) throw exerciseNotFound();
  if (!(await getExercise(db, actor, id))) throw exerciseNotFound();
  const type = checkMedia(file.bytes, file.declaredType);
  const key = `ex-${id.toLowerCase()}-${randomBytes(8).toString("hex")}.${MEDIA_EXTENSIONS[type]}`;
  await store.put(key, file.bytes, type);
  let previous: string | null = null;
  let entry: LibraryEntry;
  try {
    entry = await inTransaction(db, async (trx) => {
      const current = await trx.selectFrom("coach_exercises").select("media_key").where("id", "=", id).where("owner_id", "=", actor.id).forUpdate().executeTakeFirst();
      if (!current) throw exerciseNotFound();
      previous = current.media_key;
      const row = await trx
        .updateTable("coach_exercises")
        .set({ media_key: key, media_type: type, updated_at: new Date() })
        .where("id", "=", id)
        .returningAll()
        .executeTakeFirstOrThrow();
      return toEntry(row);
    });
  } catch (err) {
    await store.remove(key);
    throw err;
  }
  if (previous) await store.remove(previous);
  return entry;
}

export async function removeExerciseMedia(db: Db, store: MediaStore, actor: Actor, id: string): Promise<LibraryEntry> {
  if (!isCoach(actor) || !isUuid(id)) throw exerciseNotFound();
  const { previous, entry } = await inTransaction(db, async (trx) => {
    const current = await trx.selectFrom("coach_exercises").select("media_key").where("id", "=", id).where("owner_id", "=", actor.id).forUpdate().executeTakeFirst();
    if (!current) throw exerciseNotFound();
    const row = await trx
      .updateTable("coach_exercises")
      .set({ media_key: null, media_type: null, updated_at: new Date() })
      .where("id", "=", id)
      .returningAll()
      .executeTakeFirstOrThrow();
    return { previous: current.media_key, entry: toEntry(row) };
  });
  if (previous) await store.remove(previous);
  return entry;
}

/** The coach whose library an actor reads: a coach's own, an athlete's coach's, else none. */
async function libraryOwnerFor(db: Db, actor: Actor): Promise<string | null> {
  if (actor.role === "coach") return actor.id;
  if (actor.role !== "athlete") return null;
  const me = await db.selectFrom("users").select("coach_id").where("id", "=", actor.id).executeTakeFirst();
  return me?.coach_id ?? null;
}

/**
 * A stored media file's type when the actor may see it: the owning coach and
 * that coach's athletes. Null otherwise, exactly as for a missing key.
 */
export async function mediaForViewer(db: Db, actor: Actor, key: string): Promise<{ type: ExerciseMediaType } | null> {
  if (!MEDIA_KEY.test(key)) return null;
  const owner = await libraryOwnerFor(db, actor);
  if (!owner) return null;
  const row = await db.selectFrom("coach_exercises").select("media_type").where("media_key", "=", key).where("owner_id", "=", owner).executeTakeFirst();
  return row?.media_type ? { type: row.media_type } : null;
}

export type ExerciseName = { name: string; exercise: string; builtIn: boolean; equipment: Equipment };

/**
 * The coach's own names only (as lib/load's `library` option takes them), for
 * the athlete's coach or the coach themself.
 *
 * @example
 * expandProgramme(programme, profile, { start, library: await libraryNamesFor(db, athlete) });
 */
export async function libraryNamesFor(db: Db, actor: Actor): Promise<{ name: string; exercise: string; equipment: Equipment }[]> {
  return (await exerciseNamesFor(db, actor)).filter((n) => !n.builtIn).map(({ name, exercise, equipment }) => ({ name, exercise, equipment }));
}

/**
 * Every name and alias the editor should know, each with the exercise it
 * means: the built-in catalogue plus the library of the coach in charge (the
 * coach's own; an athlete's coach's). Own entries come first.
 */
export async function exerciseNamesFor(db: Db, actor: Actor): Promise<ExerciseName[]> {
  const owner = await libraryOwnerFor(db, actor);
  const out: ExerciseName[] = [];
  if (owner) {
    const rows = await db.selectFrom("coach_exercises").select(["name", "aliases", "equipment"]).where("owner_id", "=", owner).orderBy("name").execute();
    for (const r of rows) for (const n of [r.name, ...r.aliases]) out.push({ name: n, exercise: r.name, builtIn: false, equipment: r.equipment });
  }
  for (const e of CATALOGUE) for (const n of [e.name, ...e.aliases]) out.push({ name: n, exercise: e.name, builtIn: true, equipment: e.equipment });
  return out;
}
