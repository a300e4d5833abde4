import "server-only";
import { sql, type Kysely } from "kysely";
import type { AthleteProfile } from "../lib/athlete/profile";
import type { EquipmentKind } from "../lib/exercises/catalogue";
import type { SetOut, SubstituteOut, Session as SessionPlan } from "../lib/load/types";
import type { Database } from "./database";
import { finishSession, saveExerciseLog, saveSet } from "./logs";

/**
 * The demo's training history: the weeks before this one, logged through the
 * same calls the logging page makes (db/logs.ts), so the rows look exactly as
 * real logging leaves them. Everything follows fixed rules of the session's
 * position and the exercise's place in it — no randomness — so every run of
 * the seed writes the same history.
 */

/** Where a habit applies: a day of the programme in a week of the block. */
type At = { week: number; day: string };

export type TrainingHabits = {
  /** Clock time (UTC) the athlete starts, "HH:MM"; sets are timed from it. */
  startsAt: string;
  logsWarmups: boolean;
  /** What the athlete puts on when the plan leaves the load open, by exercise, in their unit. */
  chosenLoads: Record<string, number>;
  /** Every n-th exercise (by session and slot) ends with a top set one step heavier; 0 for never. */
  heavierEvery: number;
  /** Every n-th barbell lift gets one rep above plan on its first work set; 0 for never. */
  extraRepEvery: number;
  /** Every n-th exercise's last set is one rep closer to failure than planned; 0 for never. */
  harderEvery: number;
  missed: At[];
  notes: (At & { exercise: string; note: string })[];
  swaps: (At & { exercise: string; to: string; note: string })[];
  /** A work set (0-based among work sets) that fell short of the plan. */
  shortSets: (At & { exercise: string; workSet: number; reps: number; rir: number })[];
};

type Steps = { plates: AthleteProfile["plates"]; dumbbellStep: number; machineStep: number };

const at = <T extends At>(list: T[], s: SessionPlan): T[] => list.filter((x) => x.week === s.week && x.day === s.day);

/** The smallest jump the athlete's kit allows: a pair of the lightest plates, one dumbbell or one stack step. */
export function stepFor(equipment: EquipmentKind, kit: Steps): number {
  if (equipment === "barbell") {
    const weights = kit.plates.map((p) => (typeof p === "number" ? p : p.weight));
    return weights.length ? 2 * Math.min(...weights) : 0;
  }
  if (equipment === "dumbbell") return kit.dumbbellStep;
  if (equipment === "cable" || equipment === "machine") return kit.machineStep;
  return 0;
}

/** What the athletes report after a set of 5 at about 75 %: a cautious read, lower than the formulas would say. */
const PERCENT_SET_RIR = 3;

type Performed = { reps: number; load: number; rir: number | null };

/**
 * One set as this athlete does it. Ranges are climbed a rep a week; a planned
 * RIR with a half (from an RPE) is rounded up and down on alternate sets; a
 * percentage set with no RIR target gets the athlete's own read.
 */
function performSet(set: SetOut, ctx: { variant: SubstituteOut; session: SessionPlan; slot: number; position: number; workIndex: number; lastWork: boolean; load: number; habits: TrainingHabits; kit: Steps }): Performed {
  const { habits, session, slot, position } = ctx;
  const repsMin = set.repsMin ?? 0;
  if (set.kind === "warmup") return { reps: repsMin, load: ctx.load, rir: null };
  const nth = (every: number) => every > 0 && (position + slot) % every === every - 1;
  let reps = repsMin;
  if (set.amrap) reps = repsMin + 2;
  else if (set.repsMax !== null && set.repsMax > repsMin) reps = Math.min(set.repsMax, repsMin + session.week - 1);
  if (ctx.variant.equipment === "barbell" && ctx.workIndex === 0 && nth(habits.extraRepEvery)) {
    reps = Math.min(reps + 1, set.repsMax !== null && set.repsMax > repsMin ? set.repsMax : repsMin + 1);
  }
  let load = ctx.load;
  if (!set.bodyweight && ctx.lastWork && nth(habits.heavierEvery)) load += stepFor(ctx.variant.equipment, ctx.kit);
  let rir: number | null = null;
  if (set.rir !== null) rir = ctx.workIndex % 2 === 0 ? Math.ceil(set.rir) : Math.floor(set.rir);
  else if (!set.bodyweight && set.percent1RM !== null) rir = PERCENT_SET_RIR;
  if (rir !== null && ctx.lastWork && nth(habits.harderEvery)) rir = Math.max(0, rir - 1);
  return { reps, load, rir };
}

/**
 * Logs one session as the athlete would on their phone: swaps and notes first,
 * then each set ticked in order a few minutes apart, then finished. Exercises
 * whose load the plan leaves open and the athlete has no habit for are left out.
 */
