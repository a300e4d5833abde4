import "server-only";
import { sql } from "kysely";
import { z } from "zod";
import { isDateString } from "../lib/dates/date";
import type { ExpandDiagnostic, Session } from "../lib/load/types";
import { WEEKDAYS } from "../lib/notation/model";
import { type Actor, type Db, findAthleteFor, requireAthleteFor } from "./athleteAccess";
import { DomainError } from "./domainError";
import { planAssignment, sessionTitle, todayUtc } from "./recompute";
import { inTransaction } from "./templateAccess";
import { isUuid } from "./templateRules";

/** More than this in one request is a roster import, not an assignment. */
export const MAX_ATHLETES_PER_ASSIGNMENT = 200;

const unique = (list: readonly string[]) => new Set(list).size === list.length;

/** What an assignment needs; the route's schema and the background job both read it through this. */
export const assignInputSchema = z.object({
  versionId: z.string({ error: "Pick a template version" }).refine(isUuid, "Pick a template version"),
  athleteIds: z
    .array(z.string({ error: "Each athlete is an id" }).refine(isUuid, "That is not an athlete id"), { error: "Pick at least one athlete" })
    .min(1, "Pick at least one athlete")
    .max(MAX_ATHLETES_PER_ASSIGNMENT, `At most ${MAX_ATHLETES_PER_ASSIGNMENT} athletes at a time`)
    .refine(unique, "Each athlete only once"),
  startDate: z.string({ error: "Give a start date, YYYY-MM-DD" }).refine(isDateString, "The start date is a calendar date written YYYY-MM-DD"),
  // Order matters: days without a weekday tag take these in turn.
  weekdays: z
    .array(z.enum(WEEKDAYS, { error: "Weekdays are mon, tue, wed, thu, fri, sat or sun" }), { error: "Weekdays are a list such as [\"mon\", \"thu\"]" })
    .max(7, "A week has seven days")
    .refine(unique, "Each weekday only once")
    .default([]),
  autoRegulate: z.boolean({ error: "autoRegulate is true or false" }).default(false),
});
export type AssignInput = z.output<typeof assignInputSchema>;

/** Checks plain data against {@link assignInputSchema}; invalid_input names every field at fault. */
export function checkAssignInput(input: unknown): AssignInput {
  const parsed = assignInputSchema.safeParse(input);
  if (parsed.success) return parsed.data;
  const fields: Record<string, string> = {};
  for (const issue of parsed.error.issues) fields[issue.path.join(".") || "_"] ??= issue.message;
  const [field, message] = Object.entries(fields)[0];
  throw new DomainError("invalid_input", field === "_" ? message : `${field}: ${message}`, fields);
}

export type VersionToAssign = { id: string; number: number; templateId: string; templateTitle: string };

function versionNotFound(): DomainError {
  return new DomainError("not_found", "That template version does not exist or is not yours.", { versionId: "No such version among your templates" });
}

/**
 * A version the actor may hand out: one of their own templates. That covers a
 * coach's shelf and an athlete's own copy (a self-coached athlete assigns to
 * themself; the athlete check then allows only their own id).
 */
export async function versionToAssign(db: Db, actor: Actor, versionId: string): Promise<VersionToAssign> {
  if (!isUuid(versionId) || (actor.role !== "coach" && actor.role !== "athlete")) throw versionNotFound();
  const row = await db
    .selectFrom("template_versions as v")
    .innerJoin("templates as t", "t.id", "v.template_id")
    .select(["v.id", "v.number", "t.id as template_id", "t.title", "t.archived_at"])
    .where("v.id", "=", versionId)
    .where("t.owner_id", "=", actor.id)
    .executeTakeFirst();
  if (!row) throw versionNotFound();
  if (row.archived_at !== null) {
    throw new DomainError("conflict", `“${row.title}” is archived; bring it back before giving it to anyone.`, { versionId: "That template is archived" });
  }
  return { id: row.id, number: row.number, templateId: row.template_id, templateTitle: row.title };
}

