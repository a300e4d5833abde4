import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import type { Kysely } from "kysely";
import type { Database } from "../../db/database";
import { addPerson, migratedScratchDb, type Person } from "../support/people";
import { params, request } from "../support/requests";
import { addTestedMaxes, assignWithSessions } from "../support/training";

// The handlers ask for the session and the pool themselves; both are swapped here.
const h = vi.hoisted(() => ({
  db: null as unknown as Kysely<Database>,
  viewer: null as null | Person,
}));
vi.mock("@/server/auth", () => ({ getViewer: async () => h.viewer }));
vi.mock("@/db/client", async (importOriginal) => ({ ...(await importOriginal<object>()), getDb: () => h.db }));

const { createTemplate } = await import("../../db/templates");
const { todayUtc } = await import("../../db/recompute");
const { sessionSummary } = await import("../../db/progress");
const { addDays } = await import("../../lib/dates/date");
const { isoMonday } = await import("../../lib/progress/attention");
const logRoute = await import("../../app/api/sessions/[id]/log/route");
const setsRoute = await import("../../app/api/sessions/[id]/log/sets/route");
const exercisesRoute = await import("../../app/api/sessions/[id]/log/exercises/route");
const finishRoute = await import("../../app/api/sessions/[id]/log/finish/route");

const SOURCE = (model: string) => `title: Log test
units: kg
model: ${model}

block Base 4w
day A mon
  back squat 3x5 @75% ramp 50/70%
  cable row 3x10 @1rir or machine row
day B thu
  bench press 3x5 @80%
`;

/** A coach's template assigned to an athlete from two weeks back, with the sessions stored as assignment would. */
/** A coach's template assigned to an athlete from two weeks back, with the sessions stored as assignment would. */
async function assign(db: Kysely<Database>, coach: Person, athlete: Person, model: string, maxes: Record<string, number>) {
  const template = await createTemplate(db, coach, { title: `T ${athlete.name}`, source: SOURCE(model) });
  await addTestedMaxes(db, coach.id, athlete.id, maxes, addDays(todayUtc(), -60), (exercise) => exercise.replace(/ /g, "-"));
  const { plan, rows } = await assignWithSessions(db, { template, athlete, coachId: coach.id, start: addDays(isoMonday(todayUtc()), -14) });
  return { sessions: rows, plan };
}

