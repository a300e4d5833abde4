"use client";
import { useActionState } from "react";
import { FormAlert, FormField } from "@/components/invitations/FormField";
import { requestResetAction } from "./actions";
import type { ResetRequestState } from "./schema";

/** Asks for a reset link; the same calm answer whoever the address belongs to. */
export function ResetRequestForm({ defaultEmail }: { defaultEmail: string }) {
  const [state, action, pending] = useActionState(requestResetAction, { sent: false, message: null, fields: {}, email: defaultEmail } satisfies ResetRequestState);
  if (state.sent) {
    return (
      <div className="space-y-4">
        <p role="status" data-testid="reset-sent" className="rounded-md bg-moss-100 px-3 py-2 text-sm text-moss-700">
          {state.message}
        </p>
        <p className="text-sm text-iron-500">The e-mail goes to {state.email}. You can close this page.</p>
      </div>
    );
  }
  return (
    <form action={action} noValidate className="space-y-4" data-testid="reset-request-form">
      <FormField id="email" label="E-mail" type="email" autoComplete="email" defaultValue={state.email} error={state.fields.email} />
      <FormAlert message={state.message} />
      <button type="submit" disabled={pending} className="btn-primary w-full">
        {pending ? "Sending…" : "Send me a link"}
      </button>
    </form>
  );
}
