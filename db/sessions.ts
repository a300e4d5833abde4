import "server-only";
import { sql } from "kysely";
import { isDateString, toDayNumber } from "../lib/dates";
import type { Session as SessionPlan } from "../lib/load/types";
import { type Actor, type Db, findAthleteFor, requireAthleteFor } from "./athleteAccess";
import type { Units } from "./database";
import { DomainError } from "./domainError";
import { isUuid } from "./templateRules";

/**
 * Dated training sessions as the athlete and their coach read them: lists for
 * calendars, one session with its whole plan, today and what comes next, and
 * moving a session to another day. Someone else's session answers exactly
 * like a missing one.
 */

/** What a calendar cell needs; the plan itself stays on the server. */
export type SessionSummary = {
  id: string;
  athleteId: string;
  date: string;
  /** The day the programme put it on; differs from `date` once moved. */
  plannedDate: string;
  title: string;
  day: string;
  block: string;
  week: number;
  deload: boolean;
  exerciseCount: number;
  /** Some sets are logged. */
  logged: boolean;
  /** Marked done; a completed session no longer moves. */
  completed: boolean;
  assignmentId: string;
  templateTitle: string;
};

export type SessionDetail = SessionSummary & {
  athleteName: string;
  units: Units;
  plan: SessionPlan;
  loggedAt: Date | null;
  completedAt: Date | null;
  computedAt: Date;
};

/** A calendar asks for at most this many days at once (a month view is 42). */
export const MAX_RANGE_DAYS = 400;
/** A session moves at most this many days away from the day it was planned for. */
export const MAX_MOVE_DAYS = 366;

export function sessionNotFound(): DomainError {
  return new DomainError("not_found", "That session does not exist or is not yours to see.");
}

function summaryQuery(db: Db) {
  return db
    .selectFrom("training_sessions as s")
    .innerJoin("template_assignments as a", "a.id", "s.assignment_id")
    .innerJoin("templates as t", "t.id", "a.template_id")
    .select([
      "s.id",
      "s.athlete_id",
      "s.date",
      "s.planned_date",
      "s.title",
      "s.logged_at",
      "s.completed_at",
      "s.assignment_id",
      "s.ordinal",
      "t.title as template_title",
      sql<string>`s.plan->>'day'`.as("day"),
      sql<string>`s.plan->>'block'`.as("block"),
      sql<number>`coalesce((s.plan->>'week')::int, 1)`.as("week"),
      sql<boolean>`coalesce((s.plan->>'deload')::boolean, false)`.as("deload"),
      sql<number>`coalesce(jsonb_array_length(s.plan->'exercises'), 0)`.as("exercise_count"),
    ]);
}

type SummaryRow = Awaited<ReturnType<ReturnType<typeof summaryQuery>["executeTakeFirstOrThrow"]>>;

function toSummary(r: SummaryRow): SessionSummary {
  return {
    id: r.id,
    athleteId: r.athlete_id,
    date: r.date,
    plannedDate: r.planned_date,
    title: r.title,
    day: r.day ?? "",
    block: r.block ?? "",
    week: Number(r.week),
    deload: Boolean(r.deload),
    exerciseCount: Number(r.exercise_count),
    logged: r.logged_at !== null,
    completed: r.completed_at !== null,
    assignmentId: r.assignment_id,
    templateTitle: r.template_title,
  };
}

function checkDate(value: unknown, field: string): string {
  if (typeof value !== "string" || !isDateString(value)) {
    throw new DomainError("invalid_input", `${field}: give a real calendar date as YYYY-MM-DD`, { [field]: "Give a real calendar date as YYYY-MM-DD" });
  }
  return value;
}

/**
 * The athlete's sessions dated from `from` to `to` (both included), by date.
 *
 * @example
 * await listSessions(db, viewer, athleteId, "2026-12-28", "2027-02-07"); // SessionSummary[]
 */
export async function listSessions(db: Db, actor: Actor, athleteId: string, from: string, to: string): Promise<SessionSummary[]> {
  checkDate(from, "from");
  checkDate(to, "to");
  const span = toDayNumber(to) - toDayNumber(from);
  if (span < 0) throw new DomainError("invalid_input", "to: the range ends before it starts", { to: "Pick a day on or after from" });
  if (span >= MAX_RANGE_DAYS) throw new DomainError("invalid_input", `to: ask for at most ${MAX_RANGE_DAYS} days at once`, { to: `At most ${MAX_RANGE_DAYS} days after from` });
  await requireAthleteFor(db, actor, athleteId);
  const rows = await summaryQuery(db)
    .where("s.athlete_id", "=", athleteId)
    .where("s.date", ">=", from)
    .where("s.date", "<=", to)
    .orderBy("s.date")
    .orderBy("a.start_date")
    .orderBy("s.ordinal")
    .execute();
  return rows.map(toSummary);
}

