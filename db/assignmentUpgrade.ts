import "server-only";
import type { ExerciseOut, ExpandDiagnostic, Session, SetOut } from "../lib/load/types";
import type { Actor, Db } from "./athleteAccess";
import { insertSessionRows, type ManagedAssignment, requireManagedAssignment, sessionRows } from "./assignments";
import { DomainError } from "./domainError";
import { planAssignment, sessionTitle, todayUtc } from "./recompute";
import { inTransaction } from "./templateAccess";
import { isUuid } from "./templateRules";

/** What moved for one exercise between the stored plan and the newer version. */
export type ExerciseChange = {
  change: "added" | "removed" | "changed";
  name: string;
  /** The work sets as printed, "4×5 @ 105 kg"; null on the side where the exercise is absent. */
  before: string | null;
  after: string | null;
  /** Which parts differ: sets, reps, load, effort, rest, details (cue, tempo, pause, substitutes). */
  aspects: ("sets" | "reps" | "load" | "effort" | "rest" | "details")[];
};

export type SessionChange = {
  ordinal: number;
  date: string;
  title: string;
  /** The title before, when the session at this place becomes a different day. */
  previousTitle: string | null;
  change: "added" | "removed" | "changed";
  exercises: ExerciseChange[];
};

export type UpgradePreview = {
  assignmentId: string;
  athleteId: string;
  templateTitle: string;
  from: { id: string; number: number };
  to: { id: string; number: number };
  /** Sessions on or after this date that are not logged are rewritten. */
  today: string;
  /** Only sessions that change, in date order. */
  sessions: SessionChange[];
  /** Future sessions the new version leaves exactly as they are. */
  unchanged: number;
  /** Past, logged or completed sessions: never touched. */
  kept: number;
  diagnostics: ExpandDiagnostic[];
};

export type UpgradeResult = {
  assignmentId: string;
  version: { id: string; number: number };
  /** Sessions written from the new version (replacing or adding). */
  rewritten: number;
  /** Future sessions the new version no longer has. */
  dropped: number;
  kept: number;
  diagnostics: ExpandDiagnostic[];
};

const num = (n: number) => String(Math.round(n * 100) / 100);

function repsOf(s: SetOut): string {
  if (s.seconds !== null) return `${s.seconds} s`;
  if (s.repsMin === null) return "?";
  if (s.amrap) return `${s.repsMin}+`;
  return s.repsMax !== null && s.repsMax !== s.repsMin ? `${s.repsMin}–${s.repsMax}` : `${s.repsMin}`;
}

function loadOf(s: SetOut, units: string): string {
  if (s.bodyweight) return s.load ? `BW + ${num(s.load)} ${units}` : "BW";
  return s.load === null ? "no load" : `${num(s.load)} ${units}`;
}

/**
 * The work sets of an exercise in one line: equal consecutive sets collapse,
 * "4×5 @ 105 kg", "3×8–12 @ no load", "2×5 @ 100 kg, 1×5+ @ 100 kg".
 * @example describeWork(exercise, "kg"); // "4×5 @ 105 kg"
 */
export function describeWork(ex: ExerciseOut, units: string): string {
  const work = ex.sets.filter((s) => s.kind === "work");
  const groups: { count: number; text: string }[] = [];
  for (const s of work) {
    const text = `${repsOf(s)} @ ${loadOf(s, units)}`;
    const last = groups.at(-1);
    if (last && last.text === text) last.count++;
    else groups.push({ count: 1, text });
  }
  return groups.length === 0 ? "no work sets" : groups.map((g) => `${g.count}×${g.text}`).join(", ");
}

function aspectsOf(a: ExerciseOut, b: ExerciseOut): ExerciseChange["aspects"] {
  const wa = a.sets.filter((s) => s.kind === "work");
  const wb = b.sets.filter((s) => s.kind === "work");
  const out: ExerciseChange["aspects"] = [];
  // One more set of the same 5 reps is a change of sets only: reps and loads compare as the values used.
  const distinct = (values: string[]) => [...new Set(values)].sort().join("|");
  if (wa.length !== wb.length) out.push("sets");
  if (distinct(wa.map(repsOf)) !== distinct(wb.map(repsOf))) out.push("reps");
  const loads = (sets: SetOut[]) => distinct(sets.map((s) => `${s.kind}:${s.bodyweight}:${s.load}`));
  if (loads(a.sets) !== loads(b.sets)) out.push("load");
  if (a.effort !== b.effort) out.push("effort");
  if (a.restSeconds !== b.restSeconds) out.push("rest");
  const details = (e: ExerciseOut) => JSON.stringify([e.cue, e.tempo, e.pauseSeconds, e.label, e.substitutes.map((s) => [s.name, s.sets.map((x) => [x.repsMin, x.repsMax, x.load])])]);
  if (details(a) !== details(b)) out.push("details");
  return out;
}

