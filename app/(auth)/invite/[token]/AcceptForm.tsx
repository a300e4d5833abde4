"use client";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useActionState, useEffect, useRef } from "react";
import { FormAlert, FormField } from "@/components/invitations/FormField";
import { acceptInvitationAction } from "./actions";
import type { AcceptState } from "./schema";

/**
 * Accepts an invitation: a new athlete sets a name and password; someone who already has an
 * athlete account gives its password. Either way they are signed straight in afterwards.
 */
export function AcceptForm({ token, email, mode, suggestedName }: { token: string; email: string; mode: "new" | "existing"; suggestedName: string }) {
  const router = useRouter();
  const initial: AcceptState = { ok: false, message: null, fields: {}, values: { name: suggestedName }, email: null, closed: null };
  const [state, action, pending] = useActionState(acceptInvitationAction, initial);
  // React clears the form after an action; keep the typed password for the sign-in that follows.
  const typedPassword = useRef("");

  useEffect(() => {
    if (state.closed) {
      // The link stopped working meanwhile; the page itself says why.
      router.refresh();
      return;
    }
    if (!state.ok || !state.email) return;
    const accountEmail = state.email;
    void signIn("credentials", { email: accountEmail, password: typedPassword.current, redirect: false }).then((res) => {
      router.push(res && !res.error ? "/athlete" : `/signin?${new URLSearchParams({ email: accountEmail, notice: "joined" })}`);
      router.refresh();
    });
  }, [state, router]);

  const busy = pending || state.ok;
  return (
    <form
      action={action}
      onSubmit={(e) => (typedPassword.current = String(new FormData(e.currentTarget).get("password") ?? ""))}
      noValidate
      className="space-y-4"
      data-testid="accept-invitation-form"
    >
      <input type="hidden" name="token" value={token} />
      <input type="hidden" name="mode" value={mode} />
      <FormField id="email" label="E-mail" type="email" autoComplete="username" defaultValue={email} readOnly />
      {mode === "new" ? (
        <>
          <FormField id="name" label="Your name" autoComplete="name" defaultValue={state.values.name} error={state.fields.name} />
          <FormField id="password" label="New password" type="password" autoComplete="new-password" hint="At least 10 characters." error={state.fields.password} />
          <FormField id="confirm" label="Repeat the password" type="password" autoComplete="new-password" error={state.fields.confirm} />
        </>
      ) : (
        <FormField id="password" label="Your current password" type="password" autoComplete="current-password" error={state.fields.password} />
      )}
      <FormAlert message={state.ok ? null : state.message} />
      <button type="submit" disabled={busy} className="btn-primary w-full">
        {busy ? "Joining…" : mode === "new" ? "Create my account" : "Link my account"}
      </button>
    </form>
  );
}
