import { getDb } from "@/db/client";
import { saveSet } from "@/db/logs";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, readJson } from "@/server/http";
import { sessionParamsSchema, setBodySchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

/** Saves one set; sending the same set again updates it (an older replay is answered `stale: true`). */
export async function PUT(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["athlete"]);
    const { id } = parseWith(sessionParamsSchema, await ctx.params);
    const body = await readJson(req, setBodySchema);
    return ok(await saveSet(getDb(), viewer, id, body));
  });
}