export type AssignOutcome =
  | { athleteId: string; athleteName: string; status: "assigned"; assignmentId: string; sessions: number; firstDate: string | null; diagnostics: ExpandDiagnostic[] }
  | { athleteId: string; athleteName: string | null; status: "failed"; error: { code: string; message: string } };

export type AssignResult = { version: VersionToAssign; outcomes: AssignOutcome[] };

type OutcomeHook = (db: Db, outcome: AssignOutcome) => Promise<void>;

// Long programmes run to thousands of sessions; a few hundred rows per statement keeps parameters well under pg's limit.
const INSERT_CHUNK = 300;

/** Session rows for a plan, numbered by their place in the expansion. */
export function sessionRows(assignmentId: string, athleteId: string, entries: { ordinal: number; session: Session; date?: string }[]) {
  return entries.map(({ ordinal, session, date }) => ({
    assignment_id: assignmentId,
    athlete_id: athleteId,
    ordinal,
    planned_date: session.date,
    date: date ?? session.date,
    title: sessionTitle(session),
    plan: JSON.stringify(session),
    logged_at: null,
    completed_at: null,
  }));
}

export async function insertSessionRows(db: Db, rows: ReturnType<typeof sessionRows>): Promise<void> {
  for (let i = 0; i < rows.length; i += INSERT_CHUNK) {
    await db.insertInto("training_sessions").values(rows.slice(i, i + INSERT_CHUNK)).execute();
  }
}

async function assignOne(trx: Db, actor: Actor, version: VersionToAssign, athleteId: string, input: AssignInput, onAssigned?: OutcomeHook): Promise<AssignOutcome> {
  const athlete = await requireAthleteFor(trx, actor, athleteId);
  const assignment = await trx
    .insertInto("template_assignments")
    .values({
      template_id: version.templateId,
      version_id: version.id,
      athlete_id: athlete.id,
      assigned_by: actor.id,
      start_date: input.startDate,
      weekdays: input.weekdays,
      auto_regulate: input.autoRegulate,
      ended_at: null,
    })
    .returning("id")
    .executeTakeFirstOrThrow();
  const plan = await planAssignment(trx, { athleteId: athlete.id, athleteName: athlete.name, versionId: version.id, startDate: input.startDate, weekdays: input.weekdays });
  await insertSessionRows(trx, sessionRows(assignment.id, athlete.id, plan.sessions.map((session, ordinal) => ({ ordinal, session }))));
  const outcome: AssignOutcome = {
    athleteId: athlete.id,
    athleteName: athlete.name,
    status: "assigned",
    assignmentId: assignment.id,
    sessions: plan.sessions.length,
    firstDate: plan.sessions[0]?.date ?? null,
    diagnostics: plan.diagnostics,
  };
  // Inside the athlete's transaction, so progress is recorded exactly when the assignment is.
  if (onAssigned) await onAssigned(trx, outcome);
  return outcome;
}

async function athleteName(db: Db, actor: Actor, athleteId: string): Promise<string | null> {
  return (await findAthleteFor(db, actor, athleteId))?.name ?? null;
}

/**
 * Gives a pinned template version to each athlete, one transaction per athlete:
 * the assignment and every dated session land together or not at all, and one
 * athlete's failure leaves the others assigned. Expansion notes (a lift with no
 * max on file, a schedule that ran short) come back per athlete for the UI.
 *
 * Input problems and a version that is not the actor's throw before anything
 * is written; per-athlete problems (not on the roster, a database error) become
 * a failed outcome. `onOutcome` sees each outcome — for an assigned athlete
 * inside that athlete's transaction. Given a transaction, everything runs in it.
 *
 * @example
 * const { outcomes } = await assignTemplate(db, coach, { versionId, athleteIds: [tomasId], startDate: "2027-01-04", weekdays: [] });
 * outcomes[0].status; // "assigned"
 */
