"use client";
import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useCallback, useState } from "react";
import type { AssignmentListResponse, AssignmentSummary, EndResponse } from "@/app/api/assignments/types";
import { api, describeFailure } from "@/components/templates/api";
import { dayLabel } from "./dates";
import { UpgradeDialog } from "./UpgradeDialog";

/**
 * An athlete's assignments: template, version, start, status and sessions.
 * When the coach has saved a newer version, an Upgrade button previews what
 * changes before applying it; End asks once more before removing the sessions
 * still ahead (trained ones stay).
 */
export function AssignmentList({ athleteId }: { athleteId: string }) {
  const query = useQuery({
    queryKey: ["assignments", athleteId],
    queryFn: () => api<AssignmentListResponse>(`/api/assignments?athleteId=${encodeURIComponent(athleteId)}`),
  });
  const [upgrading, setUpgrading] = useState<AssignmentSummary | null>(null);
  // Stable, so the panel does not take focus back on every refresh of the list.
  const closeUpgrade = useCallback(() => setUpgrading(null), []);

  if (query.isLoading) return <p className="text-sm text-iron-400">Loading assignments…</p>;
  if (query.isError) return <p className="field-error">{describeFailure(query.error)}</p>;
  const list = query.data?.assignments ?? [];
  if (list.length === 0) return <p className="text-sm text-iron-500" data-testid="assignment-list-empty">No template assigned yet.</p>;
  return (
    <>
      <ul className="panel divide-y divide-chalk-200" data-testid="assignment-list">
        {list.map((a) => (
          <AssignmentRow key={a.id} a={a} onUpgrade={() => setUpgrading(a)} />
        ))}
      </ul>
      {upgrading && upgrading.latestVersion ? <UpgradeDialog assignment={upgrading} versionId={upgrading.latestVersion.id} onClose={closeUpgrade} /> : null}
    </>
  );
}

function AssignmentRow({ a, onUpgrade }: { a: AssignmentSummary; onUpgrade: () => void }) {
  const client = useQueryClient();
  const [confirming, setConfirming] = useState(false);
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<string | null>(null);

  async function end() {
    setBusy(true);
    try {
      const res = await api<EndResponse>(`/api/assignments/${a.id}`, { method: "DELETE" });
      setMessage(`Ended. ${res.removedSessions} session${res.removedSessions === 1 ? "" : "s"} ahead removed; ${res.keptSessions} kept.`);
      setConfirming(false);
      await client.invalidateQueries({ queryKey: ["assignments", a.athleteId] });
    } catch (e) {
      setMessage(describeFailure(e));
    } finally {
      setBusy(false);
    }
  }

  const active = a.status === "active";
  return (
    <li className="space-y-2 px-4 py-3" data-testid="assignment-row">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <p className="font-medium">
          {a.templateTitle} <span className="font-mono text-sm text-iron-500">v{a.version.number}</span>
        </p>
        <span className={`rounded-full px-2 py-0.5 text-xs font-semibold ${active ? "bg-moss-100 text-moss-700" : "bg-chalk-200 text-iron-500"}`}>{active ? "Active" : "Ended"}</span>
      </div>
      <p className="text-sm text-iron-500">
        From {dayLabel(a.startDate)} · {a.sessions.upcoming} ahead · {a.sessions.logged} logged
        {active && a.nextSessionDate ? ` · next ${dayLabel(a.nextSessionDate)}` : ""}
      </p>
      {a.newerVersionAvailable && a.canManage && a.latestVersion ? (
        <p className="flex flex-wrap items-center gap-2 rounded-md bg-brass-100/60 px-3 py-2 text-sm">
          Version {a.latestVersion.number} is out.
          <button type="button" className="btn-quiet px-3 py-1.5" onClick={onUpgrade}>Upgrade…</button>
        </p>
      ) : null}
      {active && a.canManage ? (
        confirming ? (
          <div role="alertdialog" aria-label="End this assignment?" className="flex flex-wrap items-center gap-2 rounded-md border border-ember bg-ember-50 p-3 text-sm">
            <span className="w-full">Sessions ahead that are not logged will be removed; logged and past ones stay.</span>
            <button type="button" className="btn bg-ember-700 text-white hover:bg-ember-600" disabled={busy} onClick={() => void end()}>End it</button>
            <button type="button" className="btn-quiet" onClick={() => setConfirming(false)}>Keep it</button>
          </div>
        ) : (
          <button type="button" className="btn-quiet px-3 py-1.5 text-ember-700" onClick={() => setConfirming(true)}>End…</button>
        )
      ) : null}
      {message ? <p role="status" className="text-sm text-iron-600">{message}</p> : null}
    </li>
  );
}
