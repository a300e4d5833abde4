import "server-only";
import { sql } from "kysely";
import { z } from "zod";
import { exerciseKey, normaliseExerciseName } from "../lib/exercises/resolve";
import type { ExerciseOut, SetOut, Session as SessionPlan, SubstituteOut } from "../lib/load/types";
import { LOAD_MODELS, type LoadModel } from "../lib/notation/model";
import { LOG_LIMITS } from "../lib/progress/types";
import { type Actor, type Db, findAthleteFor } from "./athleteAccess";
import type { Units } from "./database";
import { DomainError } from "./domainError";
import { refreshProposals } from "./maxProposals";
import { inTransaction } from "./templateAccess";
import { isUuid } from "./templateRules";

/**
 * The athlete's log of one dated session: sets saved one at a time as they
 * are ticked (idempotent per slot, newest change wins), the exercise done in
 * each slot with its note, and finishing the session. Only the athlete writes
 * their own log; their coach reads it; anyone else is told it does not exist.
 */

export const setLogSchema = z.object({
  exerciseIndex: z.number({ error: "Give the exercise's position as a number" }).int("A whole number").min(0, "At least 0").max(199, "At most 199"),
  setIndex: z.number({ error: "Give the set's position as a number" }).int("A whole number").min(0, "At least 0").max(199, "At most 199"),
  /** The exercise done; the slot's current choice when left out. */
  exercise: z.string().trim().min(1, "Name the exercise").max(200, "At most 200 characters").optional(),
  reps: z.number({ error: "Give the reps as a number" }).int("Reps are whole numbers").min(0, "Reps are at least 0").max(LOG_LIMITS.repsMax, `Reps are at most ${LOG_LIMITS.repsMax}`),
  load: z.number({ error: "Give the load as a number" }).min(0, "The load is at least 0").max(LOG_LIMITS.loadMax, `The load is at most ${LOG_LIMITS.loadMax}`),
  rir: z.number({ error: "Give reps in reserve as a number" }).int("Reps in reserve are whole numbers").min(0, "Reps in reserve are at least 0").max(LOG_LIMITS.rirMax, `Reps in reserve are at most ${LOG_LIMITS.rirMax}`).nullable(),
  done: z.boolean({ error: "done is true or false" }),
  clientId: z.string().max(100, "At most 100 characters").nullable().optional(),
  /** When the athlete made the change (ISO 8601); a replay of an older change never wins. */
  clientTime: z.iso.datetime({ offset: true, error: "Give clientTime as an ISO 8601 date and time" }).optional(),
});
export type SetLogInput = z.input<typeof setLogSchema>;

export const exerciseLogSchema = z
  .object({
    exerciseIndex: setLogSchema.shape.exerciseIndex,
    exercise: z.string().trim().min(1, "Name the exercise").max(200, "At most 200 characters").optional(),
    note: z.string().max(1000, "Notes are at most 1000 characters").nullable().optional(),
  })
  .refine((b) => b.exercise !== undefined || b.note !== undefined, "Send exercise, note or both");
export type ExerciseLogInput = z.input<typeof exerciseLogSchema>;

export type SetLog = {
  exerciseIndex: number;
  setIndex: number;
  kind: "warmup" | "work";
  exercise: string;
  exerciseKey: string;
  plannedExercise: string;
  plannedReps: number | null;
  plannedLoad: number | null;
  reps: number;
  load: number;
  unit: Units;
  rir: number | null;
  done: boolean;
  clientTime: string;
};

export type ExerciseLog = { exerciseIndex: number; exercise: string; note: string | null };

export type LogSheet = {
  session: {
    id: string;
    athleteId: string;
    athleteName: string;
    date: string;
    title: string;
    units: Units;
    model: LoadModel;
    plan: SessionPlan;
    loggedAt: string | null;
    completedAt: string | null;
  };
  sets: SetLog[];
  exercises: ExerciseLog[];
  /** Only the athlete writes; their coach reads. */
  canWrite: boolean;
};

export function sessionNotFound(): DomainError {
  return new DomainError("not_found", "That session does not exist or is not yours to see.");
}

type SessionRow = { id: string; athlete_id: string; date: string; title: string; plan: SessionPlan; logged_at: Date | null; completed_at: Date | null; model: string | null };

async function loadSession(db: Db, sessionId: string, lock: boolean): Promise<SessionRow | undefined> {
  let q = db
    .selectFrom("training_sessions as s")
    .innerJoin("template_assignments as a", "a.id", "s.assignment_id")
    .innerJoin("template_versions as v", "v.id", "a.version_id")
    .select(["s.id", "s.athlete_id", "s.date", "s.title", "s.plan", "s.logged_at", "s.completed_at", sql<string | null>`v.model->>'model'`.as("model")])
    .where("s.id", "=", sessionId);
  if (lock) q = q.forUpdate("s");
  return q.executeTakeFirst();
}

