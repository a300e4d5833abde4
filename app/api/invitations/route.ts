import { getDb } from "@/db/client";
import { listInvitations } from "@/db/invitations";
import { requireViewer } from "@/server/guard";
import { answer, ok, readJson } from "@/server/http";
import { inviteAthlete } from "@/server/mail/invitations";
import { createInvitationSchema } from "./schema";
import { toItem } from "./wire";

/** The coach's invitations, newest first, each with its state. */
export async function GET() {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const invitations = await listInvitations(getDb(), viewer);
    return ok({ invitations: invitations.map(toItem) });
  });
}

/** Invites an athlete by e-mail (201); the e-mail carries a link good for 7 days. */
export async function POST(req: Request) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const body = await readJson(req, createInvitationSchema);
    const invitation = await inviteAthlete(getDb(), viewer, body);
    return ok({ invitation: toItem(invitation) }, 201);
  });
}
