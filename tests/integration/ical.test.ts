import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import type { Kysely } from "kysely";
import ICAL from "ical.js";
import { sessionRows } from "../../db/assignments";
import type { Database } from "../../db/database";
import { FEED_PAST_DAYS } from "../../db/calendarFeeds";
import { todayUtc } from "../../db/recompute";
import { createTemplate } from "../../db/templates";
import { addDays, nextOnOrAfter } from "../../lib/dates";
import { CAUTION_TEXT } from "../../components/Caution";
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

const feedRoute = await import("../../app/api/calendar/feed/route");
const icsRoute = await import("../../app/api/calendar/[token]/route");

const SOURCE = "title: Feed test\nunits: kg\nblock Base 2w\nday Squat day mon\n  back squat 3x5 @75% \"sit between the heels\"\nday Pull day thu\n  deadlift 2x5 @80%\n";

/** GETs a feed path ("/api/calendar/<token>.ics") through the route handler. */
async function fetchFeed(path: string): Promise<Response> {
  const token = path.replace("/api/calendar/", "");
  return icsRoute.GET(request("GET", path), params({ token }));
}

describe("iCalendar feed", () => {
  let scratch: Awaited<ReturnType<typeof migratedScratchDb>>;
  let coach: Person;
  let stranger: Person;
  let athlete: Person;
  let sessions: { id: string; date: string; title: string }[];
  let oldSessionId: string;

  beforeAll(async () => {
    scratch = await migratedScratchDb();
    h.db = scratch.db;
    coach = await addPerson(scratch.db, "coach@f.test", "Rowan", "coach");
    stranger = await addPerson(scratch.db, "other@f.test", "Sky", "coach");
    athlete = await addPerson(scratch.db, "lena@f.test", "Lena", "athlete", coach.id);
    await addTestedMaxes(scratch.db, coach.id, athlete.id, { "back squat": 100, deadlift: 140 }, "2026-01-01");
    const template = await createTemplate(scratch.db, coach, { title: "Feed test", source: SOURCE });
    // Dated from the next Monday so the sessions are ahead of the feed's cut-off whenever this runs.
    const start = nextOnOrAfter(todayUtc(), "mon");
    const assigned = await assignWithSessions(scratch.db, { template, athlete, coachId: coach.id, start });
    sessions = assigned.rows;
    // One session long past: older than the feed reaches back, so it must not appear.
    const longAgo = addDays(todayUtc(), -FEED_PAST_DAYS - 30);
    const [first] = sessionRows(assigned.assignmentId, athlete.id, [{ ordinal: 99, session: assigned.plan.sessions[0] }]);
    const old = await scratch.db
      .insertInto("training_sessions")
      .values({ ...first, date: longAgo, planned_date: longAgo })
      .returning("id")
      .executeTakeFirstOrThrow();
    oldSessionId = old.id;
  });
  afterAll(async () => {
    await scratch?.drop();
  });

  it("gives the athlete a 256-bit link and nobody else's coach one", async () => {
    h.viewer = athlete;
    expect(await (await feedRoute.GET(request("GET", "/api/calendar/feed"))).json()).toEqual({ feed: null });
    const created = await feedRoute.POST(request("POST", "/api/calendar/feed", {}));
    expect(created.status).toBe(201);
    const { feed } = await created.json();
    // 32 random bytes in base64url without padding are 43 characters (RFC 4648 §5).
    expect(feed.token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(Buffer.from(feed.token, "base64url")).toHaveLength(32);
    expect(feed.url).toBe(`/api/calendar/${feed.token}.ics`);
    h.viewer = stranger;
    expect((await feedRoute.GET(request("GET", `/api/calendar/feed?athleteId=${athlete.id}`))).status).toBe(404);
    expect((await feedRoute.POST(request("POST", "/api/calendar/feed", { athleteId: athlete.id }))).status).toBe(404);
    h.viewer = coach;
    expect((await (await feedRoute.GET(request("GET", `/api/calendar/feed?athleteId=${athlete.id}`))).json()).feed.token).toBe(feed.token);
  });

  it("serves a calendar that Mozilla's parser reads as one all-day event per session", async () => {
    h.viewer = athlete;
    const { feed } = await (await feedRoute.GET(request("GET", "/api/calendar/feed"))).json();
    h.viewer = null; // a calendar app has no session: the token alone opens the feed
    const res = await fetchFeed(feed.url);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/^text\/calendar/);
    const text = await res.text();

    const cal = new ICAL.Component(ICAL.parse(text));
    expect(cal.name).toBe("vcalendar");
    // RFC 5545 §3.7.3 and §3.7.4: PRODID is required and VERSION is 2.0.
    expect(cal.getFirstPropertyValue("prodid")).toBeTruthy();
    expect(cal.getFirstPropertyValue("version")).toBe("2.0");

    const events = cal.getAllSubcomponents("vevent");
    const expected = [...sessions].sort((a, b) => a.date.localeCompare(b.date));
    expect(events).toHaveLength(expected.length);
    expect(events.map((e) => e.getFirstPropertyValue("uid"))).not.toContain(`${oldSessionId}@ironquill`);
    for (const [i, event] of events.entries()) {
      const s = expected[i];
      // RFC 5545 §3.6.1: UID and DTSTAMP are required in a VEVENT.
      expect(event.getFirstPropertyValue("uid")).toBe(`${s.id}@ironquill`);
      expect(event.getFirstProperty("dtstamp")).toBeTruthy();
      // RFC 5545 §3.3.4: an all-day start is a DATE value, YYYYMMDD, with no time part.
      const start = event.getFirstProperty("dtstart")!;
      expect(start.type).toBe("date");
      expect((event.getFirstPropertyValue("dtstart") as ICAL.Time).isDate).toBe(true);
      expect((event.getFirstPropertyValue("dtstart") as ICAL.Time).toString()).toBe(s.date);
      expect(text).toContain(`DTSTART;VALUE=DATE:${s.date.replaceAll("-", "")}`);
      expect(event.getFirstPropertyValue("summary")).toBe(s.title);
      const description = String(event.getFirstPropertyValue("description"));
      expect(description).toContain(CAUTION_TEXT);
    }
    const squat = String(events[0].getFirstPropertyValue("description"));
    expect(squat).toMatch(/Back squat/);
    expect(squat).toMatch(/3 × 5 @ \d+(\.\d+)? kg \(per side [\d. ·]+\)/);
    expect(squat).toContain("“sit between the heels”");
  });

  it("keeps each event's UID when the session moves, so calendars update it in place", async () => {
    h.viewer = athlete;
    const { feed } = await (await feedRoute.GET(request("GET", "/api/calendar/feed"))).json();
    const moved = addDays(sessions[0].date, 1);
    await scratch.db.updateTable("training_sessions").set({ date: moved }).where("id", "=", sessions[0].id).execute();
    const cal = new ICAL.Component(ICAL.parse(await (await fetchFeed(feed.url)).text()));
    const event = cal.getAllSubcomponents("vevent").find((e) => e.getFirstPropertyValue("uid") === `${sessions[0].id}@ironquill`)!;
    expect((event.getFirstPropertyValue("dtstart") as ICAL.Time).toString()).toBe(moved);
  });

  it("stops the old link when the feed is replaced, and every link when it is turned off", async () => {
    h.viewer = athlete;
    const first = (await (await feedRoute.GET(request("GET", "/api/calendar/feed"))).json()).feed;
    const rotated = await (await feedRoute.POST(request("POST", "/api/calendar/feed", {}))).json();
    expect(rotated.replaced).toBe(true);
    expect(rotated.feed.token).not.toBe(first.token);
    expect((await fetchFeed(first.url)).status).toBe(404);
    expect((await fetchFeed(rotated.feed.url)).status).toBe(200);
    // The same token without the .ics ending is the same feed.
    expect((await fetchFeed(`/api/calendar/${rotated.feed.token}`)).status).toBe(200);

    h.viewer = coach;
    const off = await feedRoute.DELETE(request("DELETE", "/api/calendar/feed", { athleteId: athlete.id }));
    expect(await off.json()).toEqual({ revoked: true });
    const gone = await fetchFeed(rotated.feed.url);
    expect(gone.status).toBe(404);
    expect((await gone.json()).error.code).toBe("not_found");
    h.viewer = athlete;
    expect(await (await feedRoute.GET(request("GET", "/api/calendar/feed"))).json()).toEqual({ feed: null });
  });

  it("answers 404 for tokens that were never issued", async () => {
    for (const token of ["x".repeat(43) + ".ics", "short", "../../etc/passwd", ""]) {
      expect((await icsRoute.GET(request("GET", "/api/calendar/x"), params({ token }))).status).toBe(404);
    }
  });

  it("refuses a coach who does not say whose feed, naming the field", async () => {
    h.viewer = coach;
    const res = await feedRoute.POST(request("POST", "/api/calendar/feed", {}));
    expect(res.status).toBe(422);
    expect(Object.keys((await res.json()).error.fields)).toEqual(["athleteId"]);
  });
});
