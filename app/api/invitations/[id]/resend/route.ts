import { getDb } from "@/db/client";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, readJson } from "@/server/http";
import { resendInvitationMail } from "@/server/mail/invitations";
import { toItem } from "../../wire";
import { invitationParamsSchema } from "../schema";
import { resendBodySchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

/** E-mails a fresh link with a new week to run; the previous link stops working. */
export async function POST(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id } = parseWith(invitationParamsSchema, await ctx.params);
    await readJson(req, resendBodySchema, { emptyIsObject: true });
    const invitation = await resendInvitationMail(getDb(), viewer, id);
    return ok({ invitation: toItem(invitation) });
  });
}
