"use client";
import { useState } from "react";
import type { AttachmentJson, AttachmentsResponse } from "@/app/api/recipes/types";
import { api, describeFailure } from "@/components/templates/api";

export type Targets = {
  templates: { id: string; title: string }[];
  assignments: { id: string; templateTitle: string; athleteName: string; startDate: string; status: "active" | "ended" }[];
};

const WHEN = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });
const dateText = (d: string) => WHEN.format(new Date(`${d}T00:00:00Z`));

function describe(a: AttachmentJson): string {
  return a.kind === "template" ? `Everyone on “${a.templateTitle}”` : `${a.athleteName ?? "An athlete"} · “${a.templateTitle}”${a.startDate ? ` from ${dateText(a.startDate)}` : ""}`;
}

/**
 * Where the recipe shows: on a template (every athlete given it sees the
 * recipe) or on one athlete's assignment. Lists the current places with a
 * way to take the recipe off each.
 */
export function AttachPanel({ recipeId, initial, targets }: { recipeId: string; initial: AttachmentJson[]; targets: Targets }) {
  const [attachments, setAttachments] = useState(initial);
  const [templateId, setTemplateId] = useState("");
  const [assignmentId, setAssignmentId] = useState("");
  const [status, setStatus] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function run(fn: () => Promise<AttachmentsResponse>, done: string) {
    setBusy(true);
    setStatus(null);
    try {
      setAttachments((await fn()).attachments);
      setStatus(done);
    } catch (e) {
      setStatus(describeFailure(e));
    } finally {
      setBusy(false);
    }
  }
  const attach = (json: { templateId: string } | { assignmentId: string }) =>
    run(() => api<AttachmentsResponse>(`/api/recipes/${recipeId}/attachments`, { method: "POST", json }), "Attached.");
  const detach = (id: string) => run(() => api<AttachmentsResponse>(`/api/recipes/${recipeId}/attachments/${id}`, { method: "DELETE" }), "Taken off.");

  return (
    <div className="space-y-4 text-sm">
      {attachments.length === 0 ? (
        <p className="text-iron-500">Not attached yet: only you can see this recipe.</p>
      ) : (
        <ul className="divide-y divide-chalk-200" data-testid="recipe-attachments">
          {attachments.map((a) => (
            <li key={a.id} className="flex items-center justify-between gap-2 py-2">
              <span className="min-w-0">{describe(a)}</span>
              <button type="button" className="shrink-0 text-xs font-semibold text-ember-700 hover:underline" disabled={busy} onClick={() => void detach(a.id)}>
                Take off
              </button>
            </li>
          ))}
        </ul>
      )}
      <div>
        <label className="field-label" htmlFor="attach-template">Attach to a template</label>
        <div className="flex gap-2">
          <select id="attach-template" className="field-input" value={templateId} onChange={(e) => setTemplateId(e.target.value)}>
            <option value="">{targets.templates.length === 0 ? "No templates yet" : "Choose a template…"}</option>
            {targets.templates.map((t) => (
              <option key={t.id} value={t.id}>{t.title}</option>
            ))}
          </select>
          <button type="button" className="btn-quiet mt-1 shrink-0" disabled={busy || !templateId} onClick={() => void attach({ templateId })}>
            Attach to template
          </button>
        </div>
      </div>
      <div>
        <label className="field-label" htmlFor="attach-assignment">Attach to one athlete&apos;s programme</label>
        <div className="flex gap-2">
          <select id="attach-assignment" className="field-input" value={assignmentId} onChange={(e) => setAssignmentId(e.target.value)}>
            <option value="">{targets.assignments.length === 0 ? "No athlete has a programme yet" : "Choose an athlete's programme…"}</option>
            {targets.assignments.map((a) => (
              <option key={a.id} value={a.id}>
                {a.athleteName} · {a.templateTitle} from {dateText(a.startDate)}
                {a.status === "ended" ? " (ended)" : ""}
              </option>
            ))}
          </select>
          <button type="button" className="btn-quiet mt-1 shrink-0" disabled={busy || !assignmentId} onClick={() => void attach({ assignmentId })}>
            Attach to programme
          </button>
        </div>
      </div>
      {status ? <p role="status" className="text-iron-600">{status}</p> : null}
    </div>
  );
}
