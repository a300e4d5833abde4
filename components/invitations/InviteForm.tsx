"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import type { InvitationResponse } from "@/app/api/invitations/types";
import { api, ApiFailure, describeFailure } from "@/components/templates/api";
import { INVITATIONS_KEY } from "./keys";

// The same rules the server applies (app/api/invitations/schema.ts), checked before sending.
const schema = z.object({
  email: z.string().trim().min(1, "Enter the athlete's e-mail address").max(254, "Keep the e-mail under 254 characters").email("Enter a valid e-mail address"),
  name: z.string().trim().max(120, "Keep the name under 120 characters"),
});
type Values = z.infer<typeof schema>;

/** Invites an athlete by e-mail; the list below picks the new invitation up. */
export function InviteForm() {
  const qc = useQueryClient();
  const [status, setStatus] = useState<{ kind: "ok" | "error"; text: string } | null>(null);
  const form = useForm<Values>({ resolver: zodResolver(schema), defaultValues: { email: "", name: "" } });
  const { errors } = form.formState;

  const invite = useMutation({
    mutationFn: (v: Values) => api<InvitationResponse>("/api/invitations", { method: "POST", json: { email: v.email, name: v.name || null } }),
    onSuccess: ({ invitation }) => {
      setStatus({ kind: "ok", text: `Invitation sent to ${invitation.email}. The link in it works once, for 7 days.` });
      form.reset();
      void qc.invalidateQueries({ queryKey: INVITATIONS_KEY });
    },
    onError: (e) => {
      if (e instanceof ApiFailure) {
        for (const [field, message] of Object.entries(e.error.fields)) if (field === "email" || field === "name") form.setError(field, { message });
      }
      setStatus({ kind: "error", text: describeFailure(e) });
    },
  });

  return (
    <form
      onSubmit={form.handleSubmit((v) => {
        setStatus(null);
        invite.mutate(v);
      })}
      noValidate
      className="space-y-3"
      data-testid="invite-form"
    >
      <div>
        <label className="field-label" htmlFor="invite-email">Athlete&apos;s e-mail</label>
        <input
          id="invite-email"
          type="email"
          inputMode="email"
          autoComplete="off"
          className="field-input"
          aria-invalid={!!errors.email}
          aria-describedby={errors.email ? "invite-email-error" : undefined}
          {...form.register("email")}
        />
        {errors.email ? <p id="invite-email-error" className="field-error">{errors.email.message}</p> : null}
      </div>
      <div>
        <label className="field-label" htmlFor="invite-name">
          Name <span className="font-normal text-iron-400">(optional, to greet them)</span>
        </label>
        <input
          id="invite-name"
          autoComplete="off"
          className="field-input"
          aria-invalid={!!errors.name}
          aria-describedby={errors.name ? "invite-name-error" : undefined}
          {...form.register("name")}
        />
        {errors.name ? <p id="invite-name-error" className="field-error">{errors.name.message}</p> : null}
      </div>
      <button type="submit" className="btn-primary w-full sm:w-auto" disabled={invite.isPending}>
        {invite.isPending ? "Sending…" : "Send invitation"}
      </button>
      {status ? (
        <p
          role={status.kind === "error" ? "alert" : "status"}
          data-testid="invite-status"
          className={status.kind === "error" ? "text-sm text-ember-700" : "text-sm text-moss-700"}
        >
          {status.text}
        </p>
      ) : null}
    </form>
  );
}
