import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import type { Kysely } from "kysely";
import type { Database } from "../../db/database";
import { addPerson, migratedScratchDb, type Person } from "../support/people";
import { params, request } from "../support/requests";
import { addTestedMaxes, assignWithSessions } from "../support/training";

const h = vi.hoisted(() => ({
  db: null as unknown as Kysely<Database>,
  viewer: null as null | Person,
}));
vi.mock("@/server/auth", () => ({ getViewer: async () => h.viewer }));
vi.mock("@/db/client", async (importOriginal) => ({ ...(await importOriginal<object>()), getDb: () => h.db }));

const { createTemplate } = await import("../../db/templates");
const { todayUtc } = await import("../../db/recompute");
const { saveSet, finishSession } = await import("../../db/logs");
const { coachDashboard } = await import("../../db/dashboard");
const { athleteProgress } = await import("../../db/progress");
const { listProposals, dismissProposal, refreshProposals } = await import("../../db/maxProposals");
const { addDays } = await import("../../lib/dates/date");
const { isoMonday } = await import("../../lib/progress/attention");
const dashboardRoute = await import("../../app/api/dashboard/route");
const decideRoute = await import("../../app/api/max-proposals/[id]/route");
const progressRoute = await import("../../app/api/progress/[athleteId]/route");

// Two training days a week: A (squat) on Monday, B (bench) on Thursday.
const SOURCE = `title: Dashboard test
units: kg
model: brzycki

block Base 4w
day A mon
  back squat 3x5 @75%
day B thu
  bench press 3x5 @75%
`;

const req = (method: string, body?: unknown) => request(method, "/x", body);

// The fixture sits around the real current week so that "future" means what recompute thinks it means.
const MONDAY = isoMonday(todayUtc());
const START = addDays(MONDAY, -14);

async function assign(db: Kysely<Database>, coach: Person, athlete: Person, autoRegulate: boolean, maxes: Record<string, number>, source = SOURCE) {
  const template = await createTemplate(db, coach, { title: `T ${athlete.name}`, source });
  await addTestedMaxes(db, coach.id, athlete.id, maxes, addDays(START, -30), (exercise) => exercise.replace(/ /g, "-"));
  return (await assignWithSessions(db, { template, athlete, coachId: coach.id, start: START, autoRegulate })).rows;
}

