"use client";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useActionState, useEffect, useRef } from "react";
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
      <Field id="name" label="Your name" autoComplete="name" defaultValue={state.values.name} error={state.fields.name} />
      <Field id="email" label="E-mail" type="email" autoComplete="email" defaultValue={state.values.email} error={state.fields.email} />
      <Field id="password" label="Password" type="password" autoComplete="new-password" hint="At least 10 characters." error={state.fields.password} />
      {state.message && !state.ok ? (
        <p role="alert" data-testid="form-error" className="rounded-md bg-ember-50 px-3 py-2 text-sm text-ember-700">
          {state.message}
        </p>
      ) : null}
      <button type="submit" disabled={pending || state.ok} className="btn-primary w-full">
        {pending || state.ok ? "Creating your desk…" : "Create coach account"}
      </button>
    </form>
  );
}

function Field(props: { id: string; label: string; type?: string; autoComplete: string; defaultValue?: string; error?: string; hint?: string}) {
  const describedBy = props.error ? `${props.id}-error` : props.hint ? `${props.id}-hint` : undefined;
  return (
    <div>
      <label htmlFor={props.id} className="field-label">{props.label}</label>
      <input
        id={props.id}
        name={props.id}
        type={props.type ?? "text"}
        autoComplete={props.autoComplete}
        defaultValue={props.defaultValue}
        aria-invalid={props.error ? true : undefined}
        aria-describedby={describedBy}
        className="field-input"
      />
      {props.error ? (
        <p id={`${props.id}-error`} className="field-error">{props.error}</p>
      ) : props.hint ? (
        <p id={`${props.id}-hint`} className="mt-1 text-xs text-iron-400">{props.hint}</p>
      ) : null}
    </div>
  );
}
