import { getDb } from "@/db/client";
import { getMyPurchase } from "@/db/purchases";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith } from "@/server/http";
import { idParamsSchema } from "./schema";

/** One receipt, with the buyer's copy while the purchase stands. */
export async function GET(_req: Request, ctx: { params: Promise<{ id: string }> }) {
  return answer(async () => {
    const viewer = await requireViewer(["athlete"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    return ok(await getMyPurchase(getDb(), viewer, id));
  });
}
