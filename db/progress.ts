import "server-only";
import { sql } from "kysely";
import { markPersonalBests, sessionBests, setE1rm, stalledExercises, weeklyVolume, type LoggedSet, type Stall, type WeekVolume } from "../lib/progress";
import { convertMass } from "../lib/load/units";
import { type Actor, type Db, requireAthleteFor } from "./athleteAccess";
import { getEquipment } from "./athleteProfiles";
import type { Units } from "./database";
import { getLogSheet, modelOf } from "./logs";
import { todayUtc } from "./recompute";

/**
 * What the logs add up to: estimated 1RM per exercise over time with personal
 * bests, weekly volume, the sessions logged, and one session's summary. The
 * rules are in lib/progress; this module loads rows and checks access.
 */

export type LoggedSetRow = LoggedSet & { exerciseIndex: number; setIndex: number; plannedExercise: string; loggedAt: Date; deload: boolean };

/**
 * Every logged set of the athlete (done or not), oldest session first. Access is the caller's business.
 *
 * @example
 * const sets = await loadLoggedSets(db, athleteId, { since: "2027-01-01" });
 */
export async function loadLoggedSets(db: Db, athleteId: string, options: { since?: string; sessionIds?: string[]; assignmentIds?: string[] } = {}): Promise<LoggedSetRow[]> {
  let q = db
    .selectFrom("set_logs as l")
    .innerJoin("training_sessions as s", "s.id", "l.session_id")
    .innerJoin("template_assignments as a", "a.id", "s.assignment_id")
    .innerJoin("template_versions as v", "v.id", "a.version_id")
    .select([
      "l.session_id", "l.exercise_index", "l.set_index", "l.kind", "l.exercise", "l.exercise_key", "l.done", "l.reps", "l.load", "l.rir", "l.unit",
      "l.bodyweight", "l.planned_reps", "l.planned_load", "l.planned_exercise", "l.logged_at", "s.date", sql<string | null>`v.model->>'model'`.as("model"),
      sql<boolean>`coalesce((s.plan->>'deload')::boolean, false)`.as("deload"),
    ])
    .where("l.athlete_id", "=", athleteId);
  if (options.since) q = q.where("s.date", ">=", options.since);
  if (options.sessionIds) q = options.sessionIds.length ? q.where("l.session_id", "in", options.sessionIds) : q.where(sql<boolean>`false`);
  if (options.assignmentIds) q = options.assignmentIds.length ? q.where("s.assignment_id", "in", options.assignmentIds) : q.where(sql<boolean>`false`);
  const rows = await q.orderBy("s.date").orderBy("l.session_id").orderBy("l.exercise_index").orderBy("l.set_index").execute();
  return rows.map((r) => ({
    sessionId: r.session_id,
    date: r.date,
    exercise: r.exercise,
    exerciseKey: r.exercise_key,
    kind: r.kind,
    done: r.done,
    reps: r.reps,
    load: r.load,
    rir: r.rir,
    unit: r.unit,
    bodyweight: r.bodyweight,
    plannedReps: r.planned_reps,
    plannedLoad: r.planned_load,
    model: modelOf(r.model),
    exerciseIndex: r.exercise_index,
    setIndex: r.set_index,
    plannedExercise: r.planned_exercise,
    loggedAt: r.logged_at,
    deload: Boolean(r.deload),
  }));
}

const round1 = (n: number) => Math.round(n * 10) / 10;

export type ExerciseProgress = {
  key: string;
  name: string;
  /** Session bests, oldest first, with personal bests flagged. */
  points: { sessionId: string; date: string; e1rm: number; reps: number; load: number; rir: number | null; pb: boolean }[];
  best: { e1rm: number; date: string } | null;
  lastDate: string;
};

export type LoggedSessionItem = {
  id: string;
  date: string;
  title: string;
  completed: boolean;
  setsDone: number;
  volume: number;
  /** Per exercise done: "100×5 · 100×5 · 100×4". */
  exercises: { name: string; swappedFrom: string | null; sets: string; pb: boolean }[];
};

export type AthleteProgress = {
  athlete: { id: string; name: string };
  units: Units;
  exercises: ExerciseProgress[];
  weeks: WeekVolume[];
  sessions: LoggedSessionItem[];
  stalls: Stall[];
};

