import { getDb } from "@/db/client";
import { addMax, maxesView } from "@/db/athleteMaxes";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, readJson } from "@/server/http";
import { athleteParamsSchema, maxBodySchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

/** Current maxes and each exercise's full history, newest first. */
export async function GET(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach", "athlete"]);
    const { id } = parseWith(athleteParamsSchema, await ctx.params);
    return ok(await maxesView(getDb(), viewer, id));
  });
}

/** Adds a max; `recomputed` is how many upcoming sessions were re-planned. */
export async function POST(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach", "athlete"]);
    const { id } = parseWith(athleteParamsSchema, await ctx.params);
    const body = await readJson(req, maxBodySchema);
    return ok(await addMax(getDb(), viewer, id, body), 201);
  });
}
