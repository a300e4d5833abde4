import "server-only";
import { randomBytes } from "node:crypto";
import { addDays } from "../lib/dates";
import type { Session as SessionPlan } from "../lib/load/types";
import { type Actor, type Db, requireAthleteFor } from "./athleteAccess";
import { todayUtc } from "./recompute";

/**
 * The athlete's calendar feed: a secret link a calendar app subscribes to.
 * The token is the only key (calendar apps cannot sign in), so it is 256
 * random bits, one live token per athlete, and rotating or revoking it stops
 * the old link at once.
 */

export type CalendarFeed = { token: string; createdAt: Date };

export type FeedSession = { id: string; date: string; title: string; plan: SessionPlan; completed: boolean };
export type FeedContent = { athleteName: string; sessions: FeedSession[] };

// 32 random bytes (256 bits) in base64url: 43 characters.
const TOKEN_BYTES = 32;
const TOKEN_SHAPE = /^[A-Za-z0-9_-]{43}$/;
/** Older sessions are left out: a calendar app re-reads the whole feed on every refresh. */
export const FEED_PAST_DAYS = 120;

export function newFeedToken(): string {
  return randomBytes(TOKEN_BYTES).toString("base64url");
}

/**
 * The athlete's live feed, or null when none is on.
 * @example await getFeed(db, viewer, viewer.id); // { token, createdAt } | null
 */
export async function getFeed(db: Db, actor: Actor, athleteId: string): Promise<CalendarFeed | null> {
  await requireAthleteFor(db, actor, athleteId);
  const row = await db
    .selectFrom("calendar_feeds")
    .select(["token", "created_at"])
    .where("athlete_id", "=", athleteId)
    .where("revoked_at", "is", null)
    .executeTakeFirst();
  return row ? { token: row.token, createdAt: row.created_at } : null;
}

/**
 * A new feed token; any live one is revoked in the same transaction, so
 * this both turns the feed on and rotates it.
 *
 * @example
 * const { token } = await rotateFeed(db, viewer, viewer.id); // the old link now answers 404
 */
export async function rotateFeed(db: Db, actor: Actor, athleteId: string): Promise<CalendarFeed & { replaced: boolean }> {
  const run = async (trx: Db) => {
    await requireAthleteFor(trx, actor, athleteId);
    const revoked = await trx
      .updateTable("calendar_feeds")
      .set({ revoked_at: new Date() })
      .where("athlete_id", "=", athleteId)
      .where("revoked_at", "is", null)
      .executeTakeFirst();
    const row = await trx
      .insertInto("calendar_feeds")
      .values({ token: newFeedToken(), athlete_id: athleteId, revoked_at: null })
      .returning(["token", "created_at"])
      .executeTakeFirstOrThrow();
    return { token: row.token, createdAt: row.created_at, replaced: Number(revoked.numUpdatedRows) > 0 };
  };
  return db.isTransaction ? run(db) : db.transaction().execute(run);
}

/**
 * Turns the feed off; the link stops working at once.
 * @example await revokeFeed(db, viewer, viewer.id); // { revoked: true }
 */
export async function revokeFeed(db: Db, actor: Actor, athleteId: string): Promise<{ revoked: boolean }> {
  await requireAthleteFor(db, actor, athleteId);
  const res = await db
    .updateTable("calendar_feeds")
    .set({ revoked_at: new Date() })
    .where("athlete_id", "=", athleteId)
    .where("revoked_at", "is", null)
    .executeTakeFirst();
  return { revoked: Number(res.numUpdatedRows) > 0 };
}

/**
 * What a live token shows: the athlete's sessions from {@link FEED_PAST_DAYS}
 * days back onwards. Null for an unknown or revoked token, or a disabled account.
 *
 * @example
 * const feed = await feedContent(db, token); // { athleteName, sessions } | null
 */
export async function feedContent(db: Db, token: string, options: { today?: string } = {}): Promise<FeedContent | null> {
  if (!TOKEN_SHAPE.test(token)) return null;
  const owner = await db
    .selectFrom("calendar_feeds as f")
    .innerJoin("users as u", "u.id", "f.athlete_id")
    .select(["u.id", "u.name"])
    .where("f.token", "=", token)
    .where("f.revoked_at", "is", null)
    .where("u.disabled_at", "is", null)
    .executeTakeFirst();
  if (!owner) return null;
  const since = addDays(options.today ?? todayUtc(), -FEED_PAST_DAYS);
  const rows = await db
    .selectFrom("training_sessions")
    .select(["id", "date", "title", "plan", "completed_at"])
    .where("athlete_id", "=", owner.id)
    .where("date", ">=", since)
    .orderBy("date")
    .orderBy("ordinal")
    .execute();
  return {
    athleteName: owner.name,
    sessions: rows.map((r) => ({ id: r.id, date: r.date, title: r.title, plan: r.plan, completed: r.completed_at !== null })),
  };
}
