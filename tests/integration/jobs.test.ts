import { sql, type Kysely } from "kysely";
import type PgBoss from "pg-boss";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import type { Database } from "../../db/database";
import { createUser } from "../../db/users";
import { pause, startScratchBoss, stopBoss } from "../support/boss";
import { addPerson, migratedScratchDb, type Person } from "../support/people";
import { params, post } from "../support/requests";

// The handlers ask for the session, the pool and the queue themselves; all three are swapped here.
const h = vi.hoisted(() => ({
  db: null as unknown as Kysely<Database>,
  viewer: null as null | Person,
  boss: null as unknown as PgBoss,
}));
vi.mock("@/server/auth", () => ({ getViewer: async () => h.viewer }));
vi.mock("@/db/client", async (importOriginal) => ({ ...(await importOriginal<object>()), getDb: () => h.db }));
vi.mock("@/server/jobs/boss", async (importOriginal) => ({
  ...(await importOriginal<object>()),
  getBoss: async () => h.boss,
  guardedBoss: async () => h.boss,
}));

const { createTemplate } = await import("../../db/templates");
const { createJobRun, loadJobRun } = await import("../../db/jobs");
const { handleBulkAssign } = await import("../../server/jobs/bulkAssign");
const { registerWorkers } = await import("../../server/jobs/worker");
const assignments = await import("../../app/api/assignments/route");
const jobRoute = await import("../../app/api/jobs/[id]/route");

const SOURCE = "title: Bulk test\nblock Base 2w\nday A\n  back squat 3x5 @75%\nday B\n  deadlift 3x5 @75%\n";