async function details(db: Db, rows: SummaryRow[]): Promise<SessionDetail[]> {
  if (rows.length === 0) return [];
  const extra = await db
    .selectFrom("training_sessions as s")
    .innerJoin("users as u", "u.id", "s.athlete_id")
    .select(["s.id", "s.plan", "s.computed_at", "s.logged_at", "s.completed_at", "u.name"])
    .where(
      "s.id",
      "in",
      rows.map((r) => r.id),
    )
    .execute();
  const byId = new Map(extra.map((e) => [e.id, e]));
  return rows.map((r) => {
    const e = byId.get(r.id)!;
    return {
      ...toSummary(r),
      athleteName: e.name,
      units: e.plan.units,
      plan: e.plan,
      loggedAt: e.logged_at,
      completedAt: e.completed_at,
      computedAt: e.computed_at,
    };
  });
}

/**
 * One session with its whole plan, for the athlete or their coach.
 *
 * @example
 * const s = await getSession(db, viewer, sessionId);
 * s.plan.exercises[0].sets; // with loads and plates per side
 */
export async function getSession(db: Db, actor: Actor, sessionId: string): Promise<SessionDetail> {
  if (!isUuid(sessionId)) throw sessionNotFound();
  const row = await summaryQuery(db).where("s.id", "=", sessionId).executeTakeFirst();
  if (!row || !(await findAthleteFor(db, actor, row.athlete_id))) throw sessionNotFound();
  const [detail] = await details(db, [row]);
  return detail;
}

/**
 * Every session dated on `date`, with plans (usually one; two when a session was moved onto a training day).
 *
 * @example
 * await sessionsOn(db, viewer, viewer.id, todayUtc()); // SessionDetail[]
 */
export async function sessionsOn(db: Db, actor: Actor, athleteId: string, date: string): Promise<SessionDetail[]> {
  checkDate(date, "date");
  await requireAthleteFor(db, actor, athleteId);
  const rows = await summaryQuery(db).where("s.athlete_id", "=", athleteId).where("s.date", "=", date).orderBy("a.start_date").orderBy("s.ordinal").execute();
  return details(db, rows);
}

/**
 * The first session dated on or after `fromDate`, or null when nothing is planned.
 *
 * @example
 * await nextSession(db, viewer, viewer.id, addDays(todayUtc(), 1)); // SessionSummary | null
 */
export async function nextSession(db: Db, actor: Actor, athleteId: string, fromDate: string): Promise<SessionSummary | null> {
  checkDate(fromDate, "fromDate");
  await requireAthleteFor(db, actor, athleteId);
  const row = await summaryQuery(db)
    .where("s.athlete_id", "=", athleteId)
    .where("s.date", ">=", fromDate)
    .orderBy("s.date")
    .orderBy("a.start_date")
    .orderBy("s.ordinal")
    .limit(1)
    .executeTakeFirst();
  return row ? toSummary(row) : null;
}

/**
 * Puts a session on another day, for the athlete or their coach. The planned
 * date stays as it was, so recomputing loads keeps the session's place in the
 * programme; a completed session stays on the day it was done.
 *
 * @example
 * await moveSession(db, viewer, sessionId, "2027-01-07"); // SessionSummary with date "2027-01-07"
 */
export async function moveSession(db: Db, actor: Actor, sessionId: string, newDate: unknown): Promise<SessionSummary> {
  const date = checkDate(newDate, "date");
  if (!isUuid(sessionId)) throw sessionNotFound();
  const run = async (trx: Db) => {
    const row = await trx
      .selectFrom("training_sessions")
      .select(["id", "athlete_id", "planned_date", "completed_at"])
      .where("id", "=", sessionId)
      .forUpdate()
      .executeTakeFirst();
    if (!row || !(await findAthleteFor(trx, actor, row.athlete_id))) throw sessionNotFound();
    if (row.completed_at !== null) {
      throw new DomainError("conflict", "This session is marked done, so it stays on the day it was trained.", { date: "A completed session cannot move" });
    }
    if (Math.abs(toDayNumber(date) - toDayNumber(row.planned_date)) > MAX_MOVE_DAYS) {
      throw new DomainError("invalid_input", `date: pick a day within a year of the planned day (${row.planned_date})`, {
        date: `Within ${MAX_MOVE_DAYS} days of ${row.planned_date}`,
      });
    }
    await trx.updateTable("training_sessions").set({ date }).where("id", "=", sessionId).execute();
    return toSummary(await summaryQuery(trx).where("s.id", "=", sessionId).executeTakeFirstOrThrow());
  };
  return db.isTransaction ? run(db) : db.transaction().execute(run);
}
