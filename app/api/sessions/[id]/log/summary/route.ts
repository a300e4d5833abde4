import { getDb } from "@/db/client";
import { sessionSummary } from "@/db/progress";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith } from "@/server/http";
import { sessionParamsSchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

/** Sets done against planned, volume, best set and estimated 1RM per exercise, personal bests. */
export async function GET(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["athlete", "coach"]);
    const { id } = parseWith(sessionParamsSchema, await ctx.params);
    return ok({ summary: await sessionSummary(getDb(), viewer, id) });
  });
}
