import "server-only";
import { sql } from "kysely";
import { addDays } from "../lib/dates/date";
import { attentionFor, isoMonday, sessionBests, type Flag } from "../lib/progress";
import { type Actor, type Db, listRoster } from "./athleteAccess";
import { getEquipment } from "./athleteProfiles";
import { DomainError } from "./domainError";
import { loadLoggedSets } from "./progress";
import { todayUtc } from "./recompute";

/**
 * The coach's roster at a glance: per athlete, sessions planned and logged this
 * week and over the four weeks before, the last session trained, and what asks
 * for a look (rules and thresholds: lib/progress/attention.ts). Stalls read the
 * last STALL_LOOKBACK_DAYS of logs so that a roster of years stays quick.
 */

export const STALL_LOOKBACK_DAYS = 182;

export type DashboardRow = {
  id: string;
  name: string;
  email: string;
  thisWeek: { planned: number; logged: number };
  lastFourWeeks: { planned: number; logged: number };
  missed: number;
  offTargetSets: number;
  stalled: string[];
  lastSession: string | null;
  flags: Flag[];
  openProposals: number;
};

export type Dashboard = { today: string; weekOf: string; rows: DashboardRow[] };

/**
 * One row per athlete of the coach, by name.
 *
 * @example
 * const { rows } = await coachDashboard(db, viewer, { today: "2027-02-03" });
 * rows.filter((r) => r.flags.includes("missed"));
 */
export async function coachDashboard(db: Db, actor: Actor, options: { today?: string } = {}): Promise<Dashboard> {
  if (actor.role !== "coach") throw new DomainError("forbidden", "Only coaches have a roster.");
  const today = options.today ?? todayUtc();
  const monday = isoMonday(today);
  const from = addDays(monday, -28);
  const to = addDays(monday, 6);
  const athletes = await listRoster(db, actor);
  if (athletes.length === 0) return { today, weekOf: monday, rows: [] };
  const ids = athletes.map((a) => a.id);
  const [sessions, last, proposals] = await Promise.all([
    db
      .selectFrom("training_sessions")
      .select(["athlete_id", "date", "logged_at"])
      .where("athlete_id", "in", ids)
      .where("date", ">=", from)
      .where("date", "<=", to)
      .execute(),
    db
      .selectFrom("training_sessions")
      .select(["athlete_id", sql<string>`max(date)`.as("last")])
      .where("athlete_id", "in", ids)
      .where("logged_at", "is not", null)
      .groupBy("athlete_id")
      .execute(),
    db
      .selectFrom("max_proposals")
      .select(["athlete_id", sql<string>`count(*)`.as("n")])
      .where("athlete_id", "in", ids)
      .where("status", "=", "open")
      .groupBy("athlete_id")
      .execute(),
  ]);
  const lastBy = new Map(last.map((l) => [l.athlete_id, l.last]));
  const proposalsBy = new Map(proposals.map((p) => [p.athlete_id, Number(p.n)]));
  const rows: DashboardRow[] = [];
  for (const a of athletes) {
    const [{ units }, sets] = await Promise.all([getEquipment(db, a.id), loadLoggedSets(db, a.id, { since: addDays(today, -STALL_LOOKBACK_DAYS) })]);
    const attention = attentionFor({
      sessions: sessions.filter((s) => s.athlete_id === a.id).map((s) => ({ date: s.date, logged: s.logged_at !== null })),
      sets,
      bests: sessionBests(sets, units),
      today,
    });
    rows.push({
      id: a.id,
      name: a.name,
      email: a.email,
      thisWeek: attention.thisWeek,
      lastFourWeeks: attention.lastFourWeeks,
      missed: attention.missed,
      offTargetSets: attention.offTargetSets,
      stalled: attention.stalled.map((s) => s.exercise),
      lastSession: lastBy.get(a.id) ?? null,
      flags: attention.flags,
      openProposals: proposalsBy.get(a.id) ?? 0,
    });
  }
  return { today, weekOf: monday, rows };
}