export function modelOf(value: string | null): LoadModel {
  return (LOAD_MODELS as readonly string[]).includes(value ?? "") ? (value as LoadModel) : "brzycki";
}

/** The session when the actor may read it (the athlete or their coach); not_found otherwise. */
async function readable(db: Db, actor: Actor, sessionId: string, lock = false) {
  if (!isUuid(sessionId)) throw sessionNotFound();
  const row = await loadSession(db, sessionId, lock);
  if (!row) throw sessionNotFound();
  const athlete = await findAthleteFor(db, actor, row.athlete_id);
  if (!athlete) throw sessionNotFound();
  return { row, athlete };
}

/** The session when the actor is its athlete; the coach who may read it is told only the athlete logs. */
async function writable(db: Db, actor: Actor, sessionId: string) {
  const found = await readable(db, actor, sessionId, true);
  if (actor.role !== "athlete" || actor.id !== found.row.athlete_id) {
    throw new DomainError("forbidden", "Only the athlete logs their own sets; you can read this log.");
  }
  return found;
}

function toSetLog(r: {
  exercise_index: number; set_index: number; kind: "warmup" | "work"; exercise: string; exercise_key: string; planned_exercise: string;
  planned_reps: number | null; planned_load: number | null; reps: number; load: number; unit: Units; rir: number | null; done: boolean; client_updated_at: Date;
}): SetLog {
  return {
    exerciseIndex: r.exercise_index,
    setIndex: r.set_index,
    kind: r.kind,
    exercise: r.exercise,
    exerciseKey: r.exercise_key,
    plannedExercise: r.planned_exercise,
    plannedReps: r.planned_reps,
    plannedLoad: r.planned_load,
    reps: r.reps,
    load: r.load,
    unit: r.unit,
    rir: r.rir,
    done: r.done,
    clientTime: r.client_updated_at.toISOString(),
  };
}

const SET_COLUMNS = [
  "exercise_index", "set_index", "kind", "exercise", "exercise_key", "planned_exercise", "planned_reps", "planned_load", "reps", "load", "unit", "rir", "done", "client_updated_at",
] as const;

/**
 * The session with its plan, every logged set and each slot's chosen exercise and note.
 *
 * @example
 * const sheet = await getLogSheet(db, viewer, sessionId);
 * sheet.sets.filter((s) => s.done).length; // sets ticked so far
 */
export async function getLogSheet(db: Db, actor: Actor, sessionId: string): Promise<LogSheet> {
  const { row, athlete } = await readable(db, actor, sessionId);
  const [sets, exercises] = await Promise.all([
    db.selectFrom("set_logs").select(SET_COLUMNS).where("session_id", "=", sessionId).orderBy("exercise_index").orderBy("set_index").execute(),
    db.selectFrom("session_exercise_logs").select(["exercise_index", "exercise", "note"]).where("session_id", "=", sessionId).orderBy("exercise_index").execute(),
  ]);
  return {
    session: {
      id: row.id,
      athleteId: row.athlete_id,
      athleteName: athlete.name,
      date: row.date,
      title: row.title,
      units: row.plan.units,
      model: modelOf(row.model),
      plan: row.plan,
      loggedAt: row.logged_at?.toISOString() ?? null,
      completedAt: row.completed_at?.toISOString() ?? null,
    },
    sets: sets.map(toSetLog),
    exercises: exercises.map((e) => ({ exerciseIndex: e.exercise_index, exercise: e.exercise, note: e.note })),
    canWrite: actor.role === "athlete" && actor.id === row.athlete_id,
  };
}

function invalid(field: string, message: string): DomainError {
  return new DomainError("invalid_input", `${field}: ${message}`, { [field]: message });
}

/** The input as the schema reads it, or invalid_input naming the first field at fault. */
function checked<S extends z.ZodType>(schema: S, input: unknown): z.output<S> {
  const parsed = schema.safeParse(input);
  if (parsed.success) return parsed.data;
  const issue = parsed.error.issues[0];
  throw invalid(issue.path.join(".") || "_", issue.message);
}

function slotOf(plan: SessionPlan, index: number): ExerciseOut {
  const ex = plan.exercises[index];
  if (!ex) throw invalid("exerciseIndex", `This session has ${plan.exercises.length} exercises; pick one of them`);
  return ex;
}

