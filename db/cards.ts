import "server-only";
import { addDays, isoWeekdayNumber, isoWeekLabel, weekdayOf } from "../lib/dates";
import type { Session } from "../lib/load/types";
import { requireAthleteFor, type Actor, type AthleteRef, type Db } from "./athleteAccess";
import { DomainError } from "./domainError";
import { isUuid } from "./templateRules";

/**
 * The stored sessions a printed card is made from, with the access rule of
 * db/athleteAccess.ts: the athlete themself or their coach; anyone else is
 * answered exactly as for a session or athlete that does not exist.
 *
 * @example
 * const { athlete, sessions } = await weekForCards(db, viewer, athleteId, "2026-12-07", 1);
 * await renderCards({ athlete: athlete.name, sessions, baseUrl });
 */

export type CardSessionRow = { id: string; session: Session };

export type SessionForCard = { athlete: AthleteRef; id: string; session: Session };

export type WeekForCards = {
  athlete: AthleteRef;
  /** Monday of the first ISO week, and the Sunday the pack ends on. */
  from: string;
  to: string;
  /** ISO 8601 week of `from`, "2026-W50". */
  isoWeek: string;
  weeks: number;
  sessions: CardSessionRow[];
};

function sessionNotFound(): DomainError {
  return new DomainError("not_found", "That session does not exist or is not on your roster.");
}

/** A moved session prints on the day it was moved to, not the day the plan first gave it. */
function onItsDate(plan: Session, date: string): Session {
  return plan.date === date ? plan : { ...plan, date, isoWeek: isoWeekLabel(date), weekday: weekdayOf(date) };
}

export async function sessionForCard(db: Db, actor: Actor, sessionId: string): Promise<SessionForCard> {
  if (!isUuid(sessionId)) throw sessionNotFound();
  const row = await db.selectFrom("training_sessions").select(["id", "athlete_id", "date", "plan"]).where("id", "=", sessionId).executeTakeFirst();
  if (!row) throw sessionNotFound();
  let athlete: AthleteRef;
  try {
    athlete = await requireAthleteFor(db, actor, row.athlete_id);
  } catch (e) {
    // Someone else's session answers like a missing one, so session ids cannot be probed.
    if (e instanceof DomainError && e.code === "not_found") throw sessionNotFound();
    throw e;
  }
  return { athlete, id: row.id, session: onItsDate(row.plan, row.date) };
}

/** Monday of the ISO week that holds `date` (ISO 8601 weeks start on Monday). */
export function mondayOf(date: string): string {
  return addDays(date, 1 - isoWeekdayNumber(date));
}

/**
 * The sessions of `weeks` ISO weeks starting with the week that holds `from`,
 * in date order. Sessions of ended assignments are left out unless they were
 * logged: an ended plan is not what the athlete will train.
 */
export async function weekForCards(db: Db, actor: Actor, athleteId: string, from: string, weeks: number): Promise<WeekForCards> {
  const athlete = await requireAthleteFor(db, actor, athleteId);
  const monday = mondayOf(from);
  const end = addDays(monday, 7 * weeks);
  const rows = await db
    .selectFrom("training_sessions as s")
    .innerJoin("template_assignments as a", "a.id", "s.assignment_id")
    .select(["s.id", "s.date", "s.plan"])
    .where("s.athlete_id", "=", athlete.id)
    .where("s.date", ">=", monday)
    .where("s.date", "<", end)
    .where((eb) => eb.or([eb("a.status", "=", "active"), eb("s.logged_at", "is not", null), eb("s.completed_at", "is not", null)]))
    .orderBy("s.date")
    .orderBy("s.ordinal")
    .execute();
  return {
    athlete,
    from: monday,
    to: addDays(end, -1),
    isoWeek: isoWeekLabel(monday),
    weeks,
    sessions: rows.map((r) => ({ id: r.id, session: onItsDate(r.plan, r.date) })),
  };
}
