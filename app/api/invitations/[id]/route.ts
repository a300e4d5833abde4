import { getDb } from "@/db/client";
import { revokeInvitation } from "@/db/invitations";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith } from "@/server/http";
import { toItem } from "../wire";
import { invitationParamsSchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

/** Withdraws an invitation that has not been accepted; its link stops working at once. */
export async function DELETE(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id } = parseWith(invitationParamsSchema, await ctx.params);
    const invitation = await revokeInvitation(getDb(), viewer, id);
    return ok({ invitation: toItem(invitation) });
  });
}