/** The planned exercise or the substitute named; anything else is not on the plan. */
export function variantOf(ex: ExerciseOut, name: string): SubstituteOut {
  const n = normaliseExerciseName(name);
  if (normaliseExerciseName(ex.name) === n) return ex;
  const sub = ex.substitutes.find((s) => normaliseExerciseName(s.name) === n);
  if (!sub) {
    const choices = [ex.name, ...ex.substitutes.map((s) => s.name)].join(", ");
    throw invalid("exercise", `Pick ${ex.substitutes.length ? `one of: ${choices}` : ex.name}`);
  }
  return sub;
}

async function chosenName(db: Db, sessionId: string, index: number): Promise<string | null> {
  const row = await db.selectFrom("session_exercise_logs").select("exercise").where("session_id", "=", sessionId).where("exercise_index", "=", index).executeTakeFirst();
  return row?.exercise ?? null;
}

async function markLogged(db: Db, sessionId: string, row: SessionRow): Promise<void> {
  if (row.logged_at === null) await db.updateTable("training_sessions").set({ logged_at: new Date() }).where("id", "=", sessionId).where("logged_at", "is", null).execute();
}

/** Ends the swap: other exercises' unticked rows in the slot go, ticked ones block it. */
async function switchSlot(db: Db, sessionId: string, index: number, variant: SubstituteOut): Promise<void> {
  const others = await db
    .selectFrom("set_logs")
    .select(["exercise", "done"])
    .where("session_id", "=", sessionId)
    .where("exercise_index", "=", index)
    .where("exercise_key", "!=", exerciseKey(variant.name))
    .execute();
  const ticked = others.filter((o) => o.done);
  if (ticked.length > 0) {
    const message = `${ticked.length} set${ticked.length === 1 ? " is" : "s are"} already logged as ${ticked[0].exercise}; untick ${ticked.length === 1 ? "it" : "them"} before swapping`;
    throw new DomainError("conflict", `exercise: ${message}`, { exercise: message });
  }
  if (others.length > 0) {
    await db
      .deleteFrom("set_logs")
      .where("session_id", "=", sessionId)
      .where("exercise_index", "=", index)
      .where("exercise_key", "!=", exerciseKey(variant.name))
      .where("done", "=", false)
      .execute();
  }
}

async function saveChoice(db: Db, sessionId: string, athleteId: string, index: number, exercise: string, note: string | null | undefined): Promise<void> {
  const values = { session_id: sessionId, exercise_index: index, athlete_id: athleteId, exercise, exercise_key: exerciseKey(exercise), note: note ?? null };
  await db
    .insertInto("session_exercise_logs")
    .values(values)
    .onConflict((oc) =>
      oc.columns(["session_id", "exercise_index"]).doUpdateSet({ exercise, exercise_key: values.exercise_key, updated_at: new Date(), ...(note !== undefined ? { note } : {}) }),
    )
    .execute();
}

export type SaveSetResult = { set: SetLog; stale: boolean };

/**
 * Saves one set. The same set sent twice is one row; a change made earlier
 * than the one stored (a late replay from the offline queue) leaves the
 * stored one and answers it with `stale: true`.
 *
 * @example
 * await saveSet(db, athlete, sessionId, { exerciseIndex: 0, setIndex: 3, reps: 5, load: 100, rir: 2, done: true });
 */
