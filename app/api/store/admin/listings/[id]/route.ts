import { getDb } from "@/db/client";
import { setAdminUnlisted } from "@/db/listings";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, readJson } from "@/server/http";
import { idParamsSchema, unlistBodySchema } from "./schema";

export async function PATCH(req: Request, ctx: { params: Promise<{ id: string }> }) {
  return answer(async () => {
    const viewer = await requireViewer(["admin"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const body = await readJson(req, unlistBodySchema);
    return ok({ listing: await setAdminUnlisted(getDb(), viewer, id, body) });
  });
}
