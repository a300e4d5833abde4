import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import type { Kysely } from "kysely";
import { addWeeks, format, getISODay, nextThursday } from "date-fns";
import type { Database } from "../../db/database";
import { getSession, listSessions, moveSession, nextSession, sessionsOn } from "../../db/sessions";
import { createTemplate } from "../../db/templates";
import { domainFailure } from "../support/failures";
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

const list = await import("../../app/api/sessions/route");
const one = await import("../../app/api/sessions/[id]/route");

const SOURCE = [
  "title: Calendar test",
  "units: kg",
  "block Base 2w",
  "day Squat day mon",
  '  back squat 3x5 @75% ramp 50/70% rest 3m "sit between the heels"',
  "  bench press 3x8 @2rir or dumbbell bench press",
  "day Pull day thu",
  "  deadlift 2x5 @80%",
  "",
].join("\n");
const START = "2027-01-04";

/** Maxes, a template, an assignment and its dated sessions, written the way the assignment code writes them. */
async function seedAthlete(db: Kysely<Database>, coach: Person, athlete: Person, start: string) {
  await addTestedMaxes(db, coach.id, athlete.id, { "back squat": 100, "bench press": 80, deadlift: 140 }, "2026-12-01");
  const template = await createTemplate(db, coach, { title: "Calendar test", source: SOURCE });
  return assignWithSessions(db, { template, athlete, coachId: coach.id, start });
}

