import "server-only";
import { proposeMax, sessionBests, type SessionBest } from "../lib/progress";
import { type Actor, type AthleteRef, type Db, findAthleteFor, requireAthleteFor } from "./athleteAccess";
import { currentMaxes } from "./athleteProfiles";
import type { Units } from "./database";
import { DomainError } from "./domainError";
import { loadLoggedSets } from "./progress";
import { recomputeFutureSessions, todayUtc } from "./recompute";
import { inTransaction } from "./templateAccess";
import { isUuid } from "./templateRules";

/**
 * Max changes proposed from the logs (the rule is lib/progress/autoRegulate.ts),
 * only for assignments with auto-regulation on. A proposal is never applied by
 * itself: the coach accepts it — or the athlete, when they coach themself —
 * which records a new max (source "logs") and recomputes future sessions in
 * the same transaction; or dismisses it.
 */

export type ProposalView = {
  id: string;
  athleteId: string;
  exercise: string;
  exerciseKey: string;
  currentValue: number;
  proposedValue: number;
  estimate: number;
  /** (estimate − current) / current. */
  change: number;
  units: Units;
  basis: { sessionId: string; date: string; e1rm: number; reps: number; load: number; rir: number | null }[];
  createdAt: string;
};

function proposalNotFound(): DomainError {
  return new DomainError("not_found", "That proposal does not exist or is not yours to decide.");
}

const basisOf = (b: SessionBest[]) => b.map((x) => ({ sessionId: x.sessionId, date: x.date, e1rm: Math.round(x.e1rm * 10) / 10, reps: x.reps, load: x.load, rir: x.rir }));

/**
 * Re-applies the rule for every exercise logged in the athlete's auto-regulated
 * assignments (deload weeks left out): opens or updates a proposal where it finds one, withdraws an
 * open one it no longer supports. A dismissed proposal comes back only when a
 * session newer than the ones it rested on says so again. Runs inside the
 * caller's transaction (finishing a session).
 *
 * @example
 * await refreshProposals(trx, athleteId); // { open: 1 }
 */
export async function refreshProposals(db: Db, athleteId: string): Promise<{ open: number }> {
  const assignments = await db.selectFrom("template_assignments").select("id").where("athlete_id", "=", athleteId).where("status", "=", "active").where("auto_regulate", "=", true).execute();
  if (assignments.length > 0) {
    // A deload week is light on purpose; its sets would drag the estimate down.
    const sets = (await loadLoggedSets(db, athleteId, { assignmentIds: assignments.map((a) => a.id) })).filter((s) => !s.deload);
    const maxes = new Map((await currentMaxes(db, athleteId)).map((m) => [m.exerciseKey, m]));
    for (const key of new Set(sets.map((s) => s.exerciseKey))) {
      const max = maxes.get(key);
      if (!max) continue;
      const bests = sessionBests(sets.filter((s) => s.exerciseKey === key), max.units);
      const proposal = proposeMax({ bests, current: { value: max.value, measuredOn: max.measuredOn, kind: max.kind }, unit: max.units });
      const open = await db.selectFrom("max_proposals").select("id").where("athlete_id", "=", athleteId).where("exercise_key", "=", key).where("status", "=", "open").executeTakeFirst();
      if (!proposal) {
        if (open) await db.deleteFrom("max_proposals").where("id", "=", open.id).execute();
        continue;
      }
      const newest = proposal.basis[proposal.basis.length - 1];
      const dismissed = await db
        .selectFrom("max_proposals")
        .select("basis")
        .where("athlete_id", "=", athleteId)
        .where("exercise_key", "=", key)
        .where("status", "=", "dismissed")
        .where("current_max_id", "=", max.id)
        .orderBy("decided_at", "desc")
        .executeTakeFirst();
      const dismissedNewest = dismissed?.basis.at(-1)?.date;
      if (dismissedNewest && newest.date <= dismissedNewest) {
        if (open) await db.deleteFrom("max_proposals").where("id", "=", open.id).execute();
        continue;
      }
      const session = await db.selectFrom("training_sessions").select("assignment_id").where("id", "=", newest.sessionId).executeTakeFirstOrThrow();
      const values = {
        assignment_id: session.assignment_id,
        exercise: max.exercise,
        current_max_id: max.id,
        current_value: max.value,
        proposed_value: proposal.value,
        estimate: proposal.estimate,
        units: max.units,
        basis: JSON.stringify(basisOf(proposal.basis)),
      };
      if (open) await db.updateTable("max_proposals").set({ ...values, updated_at: new Date() }).where("id", "=", open.id).execute();
      else await db.insertInto("max_proposals").values({ ...values, athlete_id: athleteId, exercise_key: key, decided_at: null, decided_by: null, accepted_max_id: null }).execute();
    }
  }
  const count = await db.selectFrom("max_proposals").select((eb) => eb.fn.countAll<string>().as("n")).where("athlete_id", "=", athleteId).where("status", "=", "open").executeTakeFirstOrThrow();
  return { open: Number(count.n) };
}

