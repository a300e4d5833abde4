import { getDb } from "@/db/client";
import { saveEquipment } from "@/db/athleteMaxes";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, readJson } from "@/server/http";
import { athleteParamsSchema, equipmentBodySchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

/** Replaces the athlete's equipment; `recomputed` is how many upcoming sessions were re-planned with it. */
export async function PUT(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach", "athlete"]);
    const { id } = parseWith(athleteParamsSchema, await ctx.params);
    const body = await readJson(req, equipmentBodySchema);
    return ok(await saveEquipment(getDb(), viewer, id, body));
  });
}