const num = (n: number) => (Number.isInteger(n) ? String(n) : String(Math.round(n * 100) / 100));

function setText(s: LoggedSet, units: Units): string {
  const load = convertMass(s.load, s.unit, units);
  const base = s.bodyweight ? (load > 0 ? `BW+${num(load)}×${s.reps}` : `BW×${s.reps}`) : `${num(load)}×${s.reps}`;
  return s.rir !== null ? `${base} @${s.rir}` : base;
}

/**
 * The athlete's progress for the history pages, in their current unit.
 *
 * @example
 * const p = await athleteProgress(db, viewer, athleteId);
 * p.exercises[0].points.filter((x) => x.pb); // personal bests of the most recent lift
 */
export async function athleteProgress(db: Db, actor: Actor, athleteId: string, options: { today?: string; sessionLimit?: number } = {}): Promise<AthleteProgress> {
  const athlete = await requireAthleteFor(db, actor, athleteId);
  const [{ units }, sets] = await Promise.all([getEquipment(db, athleteId), loadLoggedSets(db, athleteId)]);
  const marked = markPersonalBests(sessionBests(sets, units));
  const byKey = new Map<string, ExerciseProgress>();
  for (const b of marked) {
    const e = byKey.get(b.exerciseKey) ?? { key: b.exerciseKey, name: b.exercise, points: [], best: null, lastDate: b.date };
    e.points.push({ sessionId: b.sessionId, date: b.date, e1rm: round1(b.e1rm), reps: b.reps, load: b.load, rir: b.rir, pb: b.pb });
    if (!e.best || b.e1rm > e.best.e1rm) e.best = { e1rm: round1(b.e1rm), date: b.date };
    e.lastDate = b.date;
    e.name = b.exercise;
    byKey.set(b.exerciseKey, e);
  }
  const exercises = [...byKey.values()].sort((a, b) => b.lastDate.localeCompare(a.lastDate) || a.name.localeCompare(b.name));
  const pbSet = new Set(marked.filter((b) => b.pb).map((b) => `${b.sessionId}\u0000${b.exerciseKey}`));
  const sessions = await loggedSessions(db, athleteId, sets, units, pbSet, options.sessionLimit ?? 60);
  return {
    athlete: { id: athlete.id, name: athlete.name },
    units,
    exercises,
    weeks: weeklyVolume(sets, units).slice(-26),
    sessions,
    stalls: stalledExercises(sessionBests(sets, units), options.today ?? todayUtc()),
  };
}

async function loggedSessions(db: Db, athleteId: string, sets: LoggedSetRow[], units: Units, pbSet: Set<string>, limit: number): Promise<LoggedSessionItem[]> {
  const rows = await db
    .selectFrom("training_sessions")
    .select(["id", "date", "title", "completed_at"])
    .where("athlete_id", "=", athleteId)
    .where("logged_at", "is not", null)
    .orderBy("date", "desc")
    .orderBy("ordinal", "desc")
    .limit(limit)
    .execute();
  const bySession = new Map<string, LoggedSetRow[]>();
  for (const s of sets) if (s.done) bySession.set(s.sessionId, [...(bySession.get(s.sessionId) ?? []), s]);
  return rows.map((r) => {
    const done = bySession.get(r.id) ?? [];
    const slots = new Map<number, LoggedSetRow[]>();
    for (const s of done) slots.set(s.exerciseIndex, [...(slots.get(s.exerciseIndex) ?? []), s]);
    const volume = done.filter((s) => s.kind === "work").reduce((t, s) => t + s.reps * convertMass(s.load, s.unit, units), 0);
    return {
      id: r.id,
      date: r.date,
      title: r.title,
      completed: r.completed_at !== null,
      setsDone: done.filter((s) => s.kind === "work").length,
      volume: Math.round(volume),
      exercises: [...slots.entries()]
        .sort(([a], [b]) => a - b)
        .map(([, list]) => {
          const work = list.filter((s) => s.kind === "work");
          const shown = work.length ? work : list;
          return { name: list[0].exercise, swappedFrom: list[0].plannedExercise !== list[0].exercise ? list[0].plannedExercise : null, sets: shown.map((s) => setText(s, units)).join(" · "), pb: pbSet.has(`${r.id}\u0000${list[0].exerciseKey}`) };
        }),
    };
  });
}