describe("logging a session", () => {
  let scratch: Awaited<ReturnType<typeof migratedScratchDb>>;
  let coach: Person, tomas: Person, maya: Person, lena: Person;
  let session: string;
  let epleySession: string;

  beforeAll(async () => {
    scratch = await migratedScratchDb();
    h.db = scratch.db;
    coach = await addPerson(scratch.db, "coach@l.test", "Rowan", "coach");
    tomas = await addPerson(scratch.db, "tomas@l.test", "Tomas", "athlete", coach.id);
    maya = await addPerson(scratch.db, "maya@l.test", "Maya", "athlete", coach.id);
    lena = await addPerson(scratch.db, "lena@l.test", "Lena", "athlete", coach.id);
    const t = await assign(scratch.db, coach, tomas, "brzycki", { "back squat": 120, "cable row": 70, "machine row": 90, "bench press": 80 });
    session = t.sessions[0].id;
    const l = await assign(scratch.db, coach, lena, "epley", { "back squat": 120 });
    epleySession = l.sessions[0].id;
  });
  afterAll(async () => {
    await scratch?.drop();
  });

  const put = (sessionId: string, body: unknown) => setsRoute.PUT(request("PUT", `/api/sessions/${sessionId}/log/sets`, body), params({ id: sessionId }));
  const squatSet = { exerciseIndex: 0, setIndex: 2, reps: 5, load: 90, rir: 2, done: true };

  it("shows the plan to the athlete and their coach, and nothing to another athlete", async () => {
    h.viewer = tomas;
    const own = await logRoute.GET(request("GET", `/api/sessions/${session}/log`), params({ id: session }));
    expect(own.status).toBe(200);
    const sheet = (await own.json()).sheet;
    expect(sheet.canWrite).toBe(true);
    expect(sheet.session.plan.exercises.map((e: { name: string }) => e.name)).toEqual(["back squat", "cable row"]);
    h.viewer = coach;
    expect((await (await logRoute.GET(request("GET", "/x"), params({ id: session }))).json()).sheet.canWrite).toBe(false);
    h.viewer = maya;
    const other = await logRoute.GET(request("GET", "/x"), params({ id: session }));
    expect(other.status).toBe(404);
    expect((await other.json()).error.code).toBe("not_found");
  });

  it("keeps one row when the same set is logged twice, and marks the session logged", async () => {
    h.viewer = tomas;
    const first = await put(session, { ...squatSet, clientId: "q-1", clientTime: "2026-01-01T10:00:00Z" });
    expect(first.status).toBe(200);
    const again = await put(session, { ...squatSet, clientId: "q-1", clientTime: "2026-01-01T10:00:00Z" });
    expect(again.status).toBe(200);
    const rows = await scratch.db.selectFrom("set_logs").selectAll().where("session_id", "=", session).execute();
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ exercise: "back squat", exercise_key: "back-squat", kind: "work", reps: 5, load: 90, rir: 2, done: true, planned_reps: 5, unit: "kg" });
    const s = await scratch.db.selectFrom("training_sessions").select(["logged_at", "completed_at"]).where("id", "=", session).executeTakeFirstOrThrow();
    expect(s.logged_at).not.toBeNull();
    expect(s.completed_at).toBeNull();
  });

  it("lets a newer change win and answers an older replay with the stored set", async () => {
    h.viewer = tomas;
    await put(session, { ...squatSet, reps: 4, clientTime: "2026-01-01T10:05:00Z" });
    const late = await put(session, { ...squatSet, reps: 6, clientTime: "2026-01-01T10:01:00Z" });
    const body = await late.json();
    expect(body.stale).toBe(true);
    expect(body.set.reps).toBe(4);
    await put(session, { ...squatSet, clientTime: "2026-01-01T10:06:00Z" });
  });

  it("refuses another athlete's and the coach's writes", async () => {
    h.viewer = maya;
    const other = await put(session, squatSet);
    expect(other.status).toBe(404);
    expect((await other.json()).error.code).toBe("not_found");
    h.viewer = coach;
    expect((await put(session, squatSet)).status).toBe(403);
    const reps = await scratch.db.selectFrom("set_logs").select("reps").where("session_id", "=", session).execute();
    expect(reps.map((r) => r.reps)).toEqual([5]);
  });

  it("answers bad values with 422 naming the field", async () => {
    h.viewer = tomas;
    for (const [field, value] of [["reps", 101], ["load", -1], ["rir", 11], ["reps", 2.5], ["done", "yes"]] as const) {
      const res = await put(session, { ...squatSet, [field]: value });
      expect(res.status).toBe(422);
      const err = (await res.json()).error;
      expect(err.code).toBe("invalid_input");
      expect(Object.keys(err.fields)).toContain(field);
    }
    const wrongSet = await put(session, { ...squatSet, setIndex: 9 });
    expect(wrongSet.status).toBe(422);
    expect((await wrongSet.json()).error.fields).toHaveProperty("setIndex");
    const wrongSlot = await put(session, { ...squatSet, exerciseIndex: 7 });
    expect((await wrongSlot.json()).error.fields).toHaveProperty("exerciseIndex");
    const notListed = await put(session, { ...squatSet, exerciseIndex: 1, setIndex: 0, exercise: "front squat" });
    expect(notListed.status).toBe(422);
    expect((await notListed.json()).error.fields.exercise).toMatch(/machine row/);
  });

  it("logs a listed substitute under its own name with its own planned load, and keeps the note", async () => {
    h.viewer = tomas;
    const swap = await exercisesRoute.PUT(request("PUT", "/x", { exerciseIndex: 1, exercise: "Machine Row", note: "cable station taken" }), params({ id: session }));
    expect(swap.status).toBe(200);
    expect((await swap.json()).exercise).toEqual({ exerciseIndex: 1, exercise: "machine row", note: "cable station taken" });
    const res = await put(session, { exerciseIndex: 1, setIndex: 0, reps: 10, load: 60, rir: 1, done: true });
    expect(res.status).toBe(200);
    const row = await scratch.db.selectFrom("set_logs").selectAll().where("session_id", "=", session).where("exercise_index", "=", 1).executeTakeFirstOrThrow();
    const sheet = (await (await logRoute.GET(request("GET", "/x"), params({ id: session }))).json()).sheet;
    const sub = sheet.session.plan.exercises[1].substitutes[0];
    expect(row).toMatchObject({ exercise: "machine row", exercise_key: "machine-row", planned_exercise: "cable row", planned_load: sub.sets[0].load });
    expect(sub.sets[0].load).not.toBe(sheet.session.plan.exercises[1].sets[0].load);
    // Swapping back while a set is ticked as machine row would orphan it.
    const back = await exercisesRoute.PUT(request("PUT", "/x", { exerciseIndex: 1, exercise: "cable row" }), params({ id: session }));
    expect(back.status).toBe(409);
    expect((await back.json()).error.fields).toHaveProperty("exercise");
  });

  it("refuses to finish an empty session, then finishes with a summary", async () => {
    h.viewer = tomas;
    const { sessions } = await assign(scratch.db, coach, tomas, "brzycki", {});
    const empty = await finishRoute.POST(request("POST", "/x"), params({ id: sessions[1].id }));
    expect(empty.status).toBe(422);
    expect((await empty.json()).error.fields).toHaveProperty("sets");
    const done = await finishRoute.POST(request("POST", "/x"), params({ id: session }));
    expect(done.status).toBe(200);
    const body = await done.json();
    expect(body.completedAt).toBeTruthy();
    expect(body.summary.totals).toMatchObject({ workSetsDone: 2, workSetsPlanned: 6, reps: 15, volume: 5 * 90 + 10 * 60 });
    expect(body.summary.exercises[1]).toMatchObject({ name: "machine row", plannedName: "cable row", setsDone: 1, note: "cable station taken" });
  });

  it("estimates 1RM with the programme's own model, as published", async () => {
    // Brzycki M. (1993) JOPERD 64(1): 100 × 5 to failure → 112.50; 90 × 5 with 2 in reserve = 90 × 36/30 = 108.
    h.viewer = tomas;
    const brzycki = await sessionSummary(scratch.db, tomas, session);
    expect(brzycki.exercises[0].e1rm).toBeCloseTo(108, 1);
    h.viewer = lena;
    await put(epleySession, { exerciseIndex: 0, setIndex: 2, reps: 5, load: 100, rir: 0, done: true });
    await put(epleySession, { exerciseIndex: 0, setIndex: 3, reps: 10, load: 100, rir: 0, done: true });
    // Epley B. (1985) Poundage Chart: 100 × 10 → 133.33 (100 × 5 → 116.67 is lower, so the best is 133.3).
    const epley = await sessionSummary(scratch.db, lena, epleySession);
    expect(epley.exercises[0].e1rm).toBeCloseTo(133.3, 1);
    expect(epley.exercises[0].top).toMatchObject({ load: 100, reps: 10 });
  });
});
