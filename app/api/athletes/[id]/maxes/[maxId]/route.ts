import { getDb } from "@/db/client";
import { deleteMax } from "@/db/athleteMaxes";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith } from "@/server/http";
import { maxParamsSchema } from "./schema";

type Ctx = { params: Promise<{ id: string; maxId: string }> };

/** Deletes one wrongly entered max; the rest of the history stays. */
export async function DELETE(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach", "athlete"]);
    const { id, maxId } = parseWith(maxParamsSchema, await ctx.params);
    return ok(await deleteMax(getDb(), viewer, id, maxId));
  });
}