async function logSession(db: Kysely<Database>, athleteId: string, row: { id: string; date: string; plan: SessionPlan }, position: number, habits: TrainingHabits, kit: Steps): Promise<number> {
  const actor = { id: athleteId, role: "athlete" as const };
  const session = row.plan;
  let clock = Date.parse(`${row.date}T${habits.startsAt}:00Z`);
  const startedAt = new Date(clock);
  let sets = 0;
  for (const [slot, ex] of session.exercises.entries()) {
    const swap = at(habits.swaps, session).find((s) => s.exercise === ex.name);
    const variant: SubstituteOut = (swap && ex.substitutes.find((s) => s.name === swap.to)) || ex;
    const open = variant.sets.some((s) => s.load === null && !s.bodyweight);
    const chosen = habits.chosenLoads[variant.name];
    if (open && chosen === undefined) continue;
    if (variant !== ex) await saveExerciseLog(db, actor, row.id, { exerciseIndex: slot, exercise: variant.name, note: swap?.note ?? null });
    for (const n of at(habits.notes, session).filter((x) => x.exercise === ex.name)) {
      await saveExerciseLog(db, actor, row.id, { exerciseIndex: slot, note: n.note });
    }
    const work = variant.sets.map((s, i) => (s.kind === "work" ? i : -1)).filter((i) => i >= 0);
    for (const [setIndex, set] of variant.sets.entries()) {
      if (set.repsMin === null) continue; // a timed set: the demo programme has none
      if (set.kind === "warmup" && !habits.logsWarmups) continue;
      const workIndex = work.indexOf(setIndex);
      let done = performSet(set, { variant, session, slot, position, workIndex, lastWork: setIndex === work.at(-1), load: set.load ?? chosen ?? 0, habits, kit });
      const short = at(habits.shortSets, session).find((s) => s.exercise === ex.name && s.workSet === workIndex);
      if (short) done = { ...done, reps: short.reps, rir: short.rir };
      clock += set.kind === "warmup" ? 90_000 : 180_000;
      await saveSet(db, actor, row.id, { exerciseIndex: slot, setIndex, reps: done.reps, load: done.load, rir: done.rir, done: true, clientTime: new Date(clock).toISOString() });
      sets++;
    }
  }
  if (sets === 0) return 0;
  await finishSession(db, actor, row.id);
  // Logging stamps the server's clock; these sessions happened on their own dates, so the stamps move there.
  const finishedAt = new Date(clock + 240_000);
  await sql`update set_logs set logged_at = client_updated_at, updated_at = client_updated_at where session_id = ${row.id}`.execute(db);
  await db.updateTable("session_exercise_logs").set({ updated_at: startedAt }).where("session_id", "=", row.id).execute();
  await db.updateTable("training_sessions").set({ logged_at: startedAt, completed_at: finishedAt }).where("id", "=", row.id).execute();
  return sets;
}

/**
 * Logs the athlete's sessions dated before `before`, skipping the ones their
 * habits say they missed. Does nothing once the athlete has logged anything,
 * so running the seed again adds no history.
 *
 * @example
 * await logPastTraining(db, tomasId, TOMAS_HABITS, equipmentPreset("kg-club"), "2027-01-18"); // { sessions: 8, sets: 190 }
 */
export async function logPastTraining(db: Kysely<Database>, athleteId: string, habits: TrainingHabits, kit: Steps, before: string): Promise<{ sessions: number; sets: number }> {
  const any = await db.selectFrom("set_logs").select("id").where("athlete_id", "=", athleteId).limit(1).executeTakeFirst();
  if (any) return { sessions: 0, sets: 0 };
  const rows = await db
    .selectFrom("training_sessions")
    .select(["id", "date", "plan"])
    .where("athlete_id", "=", athleteId)
    .where("date", "<", before)
    .where("logged_at", "is", null)
    .orderBy("date")
    .orderBy("ordinal")
    .execute();
  let sessions = 0;
  let sets = 0;
  for (const [position, row] of rows.entries()) {
    if (at(habits.missed, row.plan).length > 0) continue;
    const n = await logSession(db, athleteId, row, position, habits, kit);
    if (n > 0) sessions++;
    sets += n;
  }
  return { sessions, sets };
}

/** Tomas: a kg club gym, evenings; logs everything, warm-ups too, and pushes a little. */
export const TOMAS_HABITS: TrainingHabits = {
  startsAt: "17:40",
  logsWarmups: true,
  chosenLoads: { "walking lunge": 20, "standing calf raise": 80, "seated dumbbell press": 24, "cable curl": 25, "rope pushdown": 30, "dumbbell row": 32 },
  heavierEvery: 5,
  extraRepEvery: 2,
  harderEvery: 4,
  missed: [],
  notes: [
    { week: 1, day: "Lower heavy", exercise: "back squat", note: "Belt on for the last two sets; depth felt solid." },
    { week: 2, day: "Upper heavy", exercise: "bench press", note: "Held the pause a full second on every rep." },
    { week: 2, day: "Lower volume", exercise: "deadlift", note: "Grip went on the last set; straps next time." },
  ],
  swaps: [{ week: 2, day: "Upper heavy", exercise: "cable row", to: "machine row", note: "Cable station taken; machine row instead." }],
  shortSets: [],
};

/** Maya: an lb garage gym, early mornings; work sets only, skipped one session, and one squat set went wrong. */
export const MAYA_HABITS: TrainingHabits = {
  startsAt: "06:10",
  logsWarmups: false,
  chosenLoads: {
    "cable row": 90, "walking lunge": 25, "standing calf raise": 100, "seated dumbbell press": 30, "chest-supported row": 70,
    "cable curl": 40, "rope pushdown": 40, "leg curl": 60,
  },
  heavierEvery: 9,
  extraRepEvery: 0,
  harderEvery: 4,
  missed: [{ week: 2, day: "Upper volume" }],
  notes: [
    { week: 1, day: "Upper heavy", exercise: "pull-up", note: "First time with 10 lb on the belt." },
    { week: 2, day: "Lower heavy", exercise: "back squat", note: "Short on sleep; the last set stopped at 3." },
  ],
  swaps: [],
  shortSets: [{ week: 2, day: "Lower heavy", exercise: "back squat", workSet: 3, reps: 3, rir: 0 }],
};