describe("coach dashboard and max proposals", () => {
  let scratch: Awaited<ReturnType<typeof migratedScratchDb>>;
  let coach: Person, otherCoach: Person, tomas: Person, maya: Person, lena: Person, ivo: Person;
  let tomasSessions: Awaited<ReturnType<typeof assign>>;

  beforeAll(async () => {
    scratch = await migratedScratchDb();
    h.db = scratch.db;
    coach = await addPerson(scratch.db, "coach@d.test", "Rowan", "coach");
    otherCoach = await addPerson(scratch.db, "sky@d.test", "Sky", "coach");
    tomas = await addPerson(scratch.db, "tomas@d.test", "Tomas", "athlete", coach.id);
    maya = await addPerson(scratch.db, "maya@d.test", "Maya", "athlete", coach.id);
    lena = await addPerson(scratch.db, "lena@d.test", "Lena", "athlete", coach.id);
    ivo = await addPerson(scratch.db, "ivo@d.test", "Ivo", "athlete", otherCoach.id);
    tomasSessions = await assign(scratch.db, coach, tomas, false, { "back squat": 140, "bench press": 100 });
  });
  afterAll(async () => {
    await scratch?.drop();
  });

  const work = (reps: number, load: number, setIndex = 0) => ({ exerciseIndex: 0, setIndex, reps, load, rir: 0, done: true });

  it("counts planned and logged sessions, the last one trained and missed sessions", async () => {
    // Sessions: weeks −2, −1, 0 (this week), +1 on Monday and Thursday. Logged: −2 Mon, −2 Thu, −1 Mon, 0 Mon.
    const dates = tomasSessions.map((s) => s.date);
    expect(dates).toEqual([0, 3, 7, 10, 14, 17, 21, 24].map((d) => addDays(START, d)));
    for (const i of [0, 1, 2, 4]) await saveSet(scratch.db, tomas, tomasSessions[i].id, work(5, 100));
    // Two sets far short of the planned 5 this Monday (3 and 2 reps: more than 20 % short).
    await saveSet(scratch.db, tomas, tomasSessions[4].id, work(3, 100, 1));
    await saveSet(scratch.db, tomas, tomasSessions[4].id, work(2, 100, 2));
    const today = addDays(MONDAY, 2);
    const { rows, weekOf } = await coachDashboard(scratch.db, coach, { today });
    expect(weekOf).toBe(MONDAY);
    expect(rows.map((r) => r.name)).toEqual(["Lena", "Maya", "Tomas"]);
    const t = rows.find((r) => r.name === "Tomas")!;
    expect(t.thisWeek).toEqual({ planned: 2, logged: 1 });
    expect(t.lastFourWeeks).toEqual({ planned: 4, logged: 3 });
    expect(t.missed).toBe(1);
    expect(t.lastSession).toBe(MONDAY);
    expect(t.offTargetSets).toBe(2);
    expect(t.flags).toEqual(["missed", "off-target"]);
    const m = rows.find((r) => r.name === "Maya")!;
    expect(m).toMatchObject({ thisWeek: { planned: 0, logged: 0 }, missed: 0, lastSession: null, flags: [] });
  });

  it("answers the dashboard route for coaches only, each seeing their own roster", async () => {
    h.viewer = tomas;
    expect((await dashboardRoute.GET(req("GET"))).status).toBe(403);
    h.viewer = otherCoach;
    const other = await (await dashboardRoute.GET(req("GET"))).json();
    expect(other.dashboard.rows.map((r: { name: string }) => r.name)).toEqual(["Ivo"]);
    h.viewer = coach;
    const bad = await dashboardRoute.GET(new Request("http://ironquill.test/api/dashboard?today=2027-13-01"));
    expect(bad.status).toBe(422);
    expect((await bad.json()).error.fields).toHaveProperty("today");
  });

  it("shows progress to the athlete and coach but not to another coach", async () => {
    h.viewer = otherCoach;
    expect((await progressRoute.GET(req("GET"), params({ athleteId: tomas.id }))).status).toBe(404);
    h.viewer = tomas;
    const res = await progressRoute.GET(req("GET"), params({ athleteId: tomas.id }));
    expect(res.status).toBe(200);
    const { progress } = await res.json();
    // Most recently trained first: squat on Mondays (this week last), bench on the first Thursday.
    expect(progress.exercises.map((e: { key: string }) => e.key)).toEqual(["back-squat", "bench-press"]);
    // Brzycki 1993: 100 × 5 to failure → 112.5 in every logged session; no session beats the first.
    expect(progress.exercises[0].points.map((p: { e1rm: number; pb: boolean }) => [p.e1rm, p.pb])).toEqual([[112.5, false], [112.5, false], [112.5, false]]);
    expect(progress.sessions.map((s: { date: string }) => s.date)).toEqual([MONDAY, addDays(START, 7), addDays(START, 3), START]);
  });

  it("flags a session best above every earlier one as a personal best", async () => {
    await saveSet(scratch.db, tomas, tomasSessions[4].id, work(6, 100));
    const p = await athleteProgress(scratch.db, tomas, tomas.id);
    // Brzycki 1993: 100 × 6 → 100·36/31 = 116.1.
    expect(p.exercises[0].points.at(-1)).toMatchObject({ e1rm: 116.1, pb: true });
    expect(p.sessions[0].exercises[0]).toMatchObject({ name: "back squat", pb: true });
  });

  it("proposes a max from three sessions, and accepting it recomputes only future unlogged sessions", async () => {
    const sessions = await assign(scratch.db, coach, lena, true, { "back squat": 100 });
    const squatDays = sessions.filter((s) => s.plan.exercises[0].name === "back squat");
    const logged = squatDays.slice(0, 3);
    const future = squatDays[3];
    // 100 × 5 to failure three times: Brzycki 1993 → 112.5, 12.5 % above the 100 on file (> 5 %).
    for (const s of logged) await saveSet(scratch.db, lena, s.id, work(5, 100));
    expect((await finishSession(scratch.db, lena, logged[2].id)).proposals).toBe(1);
    const [proposal] = await listProposals(scratch.db, coach, lena.id);
    expect(proposal).toMatchObject({ exercise: "back squat", currentValue: 100, proposedValue: 112.5, units: "kg" });
    expect(proposal.basis).toHaveLength(3);
    // Nothing applied yet: the max on file is still 100.
    const before = await scratch.db.selectFrom("athlete_maxes").select("value").where("athlete_id", "=", lena.id).execute();
    expect(before.map((r) => r.value)).toEqual([100]);

    h.viewer = lena;
    const byAthlete = await decideRoute.POST(req("POST", { decision: "accept" }), params({ id: proposal.id }));
    expect(byAthlete.status).toBe(403);
    h.viewer = otherCoach;
    expect((await decideRoute.POST(req("POST", { decision: "accept" }), params({ id: proposal.id }))).status).toBe(404);
    h.viewer = coach;
    expect((await decideRoute.POST(req("POST", { decision: "maybe" }), params({ id: proposal.id }))).status).toBe(422);
    const accepted = await decideRoute.POST(req("POST", { decision: "accept" }), params({ id: proposal.id }));
    expect(accepted.status).toBe(200);
    expect((await accepted.json()).value).toBe(112.5);

    const max = await scratch.db.selectFrom("athlete_maxes").selectAll().where("athlete_id", "=", lena.id).where("source", "=", "logs").executeTakeFirstOrThrow();
    expect(max).toMatchObject({ value: 112.5, kind: "1rm", exercise_key: "back-squat" });
    const after = await scratch.db.selectFrom("training_sessions").select(["id", "plan"]).where("athlete_id", "=", lena.id).execute();
    const planOf = (id: string) => after.find((r) => r.id === id)!.plan.exercises[0].sets[0];
    // 75 % of the new 112.5 is 84.4, of the old 100 is 75: the future session moved, the logged ones did not.
    expect(future.plan.exercises[0].sets[0].percent1RM).toBe(0.75);
    expect(planOf(future.id).load!).toBeGreaterThan(future.plan.exercises[0].sets[0].load!);
    for (const s of logged) expect(planOf(s.id)).toEqual(s.plan.exercises[0].sets[0]);
    expect(await listProposals(scratch.db, coach, lena.id)).toEqual([]);
    h.viewer = coach;
    expect((await decideRoute.POST(req("POST", { decision: "accept" }), params({ id: proposal.id }))).status).toBe(409);
  });

  it("leaves deload weeks out of the evidence for a proposal", async () => {
    const athlete = await addPerson(scratch.db, "hana@d.test", "Hana", "athlete", coach.id);
    const sessions = await assign(scratch.db, coach, athlete, true, { "back squat": 100 }, SOURCE.replace("block Base 4w", "block Base 4w deload w2"));
    const squatDays = sessions.filter((s) => s.plan.exercises[0].name === "back squat");
    expect(squatDays.map((s) => s.plan.deload)).toEqual([false, true, false, false]);
    // Brzycki 1993: 120 × 5 → 135, 80 × 5 → 90, 100 × 5 → 112.5. With the deload the last three
    // would be 90, 135, 112.5 (median 112.5); without it they are 135, 135, 112.5 (median 135).
    for (const [i, load] of [120, 80, 120, 100].entries()) await saveSet(scratch.db, athlete, squatDays[i].id, work(5, load));
    await refreshProposals(scratch.db, athlete.id);
    const [p] = await listProposals(scratch.db, coach, athlete.id);
    expect(p.proposedValue).toBe(135);
    expect(p.basis.map((b) => b.date)).toEqual([squatDays[0].date, squatDays[2].date, squatDays[3].date]);
  });

  it("does not raise a dismissed proposal again on the same sessions, nor without auto-regulation", async () => {
    const sessions = await assign(scratch.db, otherCoach, ivo, true, { "back squat": 150 });
    const squatDays = sessions.filter((s) => s.plan.exercises[0].name === "back squat");
    for (const s of squatDays.slice(0, 3)) await saveSet(scratch.db, ivo, s.id, work(5, 100));
    // 112.5 against 150 on file: 25 % below, so a lower max is proposed.
    expect((await refreshProposals(scratch.db, ivo.id)).open).toBe(1);
    const [p] = await listProposals(scratch.db, otherCoach, ivo.id);
    expect(p.proposedValue).toBe(112.5);
    await dismissProposal(scratch.db, otherCoach, p.id);
    expect((await refreshProposals(scratch.db, ivo.id)).open).toBe(0);
    await saveSet(scratch.db, ivo, squatDays[3].id, work(5, 100));
    expect((await refreshProposals(scratch.db, ivo.id)).open).toBe(1);
    // Tomas's assignment is not auto-regulated: his logs never raise one.
    expect((await refreshProposals(scratch.db, tomas.id)).open).toBe(0);
  });
});
