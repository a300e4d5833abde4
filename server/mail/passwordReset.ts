import "server-only";
import type { Db } from "@/db/athleteAccess";
import { createPasswordReset, RESET_MINUTES } from "@/db/passwordResets";
import { publicBaseUrl } from "./config";
import { passwordResetMessage } from "./messages";
import { sendMail } from "./send";

/**
 * Starts a password reset for whoever owns `email`, if anyone. The caller answers the same
 * whatever happens and does not wait for `delivery`: the time to answer must not tell an
 * existing account (which gets a mail) from a missing one (which does not).
 */
export async function requestPasswordReset(db: Db, email: string): Promise<{ delivery: Promise<boolean> }> {
  const issued = await createPasswordReset(db, email);
  if (!issued) return { delivery: Promise.resolve(false) };
  const delivery = (async () => {
    await sendMail(
      passwordResetMessage({ to: issued.user.email, name: issued.user.name, baseUrl: publicBaseUrl(), token: issued.token, minutes: RESET_MINUTES }),
    );
    return true;
  })().catch((err: unknown) => {
    console.error("[ironquill] the password reset e-mail was not sent:", err instanceof Error ? err.message : err);
    return false;
  });
  return { delivery };
}
