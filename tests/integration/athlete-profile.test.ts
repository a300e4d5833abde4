import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import type { Kysely } from "kysely";
import type { Database } from "../../db/database";
import { createExercise } from "../../db/exercises";
import { planAssignment, sessionTitle, todayUtc } from "../../db/recompute";
import { createTemplate } from "../../db/templates";
import { addDays } from "../../lib/dates/date";
import type { Session } from "../../lib/load/types";
import { addPerson, migratedScratchDb, type Person } from "../support/people";
import { params, request, TEST_ORIGIN } from "../support/requests";
import { insertAssignment } from "../support/training";

// The handlers ask for the session and the pool themselves; both are swapped here.
const h = vi.hoisted(() => ({
  db: null as unknown as Kysely<Database>,
  viewer: null as null | Person,
}));
vi.mock("@/server/auth", () => ({ getViewer: async () => h.viewer }));
vi.mock("@/db/client", async (importOriginal) => ({ ...(await importOriginal<object>()), getDb: () => h.db }));

const roster = await import("../../app/api/athletes/route");
const overview = await import("../../app/api/athletes/[id]/route");
const equipment = await import("../../app/api/athletes/[id]/equipment/route");
const maxes = await import("../../app/api/athletes/[id]/maxes/route");
const oneMax = await import("../../app/api/athletes/[id]/maxes/[maxId]/route");
const csv = await import("../../app/api/athletes/[id]/maxes/csv/route");

const SOURCE = "title: Profile test\nday A mon\n  back squat 3x5 @75%\nday B thu\n  back squat 3x5 @75%\n";
const KG_CLUB = { units: "kg", bodyweight: 82.5, bar: 20, plates: [25, 20, 15, 10, 5, 2.5, 1.25], dumbbellStep: 2, machineStep: 5 };

function csvText(mode: string, text: string): Request {
  return new Request(`${TEST_ORIGIN}/api/athletes/x/maxes/csv?mode=${mode}`, { method: "POST", headers: { "content-type": "text/csv" }, body: text });
}
function csvFile(mode: string, text: string, name = "maxes.csv"): Request {
  const form = new FormData();
  form.append("file", new File([text], name, { type: "text/csv" }));
  return new Request(`${TEST_ORIGIN}/api/athletes/x/maxes/csv?mode=${mode}`, { method: "POST", body: form });
}

const daysAgo = (n: number) => addDays(todayUtc(), -n);
const firstWorkLoad = (s: Session) => s.exercises[0].sets.find((x) => x.kind === "work")?.load ?? null;

