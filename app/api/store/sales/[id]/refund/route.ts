import { getDb } from "@/db/client";
import { refundSale } from "@/server/payments/refund";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith } from "@/server/http";
import { idParamsSchema } from "./schema";

/** Refunds a paid sale in full through the provider and takes the buyer's copy away. */
export async function POST(_req: Request, ctx: { params: Promise<{ id: string }> }) {
  return answer(async () => {
    const viewer = await requireViewer(["coach", "admin"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    return ok(await refundSale(getDb(), viewer, id));
  });
}
