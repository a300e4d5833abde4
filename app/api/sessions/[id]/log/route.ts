import { getDb } from "@/db/client";
import { getLogSheet } from "@/db/logs";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith } from "@/server/http";
import { sessionParamsSchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

/** The session's plan with every set logged so far; the athlete or their coach. */
export async function GET(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["athlete", "coach"]);
    const { id } = parseWith(sessionParamsSchema, await ctx.params);
    return ok({ sheet: await getLogSheet(getDb(), viewer, id) });
  });
}
