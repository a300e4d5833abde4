"use client";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { api, describeFailure } from "@/components/templates/api";
import type { ProposalView } from "@/db/maxProposals";

const SHORT = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", timeZone: "UTC" });
const fmt = (n: number) => (Number.isInteger(n) ? String(n) : n.toFixed(1));

/**
 * Max changes the logs suggest. The coach (or an athlete without one) accepts
 * — recording the new max and reworking future sessions — or dismisses;
 * everyone else only sees them.
 */
export function ProposalPanel({ proposals, canDecide }: { proposals: ProposalView[]; canDecide: boolean }) {
  const router = useRouter();
  const [done, setDone] = useState<Record<string, string>>({});
  const decide = useMutation({
    mutationFn: ({ id, decision }: { id: string; decision: "accept" | "dismiss" }) =>
      api<{ decision: string; updatedSessions?: number; value?: number; units?: string }>(`/api/max-proposals/${id}`, { method: "POST", json: { decision } }),
    onSuccess: (r, { id }) => {
      setDone((d) => ({ ...d, [id]: r.decision === "accept" ? `New max ${r.value} ${r.units} saved; ${r.updatedSessions} upcoming session${r.updatedSessions === 1 ? "" : "s"} reworked.` : "Dismissed." }));
      router.refresh();
    },
  });
  if (proposals.length === 0) return null;
  return (
    <section className="panel border-ember-400/50 p-4" data-testid="max-proposals" aria-label="Proposed max changes">
      <h2 className="text-base font-bold text-iron">Proposed max changes</h2>
      <p className="text-xs text-iron-500">From the median of the best sets of the last three sessions, when it differs from the max on file by more than 5 %.</p>
      <ul className="mt-3 divide-y divide-chalk-200">
        {proposals.map((p) => (
          <li key={p.id} className="flex flex-wrap items-center gap-3 py-3" data-testid="max-proposal">
            <div className="min-w-0 flex-1">
              <p className="font-semibold text-iron first-letter:uppercase">{p.exercise}</p>
              <p className="font-mono text-sm">
                {fmt(p.currentValue)} → <strong className={p.change > 0 ? "text-moss-700" : "text-ember-700"}>{fmt(p.proposedValue)}</strong> {p.units}
                <span className="ml-2 text-xs text-iron-500">
                  ({p.change > 0 ? "+" : ""}
                  {(p.change * 100).toFixed(1)} %)
                </span>
              </p>
              <p className="text-xs text-iron-400">sessions of {p.basis.map((b) => `${SHORT.format(new Date(`${b.date}T00:00:00Z`))} (${fmt(b.e1rm)})`).join(", ")}</p>
            </div>
            {done[p.id] ? (
              <p className="text-sm text-moss-700">{done[p.id]}</p>
            ) : canDecide ? (
              <div className="flex gap-2">
                <button type="button" className="btn-primary h-11" disabled={decide.isPending} onClick={() => decide.mutate({ id: p.id, decision: "accept" })}>
                  Accept
                </button>
                <button type="button" className="btn-quiet h-11" disabled={decide.isPending} onClick={() => decide.mutate({ id: p.id, decision: "dismiss" })}>
                  Dismiss
                </button>
              </div>
            ) : (
              <p className="text-xs text-iron-500">Your coach decides.</p>
            )}
          </li>
        ))}
      </ul>
      {decide.isError ? <p className="field-error">{describeFailure(decide.error)}</p> : null}
    </section>
  );
}
