"use client";
import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import type { AssignmentSummary, SessionChange, UpgradePreviewResponse, UpgradeResponse } from "@/app/api/assignments/types";
import { Caution } from "@/components/Caution";
import { SidePanel } from "@/components/library/SidePanel";
import { api, describeFailure } from "@/components/templates/api";
import { dayLabel } from "./dates";

const ASPECT: Record<string, string> = { sets: "sets", reps: "reps", load: "load", effort: "effort", rest: "rest", details: "cues or details" };
const CHANGE: Record<SessionChange["change"], string> = { added: "new session", removed: "session dropped", changed: "" };

/** What moving to the newer version changes in the sessions still ahead, then Apply. */
export function UpgradeDialog({ assignment, versionId, onClose }: { assignment: AssignmentSummary; versionId: string; onClose: () => void }) {
  const client = useQueryClient();
  const [applying, setApplying] = useState(false);
  const [message, setMessage] = useState<string | null>(null);
  const [applied, setApplied] = useState(false);
  const preview = useQuery({
    queryKey: ["upgrade-preview", assignment.id, versionId],
    queryFn: () => api<UpgradePreviewResponse>(`/api/assignments/${assignment.id}/upgrade?versionId=${encodeURIComponent(versionId)}`),
    staleTime: 0,
  });

  async function apply() {
    setApplying(true);
    setMessage(null);
    try {
      const res = await api<UpgradeResponse>(`/api/assignments/${assignment.id}/upgrade`, { method: "POST", json: { versionId } });
      const u = res.upgrade;
      setMessage(`Now on version ${u.version.number}: ${u.rewritten} session${u.rewritten === 1 ? "" : "s"} rewritten${u.dropped ? `, ${u.dropped} dropped` : ""}; ${u.kept} trained or past left as they were.`);
      setApplied(true);
      await client.invalidateQueries({ queryKey: ["assignments", assignment.athleteId] });
    } catch (e) {
      setMessage(describeFailure(e));
    } finally {
      setApplying(false);
    }
  }

  const p = preview.data?.preview;
  return (
    <SidePanel title={`Upgrade ${assignment.templateTitle}`} onClose={onClose}>
      <div className="space-y-4 text-sm" data-testid="upgrade-dialog">
        {preview.isLoading ? <p className="text-iron-400">Working out what changes…</p> : null}
        {preview.isError ? <p className="field-error">{describeFailure(preview.error)}</p> : null}
        {p ? (
          <>
            <p>
              From version {p.from.number} to version {p.to.number}. Sessions from {dayLabel(p.today)} on that are not logged are rewritten;{" "}
              {p.kept} past or logged session{p.kept === 1 ? " stays" : "s stay"} exactly as trained.
            </p>
            {p.sessions.length === 0 ? (
              <p className="text-iron-500">No session ahead changes{p.unchanged ? ` (${p.unchanged} stay the same)` : ""}.</p>
            ) : (
              <ol className="space-y-3" data-testid="upgrade-changes">
                {p.sessions.map((s) => (
                  <li key={s.ordinal} className="rounded-md border border-chalk-300 p-3">
                    <p className="font-medium">
                      {dayLabel(s.date)} · {s.title}
                      {CHANGE[s.change] ? <span className="ml-2 text-xs font-semibold uppercase text-brass-500">{CHANGE[s.change]}</span> : null}
                    </p>
                    {s.previousTitle ? <p className="text-iron-500">was {s.previousTitle}</p> : null}
                    <ul className="mt-1 space-y-1">
                      {s.exercises.map((e, i) => (
                        <li key={i}>
                          <span className="font-medium">{e.name}</span>{" "}
                          {e.change === "added" ? <span className="text-moss-700">added: {e.after}</span> : null}
                          {e.change === "removed" ? <span className="text-ember-700">removed (was {e.before})</span> : null}
                          {e.change === "changed" ? (
                            <span className="text-iron-600">
                              {e.before === e.after ? `${e.after}` : `${e.before} → ${e.after}`}
                              <span className="text-iron-400"> ({e.aspects.map((x) => ASPECT[x]).join(", ")})</span>
                            </span>
                          ) : null}
                        </li>
                      ))}
                    </ul>
                  </li>
                ))}
              </ol>
            )}
            {p.sessions.length > 0 && p.unchanged > 0 ? <p className="text-iron-500">{p.unchanged} other session{p.unchanged === 1 ? "" : "s"} ahead stay the same.</p> : null}
            {p.diagnostics.length > 0 ? (
              <ul className="list-disc pl-5 text-iron-500">
                {p.diagnostics.map((d, i) => (
                  <li key={i}>{d.message}</li>
                ))}
              </ul>
            ) : null}
            <Caution />
            <div className="flex flex-wrap gap-2">
              {applied ? (
                <button type="button" className="btn-primary" onClick={onClose}>Done</button>
              ) : (
                <>
                  <button type="button" className="btn-primary" disabled={applying} onClick={() => void apply()}>{applying ? "Applying…" : `Apply version ${p.to.number}`}</button>
                  <button type="button" className="btn-quiet" onClick={onClose}>Not now</button>
                </>
              )}
            </div>
          </>
        ) : null}
        {message ? <p role="status" className="text-iron-700">{message}</p> : null}
      </div>
    </SidePanel>
  );
}
