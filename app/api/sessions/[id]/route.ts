import { getDb } from "@/db/client";
import { getSession, moveSession } from "@/db/sessions";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, readJson } from "@/server/http";
import { idParamsSchema, moveBodySchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

/** One session with its whole plan (loads, plates, ramps), for the athlete or their coach. */
export async function GET(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["athlete", "coach"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    return ok({ session: await getSession(getDb(), viewer, id) });
  });
}

/** Moves a session to another day; the planned day is kept. A completed session answers 409. */
export async function PATCH(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["athlete", "coach"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const { date } = await readJson(req, moveBodySchema);
    return ok({ session: await moveSession(getDb(), viewer, id, date) });
  });
}
