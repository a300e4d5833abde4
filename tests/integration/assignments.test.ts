import { sql, type Kysely } from "kysely";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import type { Database } from "../../db/database";
import { domainFailure } from "../support/failures";
import { addPerson, migratedScratchDb, type Person } from "../support/people";
import { get, params, post } from "../support/requests";

// The handlers ask for the session and the pool themselves; both are swapped here.
const h = vi.hoisted(() => ({
  db: null as unknown as Kysely<Database>,
  viewer: null as null | Person,
}));
vi.mock("@/server/auth", () => ({ getViewer: async () => h.viewer }));
vi.mock("@/db/client", async (importOriginal) => ({ ...(await importOriginal<object>()), getDb: () => h.db }));

const { assignTemplate, endAssignment, listAssignments } = await import("../../db/assignments");
const { applyUpgrade, previewUpgrade } = await import("../../db/assignmentUpgrade");
const { createTemplate } = await import("../../db/templates");
const { saveVersion } = await import("../../db/templateVersions");
const { insertVersion, programmeForVersion } = await import("../../db/templateVersions");
const { exerciseKey } = await import("../../lib/exercises/resolve");
const assignments = await import("../../app/api/assignments/route");
const upgradeRoute = await import("../../app/api/assignments/[id]/upgrade/route");

type Actor = { id: string; role: "coach" | "athlete" };

// Two weeks, two tagged days: four sessions. 2027-01-04 is a Monday (ISO 8601 week 2027-W01).
const V1 = `title: Assign test
units: kg
block Base 2w
day A mon
  back squat 3x5 @75%
  bench press 3x5 @75%
day B thu
  deadlift 3x5 @75%
  lateral raise 3x15 6kg
`;
const V2 = V1.replace("bench press 3x5", "bench press 4x5").replace("  lateral raise 3x15 6kg\n", "  leg curl 3x12 40kg\n");
const START = "2027-01-04";

