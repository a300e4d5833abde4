import { readFileSync } from "node:fs";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import type { Kysely } from "kysely";
import type PgBoss from "pg-boss";
import { PDFParse } from "pdf-parse";
import { readStoredMessages } from "../../scripts/fakes/smtp.mjs";
import type { Database } from "../../db/database";
import { createTemplate } from "../../db/templates";
import { startScratchBoss, stopBoss } from "../support/boss";
import { type Mailbox, startMailbox } from "../support/mailbox";
import { addPerson, migratedScratchDb, type Person } from "../support/people";
import { get, idParams, post } from "../support/requests";
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

const sessionCard = await import("../../app/api/sessions/[id]/card/route");
const weekCards = await import("../../app/api/athletes/[id]/cards/route");
const { handleCardPack } = await import("../../server/jobs/cardPack");

const SOURCE = [
  "title: Card route test",
  "units: kg",
  "round: 2.5",
  "block Base 2w",
  "day Squat day mon",
  '  back squat 3x5 @75% ramp 50/70% rest 3m "sit between the heels"',
  "  bench press 3x8 @80% or dumbbell bench press",
  "day Pull day thu",
  "  deadlift 2x5 @80%",
  "",
].join("\n");
const START = "2027-01-04";
const PUBLIC = "https://cards.example.test";

async function seedAthlete(db: Kysely<Database>, coach: Person, athlete: Person) {
  await addTestedMaxes(db, coach.id, athlete.id, { "back squat": 100, "bench press": 80, deadlift: 140 }, "2026-12-01");
  const template = await createTemplate(db, coach, { title: "Card route test", source: SOURCE });
  return (await assignWithSessions(db, { template, athlete, coachId: coach.id, start: START })).rows;
}

async function readPdf(res: Response) {
  const parser = new PDFParse({ data: new Uint8Array(await res.arrayBuffer()) });
  try {
    const text = (await parser.getText()).text.replace(/\s+/g, " ");
    const info = await parser.getInfo({ parsePageInfo: true });
    return { text, pages: info.pages };
  } finally {
    await parser.destroy();
  }
}

