import { readFileSync } from "node:fs";
import { join } from "node:path";
import { sql, type Kysely } from "kysely";
import type PgBoss from "pg-boss";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { readStoredMessages } from "../../scripts/fakes/smtp.mjs";
import type { Database } from "../../db/database";
import { pause, startScratchBoss, stopBoss } from "../support/boss";
import { freePort, type Mailbox, startMailbox } from "../support/mailbox";
import { addPerson, migratedScratchDb, type Person } from "../support/people";
import { params, post } from "../support/requests";
import { addTestedMaxes, assignWithSessions } from "../support/training";

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
const { loadJobRun } = await import("../../db/jobs");
const { cardPackWorker, handleCardPack } = await import("../../server/jobs/cardPack");
const { registerWorkers } = await import("../../server/jobs/worker");
const weekCards = await import("../../app/api/athletes/[id]/cards/route");
const jobRoute = await import("../../app/api/jobs/[id]/route");

const SOURCE = "title: Pack job test\nunits: kg\nblock Base 2w\nday A mon\n  back squat 3x5 @75%\nday B thu\n  deadlift 2x5 @80%\n";
const START = "2027-01-04";

describe("e-mailing a week's cards as a background job", () => {
  let scratch: Awaited<ReturnType<typeof migratedScratchDb>>;
  let db: Kysely<Database>;
  let coach: Person;
  let sky: Person;
  let tomas: Person;
  let dir: string;
  let mailbox: Mailbox;

  const queueEmail = async (body: Record<string, unknown> = { from: START }) => {
    h.viewer = coach;
    const res = await weekCards.POST(post(`/api/athletes/${tomas.id}/cards`, body), params({ id: tomas.id }));
    expect(res.status).toBe(202);
    return (await res.json()).job as { id: string; kind: string; status: string };
  };

  beforeAll(async () => {
    scratch = await migratedScratchDb();
    db = scratch.db;
    h.db = db;
    coach = await addPerson(db, "rowan@p.test", "Rowan Hale", "coach");
    sky = await addPerson(db, "sky@p.test", "Sky Other", "coach");
    tomas = await addPerson(db, "tomas@p.test", "Tomas Brenner", "athlete", coach.id);
    await addTestedMaxes(db, coach.id, tomas.id, { "back squat": 100, deadlift: 140 }, "2026-12-01");
    const template = await createTemplate(db, coach, { title: "Pack job test", source: SOURCE });
    await assignWithSessions(db, { template, athlete: tomas, coachId: coach.id, start: START });

    mailbox = await startMailbox("iq-card-pack-");
    dir = mailbox.dir;
    // A real queue on the scratch database; workers are registered only in the last test.
    h.boss = await startScratchBoss(scratch);
  });
  afterAll(async () => {
    await stopBoss(h.boss);
    await mailbox?.close();
    await scratch?.drop();
  });

  it("answers 202 with a queued job the coach alone can follow, and sends nothing yet", async () => {
    const job = await queueEmail({ from: "2027-01-06", size: "A5" });
    expect(job).toMatchObject({ kind: "card-pack", status: "queued", total: 1, done: 0, failed: 0, result: null, error: null, finishedAt: null });
    const run = await loadJobRun(db, job.id);
    // Wednesday 6 Jan 2027 stays as given; the handler finds its ISO week itself.
    expect(run?.payload).toEqual({ athleteId: tomas.id, from: "2027-01-06", weeks: 1, size: "a5", coachId: coach.id, senderName: "Rowan Hale" });
    const queued = await sql<{ state: string }>`select state from pgboss.job where name = 'card-pack' and data->>'jobRunId' = ${job.id}`.execute(db);
    expect(queued.rows.map((r) => r.state)).toEqual(["created"]);

    const polled = await jobRoute.GET(new Request("http://ironquill.test"), params({ id: job.id }));
    expect(polled.status).toBe(200);
    expect((await polled.json()).job).toMatchObject({ id: job.id, status: "queued" });
    h.viewer = sky;
    expect((await jobRoute.GET(new Request("http://ironquill.test"), params({ id: job.id }))).status).toBe(404);
    expect(readStoredMessages(dir)).toHaveLength(0);
  });

  it("sends one mail with the PDF when its handler runs, records to whom, and a retry after that sends nothing more", async () => {
    const job = await queueEmail();
    const before = readStoredMessages(dir).length;
    await handleCardPack(db, { jobRunId: job.id });
    const messages = readStoredMessages(dir);
    expect(messages).toHaveLength(before + 1);
    const m = messages.at(-1)!;
    expect(m.to).toEqual(["tomas@p.test"]);
    expect(m.attachments).toEqual([expect.objectContaining({ filename: "tomas-brenner-week-2027-W01.pdf", contentType: "application/pdf" })]);
    // ISO 32000-1 §7.5.2: a PDF file starts with the header "%PDF-".
    expect(readFileSync(join(dir, m.attachments[0].file)).subarray(0, 5).toString("latin1")).toBe("%PDF-");
    const done = await loadJobRun(db, job.id);
    expect(done).toMatchObject({ status: "done", done: 1, failed: 0, error: null, result: { to: "tomas@p.test", sessions: 2, fileName: "tomas-brenner-week-2027-W01.pdf" } });
    expect(done?.finishedAt).toBeInstanceOf(Date);

    // A retry of the same job, directly and through the queue callback, finds the run done.
    await handleCardPack(db, { jobRunId: job.id });
    await cardPackWorker(db)([{ data: { jobRunId: job.id }, retryCount: 1, retryLimit: 3 } as unknown as PgBoss.JobWithMetadata<{ jobRunId: string }>]);
    expect(readStoredMessages(dir)).toHaveLength(before + 1);
    expect(await loadJobRun(db, job.id)).toMatchObject({ status: "done", done: 1 });
  });

  it("answers another coach 404 and an empty week 404 naming `from`, queueing nothing", async () => {
    const count = async () => (await db.selectFrom("job_runs").select("id").execute()).length;
    const before = await count();
    h.viewer = sky;
    const other = await weekCards.POST(post(`/api/athletes/${tomas.id}/cards`, { from: START }), params({ id: tomas.id }));
    expect(other.status).toBe(404);
    expect((await other.json()).error.message).toBe("That athlete does not exist or is not on your roster.");
    h.viewer = coach;
    const empty = await weekCards.POST(post(`/api/athletes/${tomas.id}/cards`, { from: "2027-02-01", weeks: 4 }), params({ id: tomas.id }));
    expect(empty.status).toBe(404);
    // Four ISO weeks from Monday 1 Feb 2027 end on Sunday 28 Feb (ISO 8601).
    expect((await empty.json()).error).toMatchObject({
      message: "No sessions are planned for Tomas Brenner in the 4 weeks from 2027-02-01 (2027-02-01 to 2027-02-28), so there is nothing to send.",
      fields: { from: "No sessions in those weeks" },
    });
    expect(await count()).toBe(before);
  });

  it("fails the run readably, sending nothing, when the athlete has left the roster by the time it runs", async () => {
    const job = await queueEmail();
    const before = readStoredMessages(dir).length;
    await db.updateTable("users").set({ coach_id: sky.id }).where("id", "=", tomas.id).execute();
    try {
      await handleCardPack(db, { jobRunId: job.id });
    } finally {
      await db.updateTable("users").set({ coach_id: coach.id }).where("id", "=", tomas.id).execute();
    }
    expect(await loadJobRun(db, job.id)).toMatchObject({ status: "failed", done: 0, failed: 1, error: "That athlete does not exist or is not on your roster. Nothing was sent." });
    expect(readStoredMessages(dir)).toHaveLength(before);
  });

  it("throws for a retry while mail is down, and on the last attempt fails the run in words the coach can act on", async () => {
    const job = await queueEmail();
    const run = cardPackWorker(db);
    const attempt = (retryCount: number) => run([{ data: { jobRunId: job.id }, retryCount, retryLimit: 3 } as unknown as PgBoss.JobWithMetadata<{ jobRunId: string }>]);
    const port = process.env.SMTP_PORT;
    process.env.SMTP_PORT = String(await freePort());
    try {
      await expect(attempt(0)).rejects.toThrow("We couldn't send the e-mail just now");
      expect(await loadJobRun(db, job.id)).toMatchObject({ status: "running", error: null });
      await expect(attempt(3)).rejects.toThrow();
    } finally {
      process.env.SMTP_PORT = port;
    }
    expect(await loadJobRun(db, job.id)).toMatchObject({
      status: "failed",
      failed: 1,
      error: "We couldn't send the e-mail just now. Nothing was sent or saved; please try again in a minute.",
    });
  });

  it("is sent by a real pg-boss worker, with progress the coach polls until done", async () => {
    await registerWorkers(h.boss, db, { pollingIntervalSeconds: 0.5 });
    const before = readStoredMessages(dir).length;
    const job = await queueEmail({ from: START, weeks: 4 });
    h.viewer = coach;
    let last: { status: string; result: unknown; error: string | null } = { status: job.status, result: null, error: null };
    // Waits for the worker (polling every half second); gives up after a generous bound rather than timing anything.
    for (let i = 0; i < 120 && last.status !== "done" && last.status !== "failed"; i++) {
      await pause(250);
      const r = await jobRoute.GET(new Request("http://ironquill.test"), params({ id: job.id }));
      expect(r.status).toBe(200);
      last = (await r.json()).job;
    }
    // Block Base 2w with two days a week: four sessions over the first two of the four weeks.
    expect(last).toMatchObject({ status: "done", error: null, result: { to: "tomas@p.test", sessions: 4, fileName: "tomas-brenner-4-weeks-from-2027-W01.pdf" } });
    // The jobs queued by the earlier tests are worked too: the first test's run, still queued, sends once;
    // the runs already done or failed send nothing. So exactly two more mails, one per run that was waiting.
    let states: string[] = [];
    for (let i = 0; i < 80 && !(states.length > 0 && states.every((s) => s === "completed")); i++) {
      states = (await sql<{ state: string }>`select state from pgboss.job where name = 'card-pack'`.execute(db)).rows.map((r) => r.state);
      if (!states.every((s) => s === "completed")) await pause(250);
    }
    expect(states).toEqual(["completed", "completed", "completed", "completed", "completed"]);
    expect(readStoredMessages(dir)).toHaveLength(before + 2);
    const runs = await db.selectFrom("job_runs").select(["status", "done", "failed"]).where("kind", "=", "card-pack").execute();
    expect(runs.filter((r) => r.status === "done" && r.done === 1)).toHaveLength(3);
    expect(runs.filter((r) => r.status === "failed" && r.failed === 1)).toHaveLength(2);
  });
});
