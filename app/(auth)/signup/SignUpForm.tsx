"use client";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useActionState, useEffect, useRef } from "react";
import { FormAlert, FormField } from "@/components/invitations/FormField";
import { createCoachAccount } from "./actions";
import type { SignUpState } from "./schema";

const initial: SignUpState = { ok: false, message: null, fields: {}, values: { name: "", email: "" } };

export function SignUpForm() {
  const router = useRouter();
  const [state, action, pending] = useActionState(createCoachAccount, initial);
  // React resets the form after an action, so keep the typed password for the sign-in that follows.
  const typedPassword = useRef("");

  useEffect(() => {
    if (!state.ok) return;
    // The account exists; sign straight in with what was just typed.
    void signIn("credentials", { email: state.values.email, password: typedPassword.current, redirect: false }).then((res) => {
      router.push(res && !res.error ? "/coach" : "/signin");
      router.refresh();
    });
  }, [state, router]);

  return (
    <form action={action} onSubmit={(e) => (typedPassword.current = String(new FormData(e.currentTarget).get("password") ?? ""))} noValidate className="space-y-4">
      <FormField id="name" label="Your name" autoComplete="name" defaultValue={state.values.name} error={state.fields.name} />
      <FormField id="email" label="E-mail" type="email" autoComplete="email" defaultValue={state.values.email} error={state.fields.email} />
      <FormField id="password" label="Password" type="password" autoComplete="new-password" hint="At least 10 characters." error={state.fields.password} />
      <FormAlert message={state.ok ? null : state.message} />
      <button type="submit" disabled={pending || state.ok} className="btn-primary w-full">
        {pending || state.ok ? "Creating your desk…" : "Create coach account"}
      </button>
    </form>
  );
}
