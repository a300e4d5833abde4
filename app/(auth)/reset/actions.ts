"use server";
import { getDb } from "@/db/client";
import { DomainError } from "@/db/domainError";
import { LinkClosedError } from "@/db/invitations";
import { completePasswordReset } from "@/db/passwordResets";
import { hashPassword } from "@/server/auth";
import { fieldErrorsFromZod } from "@/server/errors";
import { requestPasswordReset } from "@/server/mail/passwordReset";
import { newPasswordSchema, type NewPasswordState, RESET_SENT_MESSAGE, resetRequestSchema, type ResetRequestState } from "./schema";

/**
 * Asks for a reset link. The answer is the same whether or not the address has an account, and
 * it does not wait for the e-mail to go out, so neither the words nor the time give that away.
 */
export async function requestResetAction(_prev: ResetRequestState, form: FormData): Promise<ResetRequestState> {
  const email = String(form.get("email") ?? "");
  const parsed = resetRequestSchema.safeParse({ email });
  if (!parsed.success) return { sent: false, message: "Check the e-mail address.", fields: fieldErrorsFromZod(parsed.error), email };
  try {
    await requestPasswordReset(getDb(), parsed.data.email);
  } catch (err) {
    // Still the same answer: a failure here must not be a way to learn about accounts either.
    console.error("[ironquill] starting a password reset failed:", err);
  }
  return { sent: true, message: RESET_SENT_MESSAGE, fields: {}, email: parsed.data.email };
}

/** Sets the new password through a reset link, once. */
export async function setNewPasswordAction(_prev: NewPasswordState, form: FormData): Promise<NewPasswordState> {
  const base = { ok: false, email: null, closed: null } as const;
  const parsed = newPasswordSchema.safeParse({
    token: String(form.get("token") ?? ""),
    password: String(form.get("password") ?? ""),
    confirm: String(form.get("confirm") ?? ""),
  });
  if (!parsed.success) return { ...base, message: "Some details need another look.", fields: fieldErrorsFromZod(parsed.error) };
  try {
    const done = await completePasswordReset(getDb(), parsed.data.token, await hashPassword(parsed.data.password));
    return { ok: true, message: null, fields: {}, email: done.email, closed: null };
  } catch (err) {
    if (err instanceof LinkClosedError) {
      const closed = err.state === "used" || err.state === "expired" ? err.state : "unknown";
      return { ...base, message: err.message, fields: {}, closed };
    }
    if (err instanceof DomainError) return { ...base, message: err.message, fields: err.fields };
    console.error("[ironquill] setting a new password failed:", err);
    return { ...base, message: "We couldn't save the new password just now. Nothing was changed; please try again.", fields: {} };
  }
}