describe("bulk assignment as a background job", () => {
  let scratch: Awaited<ReturnType<typeof migratedScratchDb>>;
  let db: Kysely<Database>;
  let coach: Person;
  let sky: Person;
  let athletes: string[];
  let versionId: string;

  const assignmentCount = async (athleteId: string) =>
    Number((await db.selectFrom("template_assignments").select((eb) => eb.fn.countAll<string>().as("n")).where("athlete_id", "=", athleteId).executeTakeFirstOrThrow()).n);

  beforeAll(async () => {
    scratch = await migratedScratchDb();
    db = scratch.db;
    h.db = db;
    coach = await addPerson(db, "rowan@j.test", "rowan", "coach");
    sky = await addPerson(db, "sky@j.test", "sky", "coach");
    athletes = [];
    for (const n of ["a1", "a2", "a3", "a4", "a5"]) athletes.push((await addPerson(db, `${n}@j.test`, n, "athlete", coach.id)).id);
    versionId = (await createTemplate(db, coach, { title: "Bulk test", source: SOURCE })).version.id;
  });
  afterAll(async () => {
    await stopBoss(h.boss);
    await scratch?.drop();
  });

  it("works a run athlete by athlete, counting each outcome, and carries on after a crash without assigning twice", async () => {
    const [a1, a2, a3] = athletes;
    const payload = { versionId, athleteIds: [a1, a2, a3], startDate: "2027-01-04", weekdays: ["tue", "fri"], autoRegulate: false };
    const run = await createJobRun(db, { kind: "bulk-assign", requestedBy: coach.id, total: 3, payload });
    // a2 left the roster after the run was queued: that athlete fails, the others go ahead.
    await db.updateTable("users").set({ coach_id: null }).where("id", "=", a2).execute();
    await handleBulkAssign(db, { jobRunId: run.id });

    const done = await loadJobRun(db, run.id);
    expect(done).toMatchObject({ status: "done", total: 3, done: 2, failed: 1 });
    const outcomes = (done?.result?.outcomes ?? []) as { athleteId: string; status: string; sessions?: number }[];
    expect(outcomes.map((o) => [o.athleteId, o.status])).toEqual([
      [a1, "assigned"],
      [a2, "failed"],
      [a3, "assigned"],
    ]);
    // Untagged days take the weekdays given, in order: Day A on Tuesday, Day B on Friday.
    const dates = await db.selectFrom("training_sessions").select("date").where("athlete_id", "=", a1).orderBy("ordinal").execute();
    expect(dates.map((d) => d.date)).toEqual(["2027-01-05", "2027-01-08", "2027-01-12", "2027-01-15"]);

    // As if the worker died before marking the run finished: a retry finds every athlete recorded.
    await db.updateTable("job_runs").set({ status: "running", finished_at: null }).where("id", "=", run.id).execute();
    await handleBulkAssign(db, { jobRunId: run.id });
    expect([await assignmentCount(a1), await assignmentCount(a2), await assignmentCount(a3)]).toEqual([1, 0, 1]);
    expect(await loadJobRun(db, run.id)).toMatchObject({ status: "done", done: 2, failed: 1 });
    await db.updateTable("users").set({ coach_id: coach.id }).where("id", "=", a2).execute();
  });

  it("fails the run as a whole when the template is no longer the requester's", async () => {
    const run = await createJobRun(db, { kind: "bulk-assign", requestedBy: sky.id, total: 1, payload: { versionId, athleteIds: [athletes[0]], startDate: "2027-01-04" } });
    await handleBulkAssign(db, { jobRunId: run.id });
    expect(await loadJobRun(db, run.id)).toMatchObject({ status: "failed", done: 0, error: expect.stringMatching(/not yours/) });
  });

  it("queues several athletes through the route and a real pg-boss worker, reporting progress to the requester only", async () => {
    h.boss = await startScratchBoss(scratch);
    await registerWorkers(h.boss, db, { pollingIntervalSeconds: 0.5 });
    const [, , , a4, a5] = athletes;
    h.viewer = coach;
    const res = await assignments.POST(post("/api/assignments", { versionId, athleteIds: [a4, a5], startDate: "2027-01-04" }));
    expect(res.status).toBe(202);
    const { job } = await res.json();
    expect(job).toMatchObject({ kind: "bulk-assign", total: 2, done: 0, failed: 0 });
    expect(["queued", "running", "done"]).toContain(job.status);

    h.viewer = sky;
    expect((await jobRoute.GET(new Request("http://ironquill.test"), params({ id: job.id }))).status).toBe(404);

    h.viewer = coach;
    const seen: number[] = [];
    let last = job;
    // Waits for the worker (polling every half second); gives up after a generous bound rather than timing anything.
    for (let i = 0; i < 120 && last.status !== "done" && last.status !== "failed"; i++) {
      await pause(250);
      const r = await jobRoute.GET(new Request("http://ironquill.test"), params({ id: job.id }));
      expect(r.status).toBe(200);
      last = (await r.json()).job;
      seen.push(last.done);
    }
    expect(last).toMatchObject({ status: "done", total: 2, done: 2, failed: 0, error: null });
    expect(last.result.outcomes.map((o: { athleteId: string; status: string }) => [o.athleteId, o.status])).toEqual([
      [a4, "assigned"],
      [a5, "assigned"],
    ]);
    // Progress only ever grows.
    expect(seen).toEqual([...seen].sort((x, y) => x - y));
    expect([await assignmentCount(a4), await assignmentCount(a5)]).toEqual([1, 1]);
    // The queue's own record says completed, not failed or retried; pg-boss marks it just after the handler returns.
    let states: string[] = [];
    for (let i = 0; i < 40 && !(states.length === 1 && states[0] !== "active"); i++) {
      states = (await sql<{ state: string }>`select state from pgboss.job where name = 'bulk-assign'`.execute(db)).rows.map((r) => r.state);
      if (states[0] === "active") await pause(250);
    }
    expect(states).toEqual(["completed"]);
  });

  it("refuses to queue when any athlete is not on the roster, naming which", async () => {
    h.viewer = sky;
    const otherCoach = await assignments.POST(post("/api/assignments", { versionId, athleteIds: athletes.slice(0, 2), startDate: "2027-01-04" }));
    expect(otherCoach.status).toBe(404);
    h.viewer = coach;
    const stranger = (await createUser(db, { email: "x@j.test", name: "x", passwordHash: "h", role: "athlete", coachId: sky.id }))!.id;
    const res = await assignments.POST(post("/api/assignments", { versionId, athleteIds: [athletes[0], stranger], startDate: "2027-01-04" }));
    expect(res.status).toBe(404);
    expect(Object.keys((await res.json()).error.fields)).toEqual(["athleteIds.1"]);
    const runs = await db.selectFrom("job_runs").select("id").where("requested_by", "=", coach.id).execute();
    expect(runs).toHaveLength(2);
  });
});
