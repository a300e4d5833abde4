import { getDb } from "@/db/client";
import { type CalendarFeed, getFeed, revokeFeed, rotateFeed } from "@/db/calendarFeeds";
import { athleteIdFor } from "@/app/api/sessions/_lib/athlete";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, queryOf, readJson } from "@/server/http";
import { feedPath } from "../_lib/paths";
import { feedTargetSchema } from "./schema";

function withUrl(feed: CalendarFeed) {
  return { token: feed.token, createdAt: feed.createdAt, url: feedPath(feed.token) };
}

/** The athlete's live calendar link, or null when it is off. */
export async function GET(req: Request) {
  return answer(async () => {
    const viewer = await requireViewer(["athlete", "coach"]);
    const { athleteId } = parseWith(feedTargetSchema, queryOf(req));
    const feed = await getFeed(getDb(), viewer, athleteIdFor(viewer, athleteId));
    return ok({ feed: feed ? withUrl(feed) : null });
  });
}

/** Turns the link on, or replaces it (the old one stops working at once). */
export async function POST(req: Request) {
  return answer(async () => {
    const viewer = await requireViewer(["athlete", "coach"]);
    const { athleteId } = await readJson(req, feedTargetSchema, { emptyIsObject: true });
    const { replaced, ...feed } = await rotateFeed(getDb(), viewer, athleteIdFor(viewer, athleteId));
    return ok({ feed: withUrl(feed), replaced }, 201);
  });
}

/** Turns the link off. */
export async function DELETE(req: Request) {
  return answer(async () => {
    const viewer = await requireViewer(["athlete", "coach"]);
    const { athleteId } = await readJson(req, feedTargetSchema, { emptyIsObject: true });
    return ok(await revokeFeed(getDb(), viewer, athleteIdFor(viewer, athleteId)));
  });
}