describe("assigning template versions to athletes", () => {
  let scratch: Awaited<ReturnType<typeof migratedScratchDb>>;
  let db: Kysely<Database>;
  let coach: Person;
  let sky: Person;
  const ids = {} as Record<"tomas" | "maya" | "lena" | "skyAthlete" | "solo", string>;
  let v1: string;
  let v2: string;

  const sessionsOf = (assignmentId: string) =>
    db.selectFrom("training_sessions").selectAll().where("assignment_id", "=", assignmentId).orderBy("ordinal").execute();

  beforeAll(async () => {
    scratch = await migratedScratchDb();
    db = scratch.db;
    h.db = db;
    const user = async (email: string, role: Person["role"], coachId: string | null = null) => addPerson(db, email, email.split("@")[0], role, coachId);
    coach = await user("rowan@a.test", "coach");
    sky = await user("sky@a.test", "coach");
    ids.tomas = (await user("tomas@a.test", "athlete", coach.id)).id;
    ids.maya = (await user("maya@a.test", "athlete", coach.id)).id;
    ids.lena = (await user("lena@a.test", "athlete", coach.id)).id;
    ids.skyAthlete = (await user("ira@a.test", "athlete", sky.id)).id;
    ids.solo = (await user("solo@a.test", "athlete")).id;
    await db
      .insertInto("athlete_profiles")
      .values({ user_id: ids.tomas, units: "kg", bodyweight: 82, bar: 20, plates: JSON.stringify([25, 20, 15, 10, 5, 2.5, 1.25]), dumbbell_step: 2, machine_step: 5, preset: "kg-club", updated_by: coach.id })
      .execute();
    const max = (athleteId: string, exercise: string, value: number) => ({
      athlete_id: athleteId, exercise, exercise_key: exerciseKey(exercise), kind: "1rm" as const, value, units: "kg" as const,
      measured_on: "2026-12-01", source: "tested" as const, note: null, created_by: coach.id,
    });
    await db.insertInto("athlete_maxes").values([max(ids.tomas, "back squat", 140), max(ids.tomas, "bench press", 100)]).execute();
    const t = await createTemplate(db, coach, { title: "Assign test", source: V1 });
    v1 = t.version.id;
    v2 = (await saveVersion(db, coach, t.id, { source: V2 })).version.id;
  });
  afterAll(async () => {
    await scratch?.drop();
  });

  it("creates one dated session per programme day with loads worked from the athlete's maxes", async () => {
    const { outcomes } = await assignTemplate(db, coach, { versionId: v1, athleteIds: [ids.tomas], startDate: START, weekdays: [] });
    const o = outcomes[0];
    if (o.status !== "assigned") throw new Error(JSON.stringify(o));
    expect(o.sessions).toBe(4);
    const rows = await sessionsOf(o.assignmentId);
    expect(rows.map((r) => [r.ordinal, r.date, r.planned_date, r.title])).toEqual([
      [0, "2027-01-04", "2027-01-04", "A · Base week 1"],
      [1, "2027-01-07", "2027-01-07", "B · Base week 1"],
      [2, "2027-01-11", "2027-01-11", "A · Base week 2"],
      [3, "2027-01-14", "2027-01-14", "B · Base week 2"],
    ]);
    const squat = rows[0].plan.exercises[0].sets.filter((s) => s.kind === "work");
    expect(squat).toHaveLength(3);
    // 75 % × 140 kg = 105 kg, arithmetic from the profile; 105 is itself a loadable weight, so the
    // nearest-achievable rounding (lib/load/README.md, "rounding") leaves it as is.
    expect(squat[0].load).toBe(105);
    // (105 − 20 kg bar) / 2 = 42.5 kg a side; fewest plates, heaviest first: 25 + 15 + 2.5 (arithmetic).
    expect(squat[0].perSide).toEqual([25, 15, 2.5]);
    // 75 % × 100 kg = 75 kg; (75 − 20) / 2 = 27.5 a side = 25 + 2.5 (arithmetic).
    const bench = rows[0].plan.exercises[1].sets.find((s) => s.kind === "work");
    expect([bench?.load, bench?.perSide]).toEqual([75, [25, 2.5]]);
    // No deadlift max on file: the load stays empty and the caller hears why.
    expect(rows[1].plan.exercises[0].sets.every((s) => s.load === null)).toBe(true);
    expect(o.diagnostics).toContainEqual(expect.objectContaining({ code: "no-max", message: expect.stringMatching(/deadlift/) }));
  });

  it("keeps a second active assignment alongside the first", async () => {
    await assignTemplate(db, coach, { versionId: v1, athleteIds: [ids.tomas], startDate: "2027-03-01", weekdays: [] });
    const list = await listAssignments(db, coach, ids.tomas, { today: "2027-01-01" });
    expect(list.map((a) => [a.status, a.startDate, a.version.number, a.newerVersionAvailable])).toEqual([
      ["active", "2027-03-01", 1, true],
      ["active", START, 1, true],
    ]);
    expect(list[1].sessions).toEqual({ total: 4, logged: 0, upcoming: 4 });
  });

  it("gives each athlete their own transaction: one failing leaves the others assigned and itself untouched", async () => {
    // A database error half-way through Maya's sessions (after her assignment row was written).
    await sql`create function fail_for_maya() returns trigger language plpgsql as $$ begin
      if new.athlete_id = ${sql.lit(ids.maya)}::uuid then raise exception 'disk on fire'; end if; return new; end $$`.execute(db);
    await sql`create trigger fail_for_maya before insert on training_sessions for each row execute function fail_for_maya()`.execute(db);
    try {
      const { outcomes } = await assignTemplate(db, coach, { versionId: v1, athleteIds: [ids.lena, ids.maya, ids.skyAthlete], startDate: START, weekdays: [] });
      expect(outcomes.map((o) => [o.athleteId, o.status])).toEqual([
        [ids.lena, "assigned"],
        [ids.maya, "failed"],
        [ids.skyAthlete, "failed"],
      ]);
      expect(outcomes[2]).toMatchObject({ error: { code: "not_found" } });
    } finally {
      await sql`drop trigger fail_for_maya on training_sessions; drop function fail_for_maya()`.execute(db);
    }
    const count = async (table: "template_assignments" | "training_sessions", athleteId: string) =>
      Number((await db.selectFrom(table).select((eb) => eb.fn.countAll<string>().as("n")).where("athlete_id", "=", athleteId).executeTakeFirstOrThrow()).n);
    expect(await count("template_assignments", ids.lena)).toBe(1);
    expect(await count("training_sessions", ids.lena)).toBe(4);
    expect(await count("template_assignments", ids.maya)).toBe(0);
    expect(await count("template_assignments", ids.skyAthlete)).toBe(0);
  });

  it("answers not_found when another coach uses my template, or I assign to their athlete", async () => {
    const theirs = await domainFailure(assignTemplate(db, sky, { versionId: v1, athleteIds: [ids.skyAthlete], startDate: START, weekdays: [] }));
    expect(theirs.code).toBe("not_found");
    h.viewer = sky;
    const viaRoute = await assignments.POST(post("/api/assignments", { versionId: v1, athleteIds: [ids.skyAthlete], startDate: START }));
    expect(viaRoute.status).toBe(404);
    h.viewer = coach;
    const notMine = await assignments.POST(post("/api/assignments", { versionId: v1, athleteIds: [ids.skyAthlete], startDate: START }));
    expect(notMine.status).toBe(404);
    expect((await notMine.json()).error.fields).toHaveProperty("athleteIds.0");
    h.viewer = sky;
    const list = await assignments.GET(get(`/api/assignments?athleteId=${ids.tomas}`));
    expect(list.status).toBe(404);
  });

  it("lets a self-coached athlete give their own template to themself, and nobody else", async () => {
    const source = "title: Mine\nday A mon\n  back squat 3x5 @75%\n";
    const version = await db.transaction().execute(async (trx) => {
      const t = await trx.insertInto("templates").values({ owner_id: ids.solo, title: "Mine", description: "", tags: [], visibility: "private", archived_at: null, forked_from_version_id: null }).returning("id").executeTakeFirstOrThrow();
      return insertVersion(trx, { templateId: t.id, authorId: ids.solo, number: 1, source, model: programmeForVersion(source), note: null });
    });
    const solo: Actor = { id: ids.solo, role: "athlete" };
    const self = await assignTemplate(db, solo, { versionId: version.id, athleteIds: [ids.solo], startDate: START, weekdays: [] });
    expect(self.outcomes[0]).toMatchObject({ status: "assigned", sessions: 1 });
    const other = await assignTemplate(db, solo, { versionId: version.id, athleteIds: [ids.lena], startDate: START, weekdays: [] });
    expect(other.outcomes[0]).toMatchObject({ status: "failed", error: { code: "not_found" } });
    // A coach's template is not the athlete's to hand out, even to themself.
    const coached: Actor = { id: ids.tomas, role: "athlete" };
    expect((await domainFailure(assignTemplate(db, coached, { versionId: v1, athleteIds: [ids.tomas], startDate: START, weekdays: [] }))).code).toBe("not_found");
  });

  it("previews an upgrade session by session and applies it without touching past or logged sessions", async () => {
    const made = await assignTemplate(db, coach, { versionId: v1, athleteIds: [ids.tomas], startDate: START, weekdays: [] });
    const id = made.outcomes[0].status === "assigned" ? made.outcomes[0].assignmentId : "";
    const today = "2027-01-07";
    // Thursday's session was logged today; Monday's is past and was missed.
    await db.updateTable("training_sessions").set({ logged_at: new Date() }).where("assignment_id", "=", id).where("ordinal", "=", 1).execute();
    const before = await sessionsOf(id);

    const preview = await previewUpgrade(db, coach, id, v2, { today });
    expect([preview.from.number, preview.to.number, preview.kept, preview.unchanged]).toEqual([1, 2, 2, 0]);
    expect(preview.sessions.map((s) => [s.ordinal, s.date, s.change])).toEqual([
      [2, "2027-01-11", "changed"],
      [3, "2027-01-14", "changed"],
    ]);
    expect(preview.sessions[0].exercises).toEqual([{ change: "changed", name: "bench press", before: "3×5 @ 75 kg", after: "4×5 @ 75 kg", aspects: ["sets"] }]);
    expect(preview.sessions[1].exercises.map((e) => [e.change, e.name])).toEqual([
      ["added", "leg curl"],
      ["removed", "lateral raise"],
    ]);
    expect(await sessionsOf(id)).toEqual(before);

    const older = await domainFailure(previewUpgrade(db, coach, id, v1, { today }));
    expect([older.code, Object.keys(older.fields)]).toEqual(["invalid_input", ["versionId"]]);
    expect((await domainFailure(previewUpgrade(db, sky, id, v2, { today }))).code).toBe("not_found");

    const applied = await applyUpgrade(db, coach, id, v2, { today });
    expect([applied.version.number, applied.rewritten, applied.dropped, applied.kept]).toEqual([2, 2, 0, 2]);
    const after = await sessionsOf(id);
    expect(after.slice(0, 2)).toEqual(before.slice(0, 2));
    expect(after[2].plan.exercises[1].sets.filter((s) => s.kind === "work")).toHaveLength(4);
    expect(after[3].plan.exercises.map((e) => e.name)).toEqual(["deadlift", "leg curl"]);
    const row = await db.selectFrom("template_assignments").select("version_id").where("id", "=", id).executeTakeFirstOrThrow();
    expect(row.version_id).toBe(v2);
  });

  it("ends an assignment: sessions ahead and unlogged go, logged and past ones stay", async () => {
    const made = await assignTemplate(db, coach, { versionId: v1, athleteIds: [ids.maya], startDate: START, weekdays: [] });
    const id = made.outcomes[0].status === "assigned" ? made.outcomes[0].assignmentId : "";
    await db.updateTable("training_sessions").set({ logged_at: new Date() }).where("assignment_id", "=", id).where("ordinal", "=", 2).execute();
    expect((await domainFailure(endAssignment(db, sky, id, { today: "2027-01-08" }))).code).toBe("not_found");
    const ended = await endAssignment(db, coach, id, { today: "2027-01-08" });
    expect([ended.removedSessions, ended.keptSessions]).toEqual([1, 3]);
    expect((await sessionsOf(id)).map((r) => r.ordinal)).toEqual([0, 1, 2]);
    const again = await endAssignment(db, coach, id, { today: "2027-01-08" });
    expect(again.removedSessions).toBe(0);
    const [listed] = await listAssignments(db, coach, ids.maya);
    expect([listed.status, listed.newerVersionAvailable, listed.sessions.logged]).toEqual(["ended", false, 1]);
  });

  it("answers bad input with 422 naming each field", async () => {
    h.viewer = coach;
    const res = await assignments.POST(post("/api/assignments", { versionId: "v1", athleteIds: [], startDate: "2027-02-30", weekdays: ["mon", "funday"], autoRegulate: "yes" }));
    expect(res.status).toBe(422);
    const { error } = await res.json();
    expect(error.code).toBe("invalid_input");
    expect(Object.keys(error.fields).sort()).toEqual(["athleteIds", "autoRegulate", "startDate", "versionId", "weekdays.1"]);
    const noAthlete = await assignments.GET(get("/api/assignments"));
    expect(noAthlete.status).toBe(422);
    expect((await noAthlete.json()).error.fields).toHaveProperty("athleteId");
    const noVersion = await upgradeRoute.GET(get("/api/assignments/x/upgrade"), params({ id: "x" }));
    expect(noVersion.status).toBe(422);
    expect((await noVersion.json()).error.fields).toHaveProperty("versionId");
  });

  it("assigns one athlete inline through the route and answers the job shape", async () => {
    h.viewer = coach;
    const res = await assignments.POST(post("/api/assignments", { versionId: v2, athleteIds: [ids.lena], startDate: "2027-02-01", weekdays: [] }));
    expect(res.status).toBe(201);
    const { job } = await res.json();
    expect(job).toMatchObject({ id: null, kind: "bulk-assign", status: "done", total: 1, done: 1, failed: 0 });
    expect(job.result.outcomes[0]).toMatchObject({ athleteId: ids.lena, status: "assigned", sessions: 4 });
    const list = await (await assignments.GET(get(`/api/assignments?athleteId=${ids.lena}`))).json();
    expect(list.assignments[0]).toMatchObject({ startDate: "2027-02-01", version: { number: 2 }, newerVersionAvailable: false });
  });
});
