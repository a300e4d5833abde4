"use client";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import type { InvitationItem, InvitationListResponse, InvitationResponse, InvitationState } from "@/app/api/invitations/types";
import { api, describeFailure } from "@/components/templates/api";
import { INVITATIONS_KEY } from "./keys";

const DAY = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric" });

const STATE_LABEL: Record<InvitationState, string> = { pending: "Waiting", accepted: "Joined", expired: "Expired", revoked: "Revoked" };
const STATE_STYLE: Record<InvitationState, string> = {
  pending: "bg-brass-100 text-iron-700",
  accepted: "bg-moss-100 text-moss-700",
  expired: "bg-chalk-200 text-iron-600",
  revoked: "bg-chalk-200 text-iron-500",
};

function detail(i: InvitationItem): string {
  switch (i.state) {
    case "pending":
      return `Sent ${DAY.format(new Date(i.sentAt))} · link open until ${DAY.format(new Date(i.expiresAt))}`;
    case "expired":
      return `Link ran out ${DAY.format(new Date(i.expiresAt))} · resend for a fresh week`;
    case "accepted":
      return `Joined ${DAY.format(new Date(i.acceptedAt ?? i.sentAt))}`;
    case "revoked":
      return "Link withdrawn";
  }
}

/** The coach's invitations with their state; open and expired ones can be resent or revoked. */
export function InvitationList({ initial }: { initial: InvitationListResponse }) {
  const qc = useQueryClient();
  const [notice, setNotice] = useState<{ kind: "ok" | "error"; text: string } | null>(null);
  const list = useQuery({ queryKey: INVITATIONS_KEY, queryFn: () => api<InvitationListResponse>("/api/invitations"), initialData: initial });
  const done = (text: string) => {
    setNotice({ kind: "ok", text });
    void qc.invalidateQueries({ queryKey: INVITATIONS_KEY });
  };
  const fail = (e: unknown) => setNotice({ kind: "error", text: describeFailure(e) });
  const resend = useMutation({
    mutationFn: (id: string) => api<InvitationResponse>(`/api/invitations/${id}/resend`, { method: "POST" }),
    onSuccess: ({ invitation }) => done(`A fresh link went to ${invitation.email}; the earlier one no longer works.`),
    onError: fail,
  });
  const revoke = useMutation({
    mutationFn: (id: string) => api<InvitationResponse>(`/api/invitations/${id}`, { method: "DELETE" }),
    onSuccess: ({ invitation }) => done(`The invitation to ${invitation.email} is revoked; its link no longer works.`),
    onError: fail,
  });

  const items = list.data?.invitations ?? [];
  return (
    <div className="space-y-3">
      {notice ? (
        <p role={notice.kind === "error" ? "alert" : "status"} data-testid="invitation-notice" className={notice.kind === "error" ? "text-sm text-ember-700" : "text-sm text-moss-700"}>
          {notice.text}
        </p>
      ) : null}
      {list.isError ? <p className="text-sm text-ember-700">The invitations could not be loaded. {describeFailure(list.error)}</p> : null}
      {items.length === 0 ? (
        <p className="text-sm text-iron-400">No invitations yet. Invite someone above and they show up here until they join.</p>
      ) : (
        <ul className="divide-y divide-chalk-200" data-testid="invitation-list">
          {items.map((i) => {
            const open = i.state === "pending" || i.state === "expired";
            const busy = (resend.isPending && resend.variables === i.id) || (revoke.isPending && revoke.variables === i.id);
            return (
              <li key={i.id} className="flex flex-wrap items-center gap-x-3 gap-y-2 py-3" data-testid="invitation-row" data-state={i.state} data-email={i.email}>
                <div className="min-w-0 flex-1 basis-48">
                  <div className="flex flex-wrap items-center gap-2">
                    <span className="min-w-0 break-all font-medium text-iron">{i.name ? `${i.name} · ` : ""}{i.email}</span>
                    <span className={`rounded px-1.5 py-0.5 text-xs font-semibold ${STATE_STYLE[i.state]}`} data-testid="invitation-state">
                      {STATE_LABEL[i.state]}
                    </span>
                  </div>
                  <p className="mt-0.5 text-xs text-iron-400">{detail(i)}</p>
                </div>
                {open ? (
                  <div className="flex gap-2">
                    <button type="button" className="btn-quiet px-3 py-1.5" disabled={busy} aria-label={`Resend the invitation to ${i.email}`} onClick={() => resend.mutate(i.id)}>
                      Resend
                    </button>
                    <button type="button" className="btn-quiet px-3 py-1.5" disabled={busy} aria-label={`Revoke the invitation to ${i.email}`} onClick={() => revoke.mutate(i.id)}>
                      Revoke
                    </button>
                  </div>
                ) : null}
              </li>
            );
          })}
        </ul>
      )}
    </div>
  );
}