describe("training sessions", () => {
  let scratch: Awaited<ReturnType<typeof migratedScratchDb>>;
  let coach: Person;
  let stranger: Person;
  let tomas: Person;
  let maya: Person;
  let tomasRows: { id: string; date: string; title: string }[];
  let mayaRows: { id: string; date: string; title: string }[];

  beforeAll(async () => {
    scratch = await migratedScratchDb();
    h.db = scratch.db;
    coach = await addPerson(scratch.db, "coach@s.test", "Rowan", "coach");
    stranger = await addPerson(scratch.db, "other@s.test", "Sky", "coach");
    tomas = await addPerson(scratch.db, "tomas@s.test", "Tomas", "athlete", coach.id);
    maya = await addPerson(scratch.db, "maya@s.test", "Maya", "athlete", coach.id);
    tomasRows = (await seedAthlete(scratch.db, coach, tomas, START)).rows;
    mayaRows = (await seedAthlete(scratch.db, coach, maya, START)).rows;
  });
  afterAll(async () => {
    await scratch?.drop();
  });

  it("puts the sessions on the programme's days: Mondays and Thursdays from the start", async () => {
    // The start, 2027-01-04, is a Monday (ISO 8601 weekday 1; date-fns getISODay agrees).
    const start = new Date(2027, 0, 4);
    expect(getISODay(start)).toBe(1);
    // Week k starts at start + 7(k − 1) days; a `thu` day falls on that week's Thursday (date-fns addWeeks/nextThursday as reference).
    const expected = [0, 1].flatMap((k) => [addWeeks(start, k), nextThursday(addWeeks(start, k))]).map((d) => format(d, "yyyy-MM-dd"));
    const all = await listSessions(scratch.db, tomas, tomas.id, "2027-01-01", "2027-01-31");
    expect(all.map((s) => s.date)).toEqual(expected);
    expect(all[0]).toMatchObject({ title: "Squat day · Base week 1", day: "Squat day", block: "Base", week: 1, deload: false, exerciseCount: 2, logged: false, completed: false, templateTitle: "Calendar test" });
    expect(all[3]).toMatchObject({ title: "Pull day · Base week 2", week: 2, exerciseCount: 1 });
  });

  it("lists only the range asked for, both ends included", async () => {
    const mid = await listSessions(scratch.db, tomas, tomas.id, "2027-01-07", "2027-01-11");
    expect(mid.map((s) => s.date)).toEqual(["2027-01-07", "2027-01-11"]);
    expect(await listSessions(scratch.db, tomas, tomas.id, "2027-01-15", "2027-01-20")).toEqual([]);
  });

  it("lets the coach read an athlete's calendar and answers everyone else as if it did not exist", async () => {
    expect(await listSessions(scratch.db, coach, tomas.id, "2027-01-01", "2027-01-31")).toHaveLength(4);
    expect((await domainFailure(listSessions(scratch.db, stranger, tomas.id, "2027-01-01", "2027-01-31"))).code).toBe("not_found");
    expect((await domainFailure(listSessions(scratch.db, maya, tomas.id, "2027-01-01", "2027-01-31"))).code).toBe("not_found");
    expect((await domainFailure(getSession(scratch.db, maya, tomasRows[0].id))).code).toBe("not_found");
    expect((await domainFailure(getSession(scratch.db, tomas, "not-a-uuid"))).code).toBe("not_found");
  });

  it("refuses ranges that are backwards, too long or not dates, naming the field", async () => {
    const backwards = await domainFailure(listSessions(scratch.db, tomas, tomas.id, "2027-01-31", "2027-01-01"));
    expect(backwards).toMatchObject({ code: "invalid_input" });
    expect(Object.keys(backwards.fields)).toEqual(["to"]);
    const long = await domainFailure(listSessions(scratch.db, tomas, tomas.id, "2027-01-01", "2028-06-01"));
    expect(Object.keys(long.fields)).toEqual(["to"]);
    const bad = await domainFailure(listSessions(scratch.db, tomas, tomas.id, "2027-02-29", "2027-03-01"));
    expect(Object.keys(bad.fields)).toEqual(["from"]);
  });

  it("gives one session with its whole plan and the athlete's name and unit", async () => {
    const s = await getSession(scratch.db, coach, tomasRows[0].id);
    expect(s).toMatchObject({ athleteName: "Tomas", units: "kg", date: START, plannedDate: START });
    expect(s.plan.exercises.map((e) => e.name)).toEqual(["back squat", "bench press"]);
    expect(s.plan.exercises[0].cue).toBe("sit between the heels");
    expect(s.plan.exercises[1].substitutes.map((x) => x.name)).toEqual(["dumbbell bench press"]);
  });

  it("moves a session for the athlete, keeps its planned day, and shows it on the new day", async () => {
    const moved = await moveSession(scratch.db, tomas, tomasRows[0].id, "2027-01-05");
    expect(moved).toMatchObject({ id: tomasRows[0].id, date: "2027-01-05", plannedDate: START });
    const week = await listSessions(scratch.db, tomas, tomas.id, "2027-01-04", "2027-01-10");
    expect(week.map((s) => [s.date, s.plannedDate])).toEqual([
      ["2027-01-05", "2027-01-04"],
      ["2027-01-07", "2027-01-07"],
    ]);
    const byCoach = await moveSession(scratch.db, coach, tomasRows[0].id, START);
    expect(byCoach.date).toBe(START);
  });

  it("refuses to move someone else's session, a bad date or a completed session", async () => {
    const theirs = await domainFailure(moveSession(scratch.db, tomas, mayaRows[0].id, "2027-01-05"));
    expect(theirs.code).toBe("not_found");
    expect((await domainFailure(moveSession(scratch.db, stranger, mayaRows[0].id, "2027-01-05"))).code).toBe("not_found");
    // 2027 is not a leap year (Gregorian rule), so 29 February 2027 does not exist.
    const bad = await domainFailure(moveSession(scratch.db, tomas, tomasRows[1].id, "2027-02-29"));
    expect(bad.code).toBe("invalid_input");
    expect(Object.keys(bad.fields)).toEqual(["date"]);
    const far = await domainFailure(moveSession(scratch.db, tomas, tomasRows[1].id, "2029-01-07"));
    expect(Object.keys(far.fields)).toEqual(["date"]);
    await scratch.db.updateTable("training_sessions").set({ completed_at: new Date() }).where("id", "=", tomasRows[3].id).execute();
    const done = await domainFailure(moveSession(scratch.db, tomas, tomasRows[3].id, "2027-01-16"));
    expect(done.code).toBe("conflict");
    expect((await getSession(scratch.db, tomas, tomasRows[3].id)).date).toBe(tomasRows[3].date);
  });

  it("finds today's sessions, and the next one on a rest day", async () => {
    const today = await sessionsOn(scratch.db, tomas, tomas.id, "2027-01-07");
    expect(today.map((s) => s.title)).toEqual(["Pull day · Base week 1"]);
    expect(today[0].plan.exercises[0].name).toBe("deadlift");
    expect(await sessionsOn(scratch.db, tomas, tomas.id, "2027-01-08")).toEqual([]);
    expect((await nextSession(scratch.db, tomas, tomas.id, "2027-01-08"))?.date).toBe("2027-01-11");
    expect(await nextSession(scratch.db, tomas, tomas.id, "2027-01-15")).toBeNull();
    expect((await domainFailure(sessionsOn(scratch.db, maya, tomas.id, "2027-01-07"))).code).toBe("not_found");
  });

  it("answers the same through the route handlers, with field errors and 404s", async () => {
    h.viewer = null;
    expect((await list.GET(request("GET", "/api/sessions?from=2027-01-01&to=2027-01-31"))).status).toBe(401);

    h.viewer = tomas;
    const listed = await list.GET(request("GET", "/api/sessions?from=2027-01-01&to=2027-01-31"));
    expect(listed.status).toBe(200);
    expect((await listed.json()).sessions.map((s: { id: string }) => s.id)).toEqual(tomasRows.map((r) => r.id));
    const badRange = await list.GET(request("GET", "/api/sessions?from=2027-13-01&to=2027-01-31"));
    expect(badRange.status).toBe(422);
    expect(Object.keys((await badRange.json()).error.fields)).toEqual(["from"]);

    const got = await one.GET(request("GET", ""), params({ id: tomasRows[1].id }));
    expect((await got.json()).session).toMatchObject({ id: tomasRows[1].id, title: tomasRows[1].title, units: "kg" });
    expect((await one.GET(request("GET", ""), params({ id: mayaRows[1].id }))).status).toBe(404);

    const moved = await one.PATCH(request("PATCH", "", { date: "2027-01-08" }), params({ id: tomasRows[1].id }));
    expect(moved.status).toBe(200);
    expect((await moved.json()).session).toMatchObject({ date: "2027-01-08", plannedDate: "2027-01-07" });
    const invalid = await one.PATCH(request("PATCH", "", { date: "08/01/2027" }), params({ id: tomasRows[1].id }));
    expect(invalid.status).toBe(422);
    const body = await invalid.json();
    expect(body.error.code).toBe("invalid_input");
    expect(Object.keys(body.error.fields)).toEqual(["date"]);
    expect((await one.PATCH(request("PATCH", "", { date: "2027-01-08" }), params({ id: mayaRows[1].id }))).status).toBe(404);

    h.viewer = coach;
    const coachList = await list.GET(request("GET", `/api/sessions?athleteId=${maya.id}&from=2027-01-01&to=2027-01-31`));
    expect((await coachList.json()).sessions).toHaveLength(mayaRows.length);
    const noAthlete = await list.GET(request("GET", "/api/sessions?from=2027-01-01&to=2027-01-31"));
    expect(Object.keys((await noAthlete.json()).error.fields)).toEqual(["athleteId"]);
    h.viewer = stranger;
    expect((await list.GET(request("GET", `/api/sessions?athleteId=${maya.id}&from=2027-01-01&to=2027-01-31`))).status).toBe(404);
  });
});
