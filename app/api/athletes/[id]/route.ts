import { getDb } from "@/db/client";
import { athleteOverview } from "@/db/athleteProfiles";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith } from "@/server/http";
import { athleteParamsSchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

/** Name, e-mail, equipment and current maxes. The athlete themself or their coach; anyone else gets not_found. */
export async function GET(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach", "athlete"]);
    const { id } = parseWith(athleteParamsSchema, await ctx.params);
    return ok(await athleteOverview(getDb(), viewer, id));
  });
}