export type SessionSummary = {
  sessionId: string;
  date: string;
  title: string;
  units: Units;
  completedAt: string | null;
  minutes: number | null;
  totals: { workSetsDone: number; workSetsPlanned: number; reps: number; volume: number };
  exercises: {
    index: number;
    name: string;
    plannedName: string;
    setsDone: number;
    workSets: number;
    top: { reps: number; load: number; rir: number | null; bodyweight: boolean } | null;
    e1rm: number | null;
    pb: boolean;
    note: string | null;
  }[];
};

/**
 * What a finished session comes to: sets done against planned, volume, the
 * best set and estimated 1RM of each exercise, and personal bests.
 *
 * @example
 * const s = await sessionSummary(db, viewer, sessionId);
 * s.exercises.filter((e) => e.pb).map((e) => e.name);
 */
export async function sessionSummary(db: Db, actor: Actor, sessionId: string): Promise<SessionSummary> {
  const sheet = await getLogSheet(db, actor, sessionId);
  const { session } = sheet;
  const units = session.units;
  const keys = [...new Set(sheet.sets.map((s) => s.exerciseKey))];
  const history = keys.length ? (await loadLoggedSets(db, session.athleteId)).filter((s) => keys.includes(s.exerciseKey) && s.date <= session.date) : [];
  const marked = markPersonalBests(sessionBests(history, units)).filter((b) => b.sessionId === session.id);
  const pbKeys = new Set(marked.filter((b) => b.pb).map((b) => b.exerciseKey));
  const notes = new Map(sheet.exercises.map((e) => [e.exerciseIndex, e]));
  const asLogged = (s: (typeof sheet.sets)[number]): LoggedSet => ({ ...s, sessionId: session.id, date: session.date, bodyweight: false, model: session.model });
  let workSetsDone = 0;
  let workSetsPlanned = 0;
  let reps = 0;
  let volume = 0;
  const exercises = session.plan.exercises.map((ex, index) => {
    const choice = notes.get(index);
    const name = choice?.exercise ?? ex.name;
    const variant = name === ex.name ? ex : (ex.substitutes.find((s) => s.name === name) ?? ex);
    const planned = variant.sets.filter((s) => s.kind === "work").length;
    const logged = sheet.sets.filter((s) => s.exerciseIndex === index && s.done && s.kind === "work");
    workSetsPlanned += planned;
    workSetsDone += logged.length;
    let top: SessionSummary["exercises"][number]["top"] = null;
    let best: number | null = null;
    for (const s of logged) {
      reps += s.reps;
      volume += s.reps * s.load;
      const bw = variant.sets[s.setIndex]?.bodyweight ?? false;
      const e = bw ? null : setE1rm({ ...asLogged(s), bodyweight: bw });
      if (e !== null && (best === null || e > best)) best = e;
      if (!top || s.load > top.load || (s.load === top.load && s.reps > top.reps)) top = { reps: s.reps, load: s.load, rir: s.rir, bodyweight: bw };
    }
    const key = logged[0]?.exerciseKey;
    return {
      index,
      name: logged[0]?.exercise ?? name,
      plannedName: ex.name,
      setsDone: logged.length,
      workSets: planned,
      top,
      e1rm: best === null ? null : round1(best),
      pb: key !== undefined && pbKeys.has(key),
      note: choice?.note ?? null,
    };
  });
  const first = await db.selectFrom("set_logs").select((eb) => eb.fn.min("logged_at").as("first")).where("session_id", "=", session.id).executeTakeFirst();
  const firstAt = first?.first ? new Date(first.first as Date) : null;
  const minutes = firstAt && session.completedAt ? Math.max(0, Math.round((Date.parse(session.completedAt) - firstAt.getTime()) / 60000)) : null;
  return {
    sessionId: session.id,
    date: session.date,
    title: session.title,
    units,
    completedAt: session.completedAt,
    minutes,
    totals: { workSetsDone, workSetsPlanned, reps, volume: Math.round(volume) },
    exercises,
  };
}
