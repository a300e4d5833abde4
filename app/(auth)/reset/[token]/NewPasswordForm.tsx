"use client";
import { useRouter } from "next/navigation";
import { useActionState, useEffect } from "react";
import { FormAlert, FormField } from "@/components/invitations/FormField";
import { setNewPasswordAction } from "../actions";
import type { NewPasswordState } from "../schema";

const initial: NewPasswordState = { ok: false, message: null, fields: {}, email: null, closed: null };

/** The new password, typed twice; then on to sign in with it. */
export function NewPasswordForm({ token, email }: { token: string; email: string }) {
  const router = useRouter();
  const [state, action, pending] = useActionState(setNewPasswordAction, initial);

  useEffect(() => {
    if (state.closed) router.refresh();
    else if (state.ok && state.email) router.push(`/signin?${new URLSearchParams({ email: state.email, notice: "reset" })}`);
  }, [state, router]);

  const busy = pending || state.ok;
  return (
    <form action={action} noValidate className="space-y-4" data-testid="new-password-form">
      <input type="hidden" name="token" value={token} />
      <FormField id="email" label="E-mail" type="email" autoComplete="username" defaultValue={email} readOnly />
      <FormField id="password" label="New password" type="password" autoComplete="new-password" hint="At least 10 characters." error={state.fields.password} />
      <FormField id="confirm" label="Repeat the password" type="password" autoComplete="new-password" error={state.fields.confirm} />
      <FormAlert message={state.ok ? null : state.message} />
      <button type="submit" disabled={busy} className="btn-primary w-full">
        {busy ? "Saving…" : "Save the new password"}
      </button>
    </form>
  );
}
