import { getDb } from "@/db/client";
import { feedContent } from "@/db/calendarFeeds";
import { AppError } from "@/server/errors";
import { answer, parseWith } from "@/server/http";
import { feedCalendar } from "../_lib/ics";
import { tokenParamsSchema } from "./schema";

type Ctx = { params: Promise<{ token: string }> };

/**
 * The athlete's sessions as an iCalendar feed. Calendar apps cannot sign in,
 * so the secret token is the only key; a rotated or revoked token is not found.
 */
export async function GET(req: Request, ctx: Ctx) {
  return answer(async () => {
    const { token } = parseWith(tokenParamsSchema, await ctx.params);
    const feed = await feedContent(getDb(), token);
    if (!feed) throw new AppError("not_found", "This calendar link does not work: it may have been replaced or turned off.");
    const origin = process.env.NEXTAUTH_URL?.replace(/\/$/, "") || new URL(req.url).origin;
    return new Response(feedCalendar(feed, origin), {
      headers: {
        "content-type": "text/calendar; charset=utf-8",
        "content-disposition": 'inline; filename="ironquill-training.ics"',
        "cache-control": "no-store",
        "x-robots-tag": "noindex",
      },
    });
  });
}
