import "server-only";
import type { Db } from "@/db/athleteAccess";
import {
  createInvitation,
  INVITATION_DAYS,
  inTransaction,
  type InvitationSummary,
  type IssuedInvitation,
  resendInvitation,
} from "@/db/invitations";
import { AppError } from "../errors";
import { MailConfigError, publicBaseUrl } from "./config";
import { invitationMessage } from "./messages";
import { sendMail } from "./send";

type Actor = { id: string; role: "admin" | "coach" | "athlete" };

function baseUrl(): string {
  try {
    return publicBaseUrl();
  } catch (err) {
    if (err instanceof MailConfigError) console.error(`[ironquill] ${err.message}`);
    throw new AppError("unavailable", "E-mail links are not set up on this server, so nothing was sent or saved.");
  }
}

async function mailIt(issued: IssuedInvitation, resend: boolean): Promise<void> {
  const { invitation, token, coachName } = issued;
  await sendMail(
    invitationMessage({
      to: invitation.email,
      athleteName: invitation.name,
      coachName,
      baseUrl: baseUrl(),
      token,
      expiresAt: invitation.expiresAt,
      resend,
      days: INVITATION_DAYS,
    }),
  );
}

/**
 * Invites an athlete and e-mails the link. The invitation is stored in the same transaction the
 * mail is sent from: if the mail cannot go out, no invitation is left behind with a link nobody got.
 */
export async function inviteAthlete(db: Db, actor: Actor, input: { email: string; name: string | null }): Promise<InvitationSummary> {
  return inTransaction(db, async (trx) => {
    const issued = await createInvitation(trx, actor, input);
    await mailIt(issued, false);
    return issued.invitation;
  });
}

/** A fresh link for an open or expired invitation; the old link dies only if the new mail went out. */
export async function resendInvitationMail(db: Db, actor: Actor, id: string): Promise<InvitationSummary> {
  return inTransaction(db, async (trx) => {
    const issued = await resendInvitation(trx, actor, id);
    await mailIt(issued, true);
    return issued.invitation;
  });
}