export async function saveSet(db: Db, actor: Actor, sessionId: string, input: SetLogInput): Promise<SaveSetResult> {
  const v = checked(setLogSchema, input);
  return inTransaction(db, async (trx) => {
    const { row } = await writable(trx, actor, sessionId);
    const ex = slotOf(row.plan, v.exerciseIndex);
    const name = v.exercise ?? (await chosenName(trx, sessionId, v.exerciseIndex)) ?? ex.name;
    const variant = variantOf(ex, name);
    const planned: SetOut | undefined = variant.sets[v.setIndex];
    if (!planned) throw invalid("setIndex", `${variant.name} has ${variant.sets.length} sets here; pick one of them`);
    if (v.exercise !== undefined) {
      await switchSlot(trx, sessionId, v.exerciseIndex, variant);
      await saveChoice(trx, sessionId, row.athlete_id, v.exerciseIndex, variant.name, undefined);
    }
    const clientTime = v.clientTime ? new Date(v.clientTime) : new Date();
    const values = {
      session_id: sessionId,
      athlete_id: row.athlete_id,
      exercise_index: v.exerciseIndex,
      set_index: v.setIndex,
      kind: planned.kind,
      exercise: variant.name,
      exercise_key: exerciseKey(variant.name),
      planned_exercise: ex.name,
      planned_reps: planned.repsMin,
      planned_load: planned.load,
      planned_seconds: planned.seconds,
      bodyweight: planned.bodyweight,
      reps: v.reps,
      load: v.load,
      unit: row.plan.units,
      rir: v.rir,
      done: v.done,
      client_id: v.clientId ?? null,
      client_updated_at: clientTime,
    };
    const saved = await trx
      .insertInto("set_logs")
      .values(values)
      .onConflict((oc) =>
        oc
          .constraint("set_logs_slot")
          .doUpdateSet((eb) => ({
            kind: eb.ref("excluded.kind"),
            exercise: eb.ref("excluded.exercise"),
            exercise_key: eb.ref("excluded.exercise_key"),
            planned_exercise: eb.ref("excluded.planned_exercise"),
            planned_reps: eb.ref("excluded.planned_reps"),
            planned_load: eb.ref("excluded.planned_load"),
            planned_seconds: eb.ref("excluded.planned_seconds"),
            bodyweight: eb.ref("excluded.bodyweight"),
            reps: eb.ref("excluded.reps"),
            load: eb.ref("excluded.load"),
            unit: eb.ref("excluded.unit"),
            rir: eb.ref("excluded.rir"),
            done: eb.ref("excluded.done"),
            client_id: eb.ref("excluded.client_id"),
            client_updated_at: eb.ref("excluded.client_updated_at"),
            updated_at: new Date(),
          }))
          .where("set_logs.client_updated_at", "<=", clientTime),
      )
      .returning(SET_COLUMNS)
      .executeTakeFirst();
    await markLogged(trx, sessionId, row);
    if (saved) return { set: toSetLog(saved), stale: false };
    const kept = await trx
      .selectFrom("set_logs")
      .select(SET_COLUMNS)
      .where("session_id", "=", sessionId)
      .where("exercise_index", "=", v.exerciseIndex)
      .where("set_index", "=", v.setIndex)
      .executeTakeFirstOrThrow();
    return { set: toSetLog(kept), stale: true };
  });
}

/**
 * Swaps a slot to a listed substitute (or back) and/or saves its note.
 *
 * @example
 * await saveExerciseLog(db, athlete, sessionId, { exerciseIndex: 3, exercise: "machine row", note: "cable station busy" });
 */
export async function saveExerciseLog(db: Db, actor: Actor, sessionId: string, input: ExerciseLogInput): Promise<ExerciseLog> {
  const v = checked(exerciseLogSchema, input);
  return inTransaction(db, async (trx) => {
    const { row } = await writable(trx, actor, sessionId);
    const ex = slotOf(row.plan, v.exerciseIndex);
    const current = (await chosenName(trx, sessionId, v.exerciseIndex)) ?? ex.name;
    const variant = variantOf(ex, v.exercise ?? current);
    if (v.exercise !== undefined) await switchSlot(trx, sessionId, v.exerciseIndex, variant);
    const note = v.note === undefined ? undefined : v.note?.trim() ? v.note.trim() : null;
    await saveChoice(trx, sessionId, row.athlete_id, v.exerciseIndex, variant.name, note);
    const saved = await trx
      .selectFrom("session_exercise_logs")
      .select(["exercise_index", "exercise", "note"])
      .where("session_id", "=", sessionId)
      .where("exercise_index", "=", v.exerciseIndex)
      .executeTakeFirstOrThrow();
    return { exerciseIndex: saved.exercise_index, exercise: saved.exercise, note: saved.note };
  });
}

/**
 * Marks the session finished (the first time only) and looks for max changes
 * to propose from the logs. Nothing logged is refused: there is nothing to finish.
 *
 * @example
 * await finishSession(db, athlete, sessionId); // { completedAt, proposals: 1 }
 */
export async function finishSession(db: Db, actor: Actor, sessionId: string): Promise<{ completedAt: string; proposals: number }> {
  return inTransaction(db, async (trx) => {
    const { row } = await writable(trx, actor, sessionId);
    const done = await trx.selectFrom("set_logs").select((eb) => eb.fn.countAll<string>().as("n")).where("session_id", "=", sessionId).where("done", "=", true).executeTakeFirstOrThrow();
    if (Number(done.n) === 0) throw invalid("sets", "Tick at least one set before finishing the session");
    const now = new Date();
    const completedAt = row.completed_at ?? now;
    await trx.updateTable("training_sessions").set({ completed_at: completedAt, logged_at: row.logged_at ?? now }).where("id", "=", sessionId).execute();
    const { open } = await refreshProposals(trx, row.athlete_id);
    return { completedAt: completedAt.toISOString(), proposals: open };
  });
}
