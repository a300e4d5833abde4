import "server-only";
import { expandProgramme } from "../lib/load/expand";
import type { ExpandDiagnostic, Session } from "../lib/load/types";
import type { Weekday } from "../lib/notation/model";
import type { Db } from "./athleteAccess";
import { expansionProfile } from "./athleteProfiles";
import { libraryNamesFor } from "./exercises";
import { readModel } from "./templateVersions";

/** The server's calendar day in UTC, "YYYY-MM-DD"; sessions on or after it count as future. */
export function todayUtc(now = new Date()): string {
  return now.toISOString().slice(0, 10);
}

/** How a stored session is titled in lists and calendars: "Day A · Base week 2". */
export function sessionTitle(s: Session): string {
  return `${s.day} · ${s.block} week ${s.week}${s.deload ? " (deload)" : ""}`;
}

export type AssignmentPlan = { sessions: Session[]; diagnostics: ExpandDiagnostic[] };

/**
 * Expands a pinned template version for an athlete with their current
 * equipment and maxes — the one place assignment, upgrade and recompute get
 * their sessions from, so all three agree.
 */
export async function planAssignment(
  db: Db,
  input: { athleteId: string; athleteName: string; versionId: string; startDate: string; weekdays: string[] },
): Promise<AssignmentPlan> {
  const version = await db.selectFrom("template_versions").select(["model", "source"]).where("id", "=", input.versionId).executeTakeFirstOrThrow();
  const programme = readModel(version.model, version.source);
  const [profile, library] = await Promise.all([
    expansionProfile(db, input.athleteId, input.athleteName),
    // The coach's own exercises: their equipment decides rounding, their aliases find the athlete's maxes.
    libraryNamesFor(db, { id: input.athleteId, role: "athlete" }),
  ]);
  const days = input.weekdays.length > 0 ? (input.weekdays as Weekday[]) : undefined;
  return expandProgramme(programme, profile, { start: input.startDate, library, ...(days ? { days } : {}) });
}

/**
 * Re-expands every active assignment of the athlete and rewrites the plan of
 * sessions that are still ahead and unlogged. Past, logged and completed
 * sessions never change; a moved session keeps its new date. Call it inside
 * the transaction that changed the maxes or equipment, so both land together.
 *
 * @example
 * await db.transaction().execute(async (trx) => {
 *   await addMax(trx, actor, athleteId, { exercise: "back squat", value: 130, … });
 *   await recomputeFutureSessions(trx, athleteId);
 * });
 */
export async function recomputeFutureSessions(db: Db, athleteId: string, options: { today?: string } = {}): Promise<{ updated: number }> {
  const today = options.today ?? todayUtc();
  const athlete = await db.selectFrom("users").select(["name"]).where("id", "=", athleteId).executeTakeFirst();
  if (!athlete) return { updated: 0 };
  const assignments = await db
    .selectFrom("template_assignments")
    .select(["id", "version_id", "start_date", "weekdays"])
    .where("athlete_id", "=", athleteId)
    .where("status", "=", "active")
    .execute();
  let updated = 0;
  for (const a of assignments) {
    const open = await db
      .selectFrom("training_sessions")
      .select(["id", "ordinal"])
      .where("assignment_id", "=", a.id)
      .where("date", ">=", today)
      .where("logged_at", "is", null)
      .where("completed_at", "is", null)
      .forUpdate()
      .execute();
    if (open.length === 0) continue;
    const plan = await planAssignment(db, { athleteId, athleteName: athlete.name, versionId: a.version_id, startDate: a.start_date, weekdays: a.weekdays });
    const now = new Date();
    for (const row of open) {
      const session = plan.sessions[row.ordinal];
      if (!session) continue;
      await db
        .updateTable("training_sessions")
        .set({ plan: JSON.stringify(session), title: sessionTitle(session), computed_at: now })
        .where("id", "=", row.id)
        .execute();
      updated++;
    }
  }
  return { updated };
}