describe("session card downloads", () => {
  let scratch: Awaited<ReturnType<typeof migratedScratchDb>>;
  let coach: Person;
  let stranger: Person;
  let admin: Person;
  let tomas: Person;
  let maya: Person;
  let rows: { id: string; date: string }[];
  const before = process.env.NEXTAUTH_URL;

  beforeAll(async () => {
    process.env.NEXTAUTH_URL = PUBLIC;
    scratch = await migratedScratchDb();
    h.db = scratch.db;
    coach = await addPerson(scratch.db, "rowan@c.test", "Rowan Hale", "coach");
    stranger = await addPerson(scratch.db, "sky@c.test", "Sky Other", "coach");
    admin = await addPerson(scratch.db, "pat@c.test", "Pat Ellery", "admin");
    tomas = await addPerson(scratch.db, "tomas@c.test", "Tomas Brenner", "athlete", coach.id);
    maya = await addPerson(scratch.db, "maya@c.test", "Maya Okonjo", "athlete", stranger.id);
    rows = await seedAthlete(scratch.db, coach, tomas);
  });
  afterAll(async () => {
    if (before === undefined) delete process.env.NEXTAUTH_URL;
    else process.env.NEXTAUTH_URL = before;
    await scratch?.drop();
  });

  it("gives the athlete their session's card as a named PDF with loads, plates and a code to the logging page", async () => {
    h.viewer = tomas;
    const res = await sessionCard.GET(get(`/api/sessions/${rows[0].id}/card`), idParams(rows[0].id));
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    expect(res.headers.get("content-disposition")).toMatch(/^attachment; filename="tomas-brenner-2027-01-04-squat-day\.pdf"/);
    const { text, pages } = await readPdf(res);
    expect(text).toContain("Tomas Brenner · Squat day · Mon 4 Jan 2027");
    // 75 % of 100 kg = 75 kg; (75 − 20) / 2 = 27.5 = 25 + 2.5 a side (common practice, no source).
    expect(text).toContain("3 × 5 75 kg 25 · 2.5 a side");
    // 80 % of 80 kg = 64 → 65 kg on 2.5 kg steps; (65 − 20) / 2 = 22.5 = 20 + 2.5 a side.
    expect(text).toContain("3 × 8 65 kg 20 · 2.5 a side");
    expect(text).toContain("Train safe.");
    expect(pages[0].links.map((l) => l.url)).toEqual([`${PUBLIC}/athlete/sessions/${rows[0].id}/log`]);
  });

  it("gives the coach the same card in the size asked for", async () => {
    h.viewer = coach;
    const res = await sessionCard.GET(get(`/api/sessions/${rows[1].id}/card?size=Letter`), idParams(rows[1].id));
    expect(res.status).toBe(200);
    const { text, pages } = await readPdf(res);
    expect(text).toContain("Pull day · Thu 7 Jan 2027");
    // US Letter, 8.5 × 11 in at 72 pt per inch (ANSI/ASME Y14.1).
    expect(pages[0]).toMatchObject({ width: 612, height: 792 });
  });

  it("answers anyone else's card as not found, a wrong role 403 and no session 401", async () => {
    for (const viewer of [stranger, maya]) {
      h.viewer = viewer;
      const res = await sessionCard.GET(get(`/api/sessions/${rows[0].id}/card`), idParams(rows[0].id));
      expect(res.status).toBe(404);
      expect((await res.json()).error).toMatchObject({ code: "not_found", message: "That session does not exist or is not on your roster." });
    }
    h.viewer = coach;
    const missing = await sessionCard.GET(get("/api/sessions/not-an-id/card"), idParams("not-an-id"));
    expect(missing.status).toBe(404);
    h.viewer = admin;
    expect((await sessionCard.GET(get(`/api/sessions/${rows[0].id}/card`), idParams(rows[0].id))).status).toBe(403);
    h.viewer = null;
    expect((await sessionCard.GET(get(`/api/sessions/${rows[0].id}/card`), idParams(rows[0].id))).status).toBe(401);
  });

  it("names a bad paper size with 422", async () => {
    h.viewer = tomas;
    const res = await sessionCard.GET(get(`/api/sessions/${rows[0].id}/card?size=a4`), idParams(rows[0].id));
    expect(res.status).toBe(422);
    expect((await res.json()).error.fields.size).toBe("size is a6, a5 or letter");
  });

  it("packs the ISO week holding `from`, one card per session, and names the file by that week", async () => {
    h.viewer = coach;
    // Wednesday 6 Jan 2027 is in ISO week 2027-W01, which runs Mon 4 – Sun 10 Jan (ISO 8601).
    const res = await weekCards.GET(get(`/api/athletes/${tomas.id}/cards?from=2027-01-06`), idParams(tomas.id));
    expect(res.status).toBe(200);
    expect(res.headers.get("content-disposition")).toMatch(/^attachment; filename="tomas-brenner-week-2027-W01\.pdf"/);
    const { text, pages } = await readPdf(res);
    expect(text).toContain("Squat day · Mon 4 Jan 2027");
    expect(text).toContain("Pull day · Thu 7 Jan 2027");
    expect(text).not.toContain("Jan 2027 · 2027-W02");
    expect(pages.map((p) => p.links.map((l) => l.url)).flat()).toEqual(rows.slice(0, 2).map((r) => `${PUBLIC}/athlete/sessions/${r.id}/log`));
    // ISO 216 A6, 105 × 148 mm, by default.
    expect(pages[0].width).toBeCloseTo((105 * 72) / 25.4, 1);
  });

  it("packs four weeks for the athlete themself, and prints a moved session on its new day", async () => {
    await scratch.db.updateTable("training_sessions").set({ date: "2027-01-15" }).where("id", "=", rows[3].id).execute();
    h.viewer = tomas;
    const res = await weekCards.GET(get(`/api/athletes/${tomas.id}/cards?from=2027-01-04&weeks=4&size=a5`), idParams(tomas.id));
    expect(res.status).toBe(200);
    expect(res.headers.get("content-disposition")).toMatch(/filename="tomas-brenner-4-weeks-from-2027-W01\.pdf"/);
    const { text } = await readPdf(res);
    expect(text).toContain("Pull day · Fri 15 Jan 2027");
    expect(text).not.toContain("Thu 14 Jan 2027");
    expect(text.match(/Tomas Brenner · \w[\w ]* · \w{3} \d+ Jan 2027/g)?.length).toBeGreaterThanOrEqual(4);
  });

  it("keeps the pack to the athlete and their coach, and says so when a week has nothing planned", async () => {
    for (const viewer of [stranger, maya]) {
      h.viewer = viewer;
      const res = await weekCards.GET(get(`/api/athletes/${tomas.id}/cards?from=2027-01-04`), idParams(tomas.id));
      expect(res.status).toBe(404);
    }
    h.viewer = admin;
    expect((await weekCards.GET(get(`/api/athletes/${tomas.id}/cards?from=2027-01-04`), idParams(tomas.id))).status).toBe(403);
    h.viewer = coach;
    const empty = await weekCards.GET(get(`/api/athletes/${tomas.id}/cards?from=2027-03-01`), idParams(tomas.id));
    expect(empty.status).toBe(404);
    expect((await empty.json()).error.message).toBe("No sessions are planned for Tomas Brenner from 2027-03-01 to 2027-03-07.");
    const noFrom = await weekCards.GET(get(`/api/athletes/${tomas.id}/cards`), idParams(tomas.id));
    expect(noFrom.status).toBe(422);
    expect(Object.keys((await noFrom.json()).error.fields)).toEqual(["from"]);
    const twoWeeks = await weekCards.GET(get(`/api/athletes/${tomas.id}/cards?from=2027-01-04&weeks=2`), idParams(tomas.id));
    expect((await twoWeeks.json()).error.fields.weeks).toBe("weeks is 1 or 4");
  });

  describe("e-mailing the week's pack", () => {
    let dir: string;
    let mailbox: Mailbox;

    beforeAll(async () => {
      mailbox = await startMailbox("iq-cards-mail-");
      dir = mailbox.dir;
      // A real queue with no worker: the POST only queues, and the tests run the job's handler themselves.
      h.boss = await startScratchBoss(scratch);
    });
    afterAll(async () => {
      await stopBoss(h.boss);
      await mailbox?.close();
    });

    it("queues the e-mail when their coach asks, and its job sends the athlete the week's cards as a PDF attachment", async () => {
      h.viewer = coach;
      const res = await weekCards.POST(post(`/api/athletes/${tomas.id}/cards`, { from: "2027-01-04" }), idParams(tomas.id));
      expect(res.status).toBe(202);
      const { job } = await res.json();
      expect(job).toMatchObject({ kind: "card-pack", status: "queued", total: 1, done: 0 });
      expect(readStoredMessages(dir)).toHaveLength(0);
      await handleCardPack(scratch.db, { jobRunId: job.id });
      const run = await scratch.db.selectFrom("job_runs").select(["status", "result"]).where("id", "=", job.id).executeTakeFirstOrThrow();
      expect(run).toEqual({ status: "done", result: { to: "tomas@c.test", sessions: 2, fileName: "tomas-brenner-week-2027-W01.pdf" } });
      const [m] = readStoredMessages(dir);
      expect(m.to).toEqual(["tomas@c.test"]);
      expect(m.subject).toBe("Your session cards for 4–10 Jan 2027");
      expect(m.text).toContain("Rowan Hale sent you");
      expect(m.text).toContain("Train safe.");
      expect(m.attachments).toHaveLength(1);
      expect(m.attachments[0]).toMatchObject({ filename: "tomas-brenner-week-2027-W01.pdf", contentType: "application/pdf" });
      const attached = new Response(readFileSync(join(dir, m.attachments[0].file)));
      const { text } = await readPdf(attached);
      expect(text).toContain("Tomas Brenner · Squat day · Mon 4 Jan 2027");
    });

    it("lets only the coach send, not for someone else's athlete nor an empty week, and queues nothing then", async () => {
      const runs = async () => (await scratch.db.selectFrom("job_runs").select("id").execute()).length;
      const queuedBefore = await runs();
      h.viewer = tomas;
      expect((await weekCards.POST(post(`/api/athletes/${tomas.id}/cards`, { from: "2027-01-04" }), idParams(tomas.id))).status).toBe(403);
      h.viewer = stranger;
      expect((await weekCards.POST(post(`/api/athletes/${tomas.id}/cards`, { from: "2027-01-04" }), idParams(tomas.id))).status).toBe(404);
      h.viewer = coach;
      const bad = await weekCards.POST(post(`/api/athletes/${tomas.id}/cards`, { from: "4 Jan" }), idParams(tomas.id));
      expect(bad.status).toBe(422);
      const empty = await weekCards.POST(post(`/api/athletes/${tomas.id}/cards`, { from: "2027-03-03" }), idParams(tomas.id));
      expect(empty.status).toBe(404);
      // Wednesday 3 Mar 2027 is in the ISO week Mon 1 – Sun 7 Mar (ISO 8601).
      expect((await empty.json()).error).toMatchObject({
        message: "No sessions are planned for Tomas Brenner in the week of 2027-03-03 (2027-03-01 to 2027-03-07), so there is nothing to send.",
        fields: { from: "No sessions in that week" },
      });
      expect(await runs()).toBe(queuedBefore);
      expect(readStoredMessages(dir)).toHaveLength(1);
    });
  });
});
