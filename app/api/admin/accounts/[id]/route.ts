import { updateAccount } from "@/db/accounts";
import { getDb } from "@/db/client";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, readJson } from "@/server/http";
import { accountChangeSchema, idParamsSchema } from "./schema";

/** Disables or enables an account (its open sessions end at once) or changes its role. Admins only; never one's own account. */
export async function PATCH(req: Request, ctx: { params: Promise<{ id: string }> }) {
  return answer(async () => {
    const viewer = await requireViewer(["admin"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const change = await readJson(req, accountChangeSchema);
    const account = await updateAccount(getDb(), viewer, id, change);
    return ok({ account: { ...account, createdAt: account.createdAt.toISOString() } });
  });
}