describe("athlete profile through the route handlers", () => {
  let scratch: Awaited<ReturnType<typeof migratedScratchDb>>;
  let coach: Person, otherCoach: Person, admin: Person, tomas: Person, maya: Person, lena: Person;

  const countMaxes = async (athleteId: string) =>
    Number((await scratch.db.selectFrom("athlete_maxes").select((eb) => eb.fn.countAll().as("n")).where("athlete_id", "=", athleteId).executeTakeFirstOrThrow()).n);

  beforeAll(async () => {
    scratch = await migratedScratchDb();
    h.db = scratch.db;
    coach = await addPerson(scratch.db, "coach@larchmere.test", "Rowan Hale", "coach");
    otherCoach = await addPerson(scratch.db, "other@larchmere.test", "Other Coach", "coach");
    admin = await addPerson(scratch.db, "admin@larchmere.test", "Pat Ellery", "admin");
    tomas = await addPerson(scratch.db, "tomas@larchmere.test", "Tomas Brenner", "athlete", coach.id);
    maya = await addPerson(scratch.db, "maya@larchmere.test", "Maya Okonjo", "athlete", coach.id);
    lena = await addPerson(scratch.db, "lena@larchmere.test", "Lena Fisk", "athlete", otherCoach.id);
  });
  afterAll(async () => {
    await scratch?.drop();
  });

  it("answers 401 without a session and 403 for an admin", async () => {
    h.viewer = null;
    expect((await overview.GET(request("GET", ""), params({ id: tomas.id }))).status).toBe(401);
    h.viewer = admin;
    const res = await overview.GET(request("GET", ""), params({ id: tomas.id }));
    expect(res.status).toBe(403);
    expect((await res.json()).error.code).toBe("forbidden");
  });

  it("shows the athlete to their coach and to themself, and to no one else", async () => {
    h.viewer = coach;
    const res = await overview.GET(request("GET", ""), params({ id: tomas.id }));
    expect(res.status).toBe(200);
    expect(await res.json()).toMatchObject({ athlete: { name: "Tomas Brenner", email: "tomas@larchmere.test" }, equipment: { units: "kg", stored: false }, maxes: [] });
    h.viewer = tomas;
    expect((await overview.GET(request("GET", ""), params({ id: tomas.id }))).status).toBe(200);

    for (const [viewer, id] of [[otherCoach, tomas.id], [tomas, maya.id], [coach, lena.id], [coach, "not-a-uuid"]] as const) {
      h.viewer = viewer;
      const r = await overview.GET(request("GET", ""), params({ id }));
      expect(r.status).toBe(404);
      expect((await r.json()).error.code).toBe("not_found");
    }
    h.viewer = otherCoach;
    expect((await maxes.POST(request("POST", "", { exercise: "squat", value: 100, unit: "kg", date: daysAgo(1) }), params({ id: tomas.id }))).status).toBe(404);
    expect((await equipment.PUT(request("PUT", "", KG_CLUB), params({ id: tomas.id }))).status).toBe(404);
    expect((await csv.POST(csvText("apply", "exercise,value,unit,date\nsquat,100,kg,2026-01-01\n"), params({ id: tomas.id }))).status).toBe(404);
    expect(await countMaxes(tomas.id)).toBe(0);
  });

  it("lists only the coach's own athletes, by name, without disabled accounts", async () => {
    const names = async (viewer: Person | null) => {
      h.viewer = viewer;
      const res = await roster.GET();
      return { status: res.status, body: await res.json() };
    };
    expect(await names(coach)).toEqual({ status: 200, body: { athletes: [{ id: maya.id, name: "Maya Okonjo", email: "maya@larchmere.test" }, { id: tomas.id, name: "Tomas Brenner", email: "tomas@larchmere.test" }] } });
    expect((await names(otherCoach)).body.athletes.map((a: { name: string }) => a.name)).toEqual(["Lena Fisk"]);
    const gone = await addPerson(scratch.db, "gone@larchmere.test", "Ada Gone", "athlete", coach.id);
    await scratch.db.updateTable("users").set({ disabled_at: new Date() }).where("id", "=", gone.id).execute();
    expect((await names(coach)).body.athletes).toHaveLength(2);
    expect((await names(tomas)).status).toBe(403);
    expect((await names(admin)).status).toBe(403);
    expect((await names(null)).status).toBe(401);
  });

  it("saves equipment for the athlete or the coach and names each bad field with a 422", async () => {
    h.viewer = tomas;
    const saved = await equipment.PUT(request("PUT", "", { ...KG_CLUB, plates: [1.25, 2.5, 5, 10, 15, 20, 25] }), params({ id: tomas.id }));
    expect(saved.status).toBe(200);
    expect(await saved.json()).toMatchObject({ equipment: { units: "kg", bodyweight: 82.5, plates: [25, 20, 15, 10, 5, 2.5, 1.25], preset: "kg-club", stored: true }, recomputed: 0 });

    h.viewer = coach;
    const limited = await equipment.PUT(request("PUT", "", { ...KG_CLUB, plates: [{ weight: 20, pairs: 3 }, { weight: 5, pairs: 2 }] }), params({ id: tomas.id }));
    expect((await limited.json()).equipment).toMatchObject({ plates: [{ weight: 20, pairs: 3 }, { weight: 5, pairs: 2 }], preset: null });

    // A bar of 150 would break the table's own check; it must come back as a message, not a 500.
    const bad = await equipment.PUT(request("PUT", "", { ...KG_CLUB, bar: 150, plates: [{ weight: 20, pairs: 2 }, { weight: 10, pairs: 1.5 }] }), params({ id: tomas.id }));
    expect(bad.status).toBe(422);
    const { error } = await bad.json();
    expect(error.code).toBe("invalid_input");
    expect(error.fields).toMatchObject({ bar: "must be at most 100", "plates.1.pairs": "expected a whole number" });
    expect((await equipment.PUT(request("PUT", "", { ...KG_CLUB, colour: "red" }), params({ id: tomas.id }))).status).toBe(422);
    expect((await equipment.PUT(request("PUT", "", '{"units": "kg",'), params({ id: tomas.id }))).status).toBe(422);
  });

  it("adds maxes under the exercise's own name, keeps history and makes the latest measured current", async () => {
    h.viewer = coach;
    await createExercise(scratch.db, coach, { name: "safety bar squat", aliases: ["ssb"], equipment: "barbell" });
    const add = (body: object) => maxes.POST(request("POST", "", body), params({ id: maya.id }));

    const first = await add({ exercise: "Squat", value: 140, unit: "kg", date: daysAgo(10), source: "tested" });
    expect(first.status).toBe(201);
    expect((await first.json()).max).toMatchObject({ exercise: "back squat", exerciseKey: "back-squat", value: 140 });
    // Entered later but measured earlier: history, not current.
    expect((await add({ exercise: "back-squat", value: 130, unit: "kg", date: daysAgo(40) })).status).toBe(201);
    expect((await add({ exercise: "SSB", value: "120,5", unit: "kg", date: daysAgo(3), kind: "tm", note: "box" })).status).toBe(201);

    h.viewer = maya;
    const view = await (await maxes.GET(request("GET", ""), params({ id: maya.id }))).json();
    expect(view.current.map((m: { exercise: string; value: number }) => [m.exercise, m.value])).toEqual([
      ["back squat", 140],
      ["safety bar squat", 120.5],
    ]);
    const squat = view.history.find((g: { exerciseKey: string }) => g.exerciseKey === "back-squat");
    expect(squat.entries.map((e: { value: number; measuredOn: string }) => [e.value, e.measuredOn])).toEqual([
      [140, daysAgo(10)],
      [130, daysAgo(40)],
    ]);
    expect(squat.entries[0].createdBy).toBe("Rowan Hale");

    // Deleting the wrong entry brings the earlier one back as current; the rest of the history stays.
    const del = await oneMax.DELETE(request("DELETE", ""), params({ id: maya.id, maxId: squat.entries[0].id }));
    expect(await del.json()).toEqual({ deleted: true, recomputed: 0 });
    const after = await (await maxes.GET(request("GET", ""), params({ id: maya.id }))).json();
    expect(after.current.find((m: { exerciseKey: string }) => m.exerciseKey === "back-squat").value).toBe(130);
    expect(after.history.find((g: { exerciseKey: string }) => g.exerciseKey === "back-squat").entries).toHaveLength(1);

    h.viewer = coach;
    expect((await oneMax.DELETE(request("DELETE", ""), params({ id: maya.id, maxId: squat.entries[0].id }))).status).toBe(404);
    // Maya's max seen through Tomas's id: not his, so not found, and still there.
    const ssbId = after.current.find((m: { exerciseKey: string }) => m.exerciseKey === "safety bar squat").id;
    expect((await oneMax.DELETE(request("DELETE", ""), params({ id: tomas.id, maxId: ssbId }))).status).toBe(404);
    expect(await countMaxes(maya.id)).toBe(2);
  });

  it("refuses a bad max field by field, suggesting the nearest exercise names", async () => {
    h.viewer = coach;
    const res = await maxes.POST(request("POST", "", { exercise: "bench pres", value: 0, unit: "st", date: addDays(todayUtc(), 5) }), params({ id: maya.id }));
    expect(res.status).toBe(422);
    const { error } = await res.json();
    expect(error.code).toBe("invalid_input");
    expect(error.fields.exercise).toMatch(/did you mean bench press/);
    expect(error.fields).toMatchObject({ value: "must be greater than 0", unit: "“st” is not one of kg or lb" });
    expect(error.fields.date).toMatch(/is in the future/);
    const wrongType = await maxes.POST(request("POST", "", { exercise: "squat", value: [1], unit: "kg", date: "2026-01-01" }), params({ id: maya.id }));
    expect(wrongType.status).toBe(422);
    expect((await wrongType.json()).error.fields.value).toBe("value is a number");
  });

  it("previews a CSV without writing, and applies it all or nothing", async () => {
    h.viewer = coach;
    const before = await countMaxes(tomas.id);
    const bad = `exercise,value,unit,date\ndeadlift,200,kg,${daysAgo(5)}\nbench,100,kg,${addDays(todayUtc(), 30)}\nohp,60,kg,${daysAgo(5)}\n`;

    const preview = await csv.POST(csvFile("preview", bad), params({ id: tomas.id }));
    expect(preview.status).toBe(200);
    const p = await preview.json();
    expect(p.ok).toBe(false);
    expect(p.rows.map((r: { line: number; problems: unknown[] }) => [r.line, r.problems.length])).toEqual([[2, 0], [3, 1], [4, 0]]);
    expect(p.rows[1].problems[0]).toMatchObject({ line: 3, field: "date" });
    expect(await countMaxes(tomas.id)).toBe(before);

    const refused = await csv.POST(csvFile("apply", bad), params({ id: tomas.id }));
    expect(refused.status).toBe(422);
    const { error } = await refused.json();
    expect(error.message).toMatch(/^Nothing was imported: 1 problem in the file\. Line 3, date:/);
    expect(Object.keys(error.fields)).toEqual(["rows.3.date"]);
    expect(await countMaxes(tomas.id)).toBe(before);

    const good = bad.replace(addDays(todayUtc(), 30), daysAgo(5));
    const applied = await csv.POST(csvText("apply", good), params({ id: tomas.id }));
    expect(applied.status).toBe(200);
    expect(await applied.json()).toEqual({ mode: "apply", added: 3, skipped: 0, recomputed: 0 });
    expect(await countMaxes(tomas.id)).toBe(before + 3);

    // The same file again: the preview names every line as already on file, and adding writes nothing.
    const again = await (await csv.POST(csvText("preview", good), params({ id: tomas.id }))).json();
    expect(again).toMatchObject({ ok: true, repeats: [2, 3, 4] });
    expect(await (await csv.POST(csvText("apply", good), params({ id: tomas.id }))).json()).toEqual({ mode: "apply", added: 0, skipped: 3, recomputed: 0 });
    // One new line among old ones, and a line given twice: only the new max is added, once.
    const more = `${good}squat,150,kg,${daysAgo(2)}\nsquat,150.0,kg,${daysAgo(2)}\n`;
    expect((await (await csv.POST(csvText("preview", more), params({ id: tomas.id }))).json()).repeats).toEqual([2, 3, 4, 6]);
    expect(await (await csv.POST(csvText("apply", more), params({ id: tomas.id }))).json()).toMatchObject({ added: 1, skipped: 4 });
    expect(await countMaxes(tomas.id)).toBe(before + 4);
  });

  it("refuses a CSV request it cannot read with a message, never a 500", async () => {
    h.viewer = coach;
    const big = "exercise,value,unit,date,note\n" + `squat,140,kg,2026-01-04,${"x".repeat(400)}\n`.repeat(700);
    const tooBig = await csv.POST(csvFile("preview", big), params({ id: tomas.id }));
    expect(tooBig.status).toBe(422);
    expect((await tooBig.json()).error.message).toMatch(/256 KB limit/);
    const noMode = await csv.POST(csvText("later", "exercise,value,unit,date\n"), params({ id: tomas.id }));
    expect((await noMode.json()).error.fields.mode).toBe("mode is preview or apply");
    const xlsx = await csv.POST(csvFile("preview", "PK\u0003\u0004rest-of-a-zip"), params({ id: tomas.id }));
    expect((await xlsx.json()).error.message).toMatch(/spreadsheet file, not CSV/);
    const json = await csv.POST(request("POST", "/api/athletes/x/maxes/csv?mode=preview", { a: 1 }), params({ id: tomas.id }));
    expect(json.status).toBe(422);
  });

  it("re-plans upcoming unlogged sessions when maxes or equipment change, and leaves logged ones alone", async () => {
    h.viewer = coach;
    const athlete = { id: lena.id };
    // Lena is the other coach's athlete; that coach assigns and edits.
    h.viewer = otherCoach;
    expect((await maxes.POST(request("POST", "", { exercise: "back squat", value: 100, unit: "kg", date: daysAgo(30) }), params({ id: athlete.id }))).status).toBe(201);
    const template = await createTemplate(scratch.db, otherCoach, { title: "Profile test", source: SOURCE });
    const start = daysAgo(14);
    const assignmentId = await insertAssignment(scratch.db, { template, athleteId: lena.id, coachId: otherCoach.id, start });
    const plan = await planAssignment(scratch.db, { athleteId: lena.id, athleteName: lena.name, versionId: template.version.id, startDate: start, weekdays: [] });
    expect(plan.sessions.length).toBeGreaterThanOrEqual(2);
    // 75% of a 100 kg 1RM (percentage of one-repetition maximum, by definition).
    expect(firstWorkLoad(plan.sessions[0])).toBe(75);
    const row = (ordinal: number, date: string, logged: boolean) => ({
      assignment_id: assignmentId,
      athlete_id: lena.id,
      ordinal,
      planned_date: date,
      date,
      title: sessionTitle(plan.sessions[ordinal]),
      plan: JSON.stringify(plan.sessions[ordinal]),
      logged_at: logged ? new Date() : null,
      completed_at: logged ? new Date() : null,
    });
    await scratch.db.insertInto("training_sessions").values([row(0, daysAgo(7), true), row(1, addDays(todayUtc(), 7), false)]).execute();
    const planOf = async (ordinal: number) =>
      (await scratch.db.selectFrom("training_sessions").select("plan").where("assignment_id", "=", assignmentId).where("ordinal", "=", ordinal).executeTakeFirstOrThrow()).plan;

    const added = await maxes.POST(request("POST", "", { exercise: "squat", value: 140, unit: "kg", date: daysAgo(1) }), params({ id: athlete.id }));
    expect((await added.json()).recomputed).toBe(1);
    // 75% × 140 kg = 105 kg, loadable with the kg club plates.
    expect(firstWorkLoad(await planOf(1))).toBe(105);
    expect(firstWorkLoad(await planOf(0))).toBe(75);

    const lb = await equipment.PUT(request("PUT", "", { units: "lb", bodyweight: 180, bar: 45, plates: [45, 35, 25, 10, 5, 2.5], dumbbellStep: 5, machineStep: 10 }), params({ id: athlete.id }));
    expect((await lb.json()).recomputed).toBe(1);
    const future = await planOf(1);
    expect(future.units).toBe("lb");
    // 140 kg = 308.65 lb (1 lb = 0.45359237 kg, NIST SP 811 App. B); 75% = 231.5 lb, within one 5 lb step once rounded to plates.
    expect(Math.abs((firstWorkLoad(future) ?? 0) - 231.49)).toBeLessThanOrEqual(5);
    expect((await planOf(0)).units).toBe("kg");

    const csvApplied = await csv.POST(csvText("apply", `exercise,value,unit,date\nsquat,300,lb,${todayUtc()}\n`), params({ id: athlete.id }));
    expect(await csvApplied.json()).toMatchObject({ added: 1, recomputed: 1 });
    // 75% × 300 lb = 225 lb: 45 lb bar + 2 × (45 + 35) lb.
    expect(firstWorkLoad(await planOf(1))).toBe(225);
    expect(firstWorkLoad(await planOf(0))).toBe(75);
  });

  it("plans a line written with the coach's own alias from the max filed under that exercise, on the bar", async () => {
    h.viewer = coach;
    // Maya's "SSB" max (120.5 kg, entered above) is filed under the coach's "safety bar squat".
    const template = await createTemplate(scratch.db, coach, { title: "Alias test", source: "title: Alias test\nday A mon\n  ssb 3x5 @80%\n" });
    const plan = await planAssignment(scratch.db, { athleteId: maya.id, athleteName: maya.name, versionId: template.version.id, startDate: daysAgo(0), weekdays: [] });
    const line = plan.sessions[0].exercises[0];
    expect(line).toMatchObject({ name: "ssb", equipment: "barbell", max: 120.5 });
    // 80 % of 120.5 = 96.4 kg → 97.5 kg, the nearest load a 20 kg bar and 1.25 kg change plates make (common practice, no source).
    const work = line.sets.find((x) => x.kind === "work");
    expect(work?.load).toBe(97.5);
    expect(work?.perSide?.reduce((a, b) => a + b, 0)).toBe((97.5 - 20) / 2);
  });
});