export async function assignTemplate(db: Db, actor: Actor, rawInput: unknown, options: { onOutcome?: OutcomeHook } = {}): Promise<AssignResult> {
  const input = checkAssignInput(rawInput);
  const version = await versionToAssign(db, actor, input.versionId);
  const outcomes: AssignOutcome[] = [];
  for (const athleteId of input.athleteIds) {
    let outcome: AssignOutcome;
    try {
      outcome = await inTransaction(db, (trx) => assignOne(trx, actor, version, athleteId, input, options.onOutcome));
    } catch (err) {
      if (!(err instanceof DomainError)) console.error("[ironquill] assignment failed:", err);
      const error =
        err instanceof DomainError
          ? { code: err.code, message: err.message }
          : { code: "internal", message: "This athlete could not be given the template; nothing was saved for them. Try again." };
      outcome = { athleteId, athleteName: await athleteName(db, actor, athleteId).catch(() => null), status: "failed", error };
      if (options.onOutcome) await options.onOutcome(db, outcome);
    }
    outcomes.push(outcome);
  }
  return { version, outcomes };
}

export type AssignmentSummary = {
  id: string;
  athleteId: string;
  templateId: string;
  templateTitle: string;
  version: { id: string; number: number };
  /** The template's newest version, only when the viewer owns the template (and so could upgrade). */
  latestVersion: { id: string; number: number } | null;
  newerVersionAvailable: boolean;
  /** Whether the viewer may end or upgrade it: their own template, their athlete. */
  canManage: boolean;
  startDate: string;
  weekdays: string[];
  status: "active" | "ended";
  autoRegulate: boolean;
  createdAt: Date;
  endedAt: Date | null;
  sessions: { total: number; logged: number; upcoming: number };
  nextSessionDate: string | null;
};

/** Every assignment of an athlete the actor may see, active first, newest start first. */
export async function listAssignments(db: Db, actor: Actor, athleteId: string, options: { today?: string } = {}): Promise<AssignmentSummary[]> {
  const athlete = await requireAthleteFor(db, actor, athleteId);
  const today = options.today ?? todayUtc();
  const rows = await db
    .selectFrom("template_assignments as a")
    .innerJoin("templates as t", "t.id", "a.template_id")
    .innerJoin("template_versions as v", "v.id", "a.version_id")
    .leftJoinLateral(
      (eb) => eb.selectFrom("template_versions as lv").select(["lv.id", "lv.number"]).whereRef("lv.template_id", "=", "a.template_id").orderBy("lv.number", "desc").limit(1).as("lv"),
      (join) => join.onTrue(),
    )
    .leftJoinLateral(
      (eb) =>
        eb
          .selectFrom("training_sessions as s")
          .whereRef("s.assignment_id", "=", "a.id")
          .select([
            sql<string>`count(*)`.as("total"),
            sql<string>`count(*) filter (where s.logged_at is not null or s.completed_at is not null)`.as("logged"),
            sql<string>`count(*) filter (where s.date >= ${today} and s.logged_at is null and s.completed_at is null)`.as("upcoming"),
            sql<string | null>`min(s.date) filter (where s.date >= ${today} and s.logged_at is null and s.completed_at is null)`.as("next_date"),
          ])
          .as("c"),
      (join) => join.onTrue(),
    )
    .select([
      "a.id",
      "a.template_id",
      "a.version_id",
      "a.start_date",
      "a.weekdays",
      "a.status",
      "a.auto_regulate",
      "a.created_at",
      "a.ended_at",
      "t.title",
      "t.owner_id",
      "v.number",
      "lv.id as latest_id",
      "lv.number as latest_number",
      "c.total",
      "c.logged",
      "c.upcoming",
      "c.next_date",
    ])
    .where("a.athlete_id", "=", athlete.id)
    .orderBy(sql`a.status = 'active'`, "desc")
    .orderBy("a.start_date", "desc")
    .orderBy("a.created_at", "desc")
    .execute();
  return rows.map((r) => {
    const owns = r.owner_id === actor.id;
    const latest = owns && r.latest_id !== null && r.latest_number !== null ? { id: r.latest_id, number: r.latest_number } : null;
    return {
      id: r.id,
      athleteId: athlete.id,
      templateId: r.template_id,
      templateTitle: r.title,
      version: { id: r.version_id, number: r.number },
      latestVersion: latest,
      newerVersionAvailable: r.status === "active" && latest !== null && latest.number > r.number,
      canManage: owns,
      startDate: r.start_date,
      weekdays: r.weekdays,
      status: r.status,
      autoRegulate: r.auto_regulate,
      createdAt: r.created_at,
      endedAt: r.ended_at,
      sessions: { total: Number(r.total ?? 0), logged: Number(r.logged ?? 0), upcoming: Number(r.upcoming ?? 0) },
      nextSessionDate: r.next_date ?? null,
    };
  });
}