/** Exercises are matched by name and, when a name repeats in a day, by its turn. */
function keyed(exercises: readonly ExerciseOut[]): Map<string, ExerciseOut> {
  const seen = new Map<string, number>();
  const out = new Map<string, ExerciseOut>();
  for (const ex of exercises) {
    const name = ex.name.toLowerCase();
    const n = seen.get(name) ?? 0;
    seen.set(name, n + 1);
    out.set(`${name}#${n}`, ex);
  }
  return out;
}

/**
 * Exercise by exercise, what a session becomes: added and removed exercises,
 * and for the ones on both sides which of sets, reps, load, effort, rest or
 * details moved. Unchanged exercises are left out.
 *
 * @example
 * compareSessions(storedPlan, newPlan); // [{ change: "changed", name: "lateral raise", before: "3×15 @ 6 kg", after: "4×15 @ 6 kg", aspects: ["sets"] }]
 */
export function compareSessions(before: Session | null, after: Session | null): ExerciseChange[] {
  const a = keyed(before?.exercises ?? []);
  const b = keyed(after?.exercises ?? []);
  const unitsA = before?.units ?? "";
  const unitsB = after?.units ?? "";
  const out: ExerciseChange[] = [];
  for (const [key, ex] of b) {
    const old = a.get(key);
    if (!old) {
      out.push({ change: "added", name: ex.name, before: null, after: describeWork(ex, unitsB), aspects: [] });
      continue;
    }
    const aspects = aspectsOf(old, ex);
    if (aspects.length > 0) out.push({ change: "changed", name: ex.name, before: describeWork(old, unitsA), after: describeWork(ex, unitsB), aspects });
  }
  for (const [key, ex] of a) {
    if (!b.has(key)) out.push({ change: "removed", name: ex.name, before: describeWork(ex, unitsA), after: null, aspects: [] });
  }
  return out;
}

type Target = { id: string; number: number };

async function newerVersion(db: Db, a: ManagedAssignment, versionId: string): Promise<Target> {
  const row = isUuid(versionId)
    ? await db.selectFrom("template_versions").select(["id", "number"]).where("id", "=", versionId).where("template_id", "=", a.templateId).executeTakeFirst()
    : undefined;
  if (!row) throw new DomainError("invalid_input", "versionId: pick a version of the same template.", { versionId: "No such version of this template" });
  if (row.number <= a.versionNumber) {
    throw new DomainError("invalid_input", `versionId: pick a version newer than ${a.versionNumber}.`, { versionId: `The athlete is on version ${a.versionNumber}; pick a newer one` });
  }
  return { id: row.id, number: row.number };
}

type StoredRow = { id: string; ordinal: number; date: string; planned_date: string; title: string; plan: Session; open: boolean };

type Computed = {
  target: Target;
  rows: StoredRow[];
  open: StoredRow[];
  inserts: { ordinal: number; session: Session; date: string }[];
  diagnostics: ExpandDiagnostic[];
};

/**
 * The rewrite an upgrade makes. Rows that are past, logged or completed stay;
 * every other row is replaced by the new version's session at the same place
 * (ordinal), when that session is not already in the past. A session the
 * athlete moved keeps its new date as long as the new version plans it on the
 * same day as before.
 */
async function computeUpgrade(db: Db, a: ManagedAssignment, versionId: string, today: string, lock: boolean): Promise<Computed> {
  if (a.status !== "active") throw new DomainError("conflict", "That assignment has ended; assign the template again instead.");
  const target = await newerVersion(db, a, versionId);
  let q = db
    .selectFrom("training_sessions")
    .select(["id", "ordinal", "date", "planned_date", "title", "plan", "logged_at", "completed_at"])
    .where("assignment_id", "=", a.id)
    .orderBy("ordinal");
  if (lock) q = q.forUpdate();
  const rows: StoredRow[] = (await q.execute()).map((r) => ({
    id: r.id,
    ordinal: r.ordinal,
    date: r.date,
    planned_date: r.planned_date,
    title: r.title,
    plan: r.plan,
    open: r.date >= today && r.logged_at === null && r.completed_at === null,
  }));
  const open = rows.filter((r) => r.open);
  const keptOrdinals = new Set(rows.filter((r) => !r.open).map((r) => r.ordinal));
  const openByOrdinal = new Map(open.map((r) => [r.ordinal, r]));
  const plan = await planAssignment(db, { athleteId: a.athleteId, athleteName: a.athleteName, versionId: target.id, startDate: a.startDate, weekdays: a.weekdays });
  const inserts: Computed["inserts"] = [];
  plan.sessions.forEach((session, ordinal) => {
    if (keptOrdinals.has(ordinal)) return;
    const old = openByOrdinal.get(ordinal);
    const moved = old && old.date !== old.planned_date && old.planned_date === session.date;
    const date = moved ? old.date : session.date;
    if (date < today) return;
    inserts.push({ ordinal, session, date });
  });
  return { target, rows, open, inserts, diagnostics: plan.diagnostics };
}