/**
 * The open proposals of an athlete, for them or their coach.
 *
 * @example
 * const open = await listProposals(db, viewer, athleteId); // ProposalView[]
 */
export async function listProposals(db: Db, actor: Actor, athleteId: string): Promise<ProposalView[]> {
  await requireAthleteFor(db, actor, athleteId);
  const rows = await db.selectFrom("max_proposals").selectAll().where("athlete_id", "=", athleteId).where("status", "=", "open").orderBy("exercise").execute();
  return rows.map((r) => ({
    id: r.id,
    athleteId: r.athlete_id,
    exercise: r.exercise,
    exerciseKey: r.exercise_key,
    currentValue: r.current_value,
    proposedValue: r.proposed_value,
    estimate: Math.round(r.estimate * 10) / 10,
    change: (r.estimate - r.current_value) / r.current_value,
    units: r.units,
    basis: r.basis,
    createdAt: r.created_at.toISOString(),
  }));
}

/** The coach decides; an athlete only when no coach looks after them. */
function mayDecide(actor: Actor, athlete: AthleteRef): boolean {
  if (actor.role === "coach") return athlete.coachId === actor.id;
  return actor.role === "athlete" && actor.id === athlete.id && athlete.coachId === null;
}

async function openProposalFor(db: Db, actor: Actor, id: string) {
  if (!isUuid(id)) throw proposalNotFound();
  const row = await db.selectFrom("max_proposals").selectAll().where("id", "=", id).forUpdate().executeTakeFirst();
  if (!row) throw proposalNotFound();
  const athlete = await findAthleteFor(db, actor, row.athlete_id);
  if (!athlete) throw proposalNotFound();
  if (!mayDecide(actor, athlete)) throw new DomainError("forbidden", "Your coach decides on changes to your maxes.");
  if (row.status !== "open") throw new DomainError("conflict", `This proposal was already ${row.status}.`);
  return row;
}

/**
 * Records the proposed value as the athlete's new 1RM (source "logs") and
 * recomputes their future, unlogged sessions — together or not at all.
 *
 * @example
 * await acceptProposal(db, coach, proposalId); // { maxId, value: 108, updatedSessions: 9 }
 */
export async function acceptProposal(db: Db, actor: Actor, id: string, options: { today?: string } = {}): Promise<{ maxId: string; value: number; units: Units; updatedSessions: number }> {
  const today = options.today ?? todayUtc();
  return inTransaction(db, async (trx) => {
    const p = await openProposalFor(trx, actor, id);
    const max = await trx
      .insertInto("athlete_maxes")
      .values({
        athlete_id: p.athlete_id,
        exercise: p.exercise,
        exercise_key: p.exercise_key,
        kind: "1rm",
        value: p.proposed_value,
        units: p.units,
        measured_on: today,
        source: "logs",
        note: `Estimated from ${p.basis.length} logged sessions (median of their best sets).`,
        created_by: actor.id,
      })
      .returning("id")
      .executeTakeFirstOrThrow();
    await trx.updateTable("max_proposals").set({ status: "accepted", decided_at: new Date(), decided_by: actor.id, accepted_max_id: max.id, updated_at: new Date() }).where("id", "=", p.id).execute();
    const { updated } = await recomputeFutureSessions(trx, p.athlete_id, { today });
    return { maxId: max.id, value: p.proposed_value, units: p.units, updatedSessions: updated };
  });
}

/**
 * Sets a proposal aside; the same evidence will not raise it again.
 *
 * @example
 * await dismissProposal(db, coach, proposalId);
 */
export async function dismissProposal(db: Db, actor: Actor, id: string): Promise<void> {
  await inTransaction(db, async (trx) => {
    const p = await openProposalFor(trx, actor, id);
    await trx.updateTable("max_proposals").set({ status: "dismissed", decided_at: new Date(), decided_by: actor.id, updated_at: new Date() }).where("id", "=", p.id).execute();
  });
}