export type ManagedAssignment = {
  id: string;
  athleteId: string;
  athleteName: string;
  templateId: string;
  templateTitle: string;
  versionId: string;
  versionNumber: number;
  startDate: string;
  weekdays: string[];
  status: "active" | "ended";
};

function assignmentNotFound(): DomainError {
  return new DomainError("not_found", "That assignment does not exist or is not yours to change.");
}

/**
 * An assignment the actor may end or upgrade: the template is theirs and the
 * athlete is theirs (or themself). Anything else answers like a missing one.
 * With `lock` the assignment row is held until the transaction ends.
 */
export async function requireManagedAssignment(db: Db, actor: Actor, assignmentId: string, lock = false): Promise<ManagedAssignment> {
  if (!isUuid(assignmentId)) throw assignmentNotFound();
  if (lock) await db.selectFrom("template_assignments").select("id").where("id", "=", assignmentId).forUpdate().executeTakeFirst();
  const row = await db
    .selectFrom("template_assignments as a")
    .innerJoin("templates as t", "t.id", "a.template_id")
    .innerJoin("template_versions as v", "v.id", "a.version_id")
    .select(["a.id", "a.athlete_id", "a.template_id", "a.version_id", "a.start_date", "a.weekdays", "a.status", "t.title", "t.owner_id", "v.number"])
    .where("a.id", "=", assignmentId)
    .executeTakeFirst();
  if (!row || row.owner_id !== actor.id) throw assignmentNotFound();
  const athlete = await findAthleteFor(db, actor, row.athlete_id);
  if (!athlete) throw assignmentNotFound();
  return {
    id: row.id,
    athleteId: row.athlete_id,
    athleteName: athlete.name,
    templateId: row.template_id,
    templateTitle: row.title,
    versionId: row.version_id,
    versionNumber: row.number,
    startDate: row.start_date,
    weekdays: row.weekdays,
    status: row.status,
  };
}

export type EndResult = { assignmentId: string; status: "ended"; removedSessions: number; keptSessions: number };

/**
 * Ends an assignment: sessions still ahead and never logged go, everything
 * already trained (or missed) stays as history. Ending twice changes nothing.
 */
export async function endAssignment(db: Db, actor: Actor, assignmentId: string, options: { today?: string } = {}): Promise<EndResult> {
  const today = options.today ?? todayUtc();
  return inTransaction(db, async (trx) => {
    const a = await requireManagedAssignment(trx, actor, assignmentId, true);
    let removed = 0;
    if (a.status === "active") {
      const gone = await trx
        .deleteFrom("training_sessions")
        .where("assignment_id", "=", a.id)
        .where("date", ">=", today)
        .where("logged_at", "is", null)
        .where("completed_at", "is", null)
        .executeTakeFirst();
      removed = Number(gone.numDeletedRows);
      const now = new Date();
      await trx.updateTable("template_assignments").set({ status: "ended", ended_at: now, updated_at: now }).where("id", "=", a.id).execute();
    }
    const kept = await trx.selectFrom("training_sessions").select((eb) => eb.fn.countAll<string>().as("n")).where("assignment_id", "=", a.id).executeTakeFirstOrThrow();
    return { assignmentId: a.id, status: "ended" as const, removedSessions: removed, keptSessions: Number(kept.n) };
  });
}