/**
 * What upgrading an assignment to a newer version of its template would change,
 * session by session, without changing anything. Only sessions still ahead and
 * unlogged are compared; trained history is counted, never rewritten.
 *
 * @example
 * const p = await previewUpgrade(db, coach, assignmentId, v2Id);
 * p.sessions[0].exercises; // [{ change: "changed", name: "lateral raise", before: "3×15 @ 6 kg", after: "4×15 @ 6 kg", aspects: ["sets"] }]
 */
export async function previewUpgrade(db: Db, actor: Actor, assignmentId: string, newVersionId: string, options: { today?: string } = {}): Promise<UpgradePreview> {
  const today = options.today ?? todayUtc();
  const a = await requireManagedAssignment(db, actor, assignmentId);
  const c = await computeUpgrade(db, a, newVersionId, today, false);
  const openByOrdinal = new Map(c.open.map((r) => [r.ordinal, r]));
  const insertByOrdinal = new Map(c.inserts.map((i) => [i.ordinal, i]));
  const ordinals = [...new Set([...openByOrdinal.keys(), ...insertByOrdinal.keys()])];
  const sessions: SessionChange[] = [];
  let unchanged = 0;
  for (const ordinal of ordinals) {
    const old = openByOrdinal.get(ordinal) ?? null;
    const next = insertByOrdinal.get(ordinal) ?? null;
    const exercises = compareSessions(old?.plan ?? null, next?.session ?? null);
    const title = next ? sessionTitle(next.session) : old!.title;
    const previousTitle = old && next && old.title !== title ? old.title : null;
    const moved = old !== null && next !== null && old.date !== next.date;
    if (old && next && exercises.length === 0 && previousTitle === null && !moved) {
      unchanged++;
      continue;
    }
    sessions.push({ ordinal, date: next?.date ?? old!.date, title, previousTitle, change: !old ? "added" : !next ? "removed" : "changed", exercises });
  }
  sessions.sort((x, y) => (x.date < y.date ? -1 : x.date > y.date ? 1 : x.ordinal - y.ordinal));
  return {
    assignmentId: a.id,
    athleteId: a.athleteId,
    templateTitle: a.templateTitle,
    from: { id: a.versionId, number: a.versionNumber },
    to: c.target,
    today,
    sessions,
    unchanged,
    kept: c.rows.length - c.open.length,
    diagnostics: c.diagnostics,
  };
}

/**
 * Repoints the assignment at the newer version and rewrites its sessions still
 * ahead and unlogged, in one transaction. Past, logged and completed sessions
 * keep their plans exactly as they were trained.
 */
export async function applyUpgrade(db: Db, actor: Actor, assignmentId: string, newVersionId: string, options: { today?: string } = {}): Promise<UpgradeResult> {
  const today = options.today ?? todayUtc();
  return inTransaction(db, async (trx) => {
    const a = await requireManagedAssignment(trx, actor, assignmentId, true);
    const c = await computeUpgrade(trx, a, newVersionId, today, true);
    if (c.open.length > 0) await trx.deleteFrom("training_sessions").where("id", "in", c.open.map((r) => r.id)).execute();
    await insertSessionRows(trx, sessionRows(a.id, a.athleteId, c.inserts));
    await trx.updateTable("template_assignments").set({ version_id: c.target.id, updated_at: new Date() }).where("id", "=", a.id).execute();
    const written = new Set(c.inserts.map((i) => i.ordinal));
    const dropped = c.open.filter((r) => !written.has(r.ordinal)).length;
    return { assignmentId: a.id, version: c.target, rewritten: c.inserts.length, dropped, kept: c.rows.length - c.open.length, diagnostics: c.diagnostics };
  });
}
