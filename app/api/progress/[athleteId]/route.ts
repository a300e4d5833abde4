import { getDb } from "@/db/client";
import { listProposals } from "@/db/maxProposals";
import { athleteProgress } from "@/db/progress";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith } from "@/server/http";
import { progressParamsSchema } from "./schema";

type Ctx = { params: Promise<{ athleteId: string }> };

/** Estimated 1RM per exercise with personal bests, weekly volume, logged sessions, stalls and open max proposals. */
export async function GET(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["athlete", "coach"]);
    const { athleteId } = parseWith(progressParamsSchema, await ctx.params);
    const db = getDb();
    const progress = await athleteProgress(db, viewer, athleteId);
    return ok({ progress, proposals: await listProposals(db, viewer, athleteId) });
  });
}
