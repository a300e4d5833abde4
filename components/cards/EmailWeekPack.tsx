"use client";
import { useQuery } from "@tanstack/react-query";
import { useId, useState } from "react";
import type { JobResponse, JobView } from "@/app/api/assignments/types";
import type { CardPackResult } from "@/app/api/athletes/[id]/cards/schema";
import { api, describeFailure } from "@/components/templates/api";
import { CARD_SIZE_LABELS, type CardSizeChoice } from "./urls";

const FINAL = new Set(["done", "failed"]);

function describeJob(job: JobView): { kind: "ok" | "error" | "wait"; text: string } {
  if (job.status === "queued") return { kind: "wait", text: "Queued…" };
  if (job.status === "running") return { kind: "wait", text: "Sending…" };
  if (job.status === "failed") return { kind: "error", text: job.error ?? "The cards could not be sent. Try again." };
  const sent = job.result as unknown as CardPackResult | null;
  if (!sent) return { kind: "ok", text: "Sent." };
  return { kind: "ok", text: `Sent to ${sent.to} (${sent.sessions} card${sent.sessions === 1 ? "" : "s"}).` };
}

/**
 * For the coach's athlete page: e-mails the athlete the week's session cards
 * as a PDF attachment. The POST only queues the e-mail (202 with a job); the
 * status line then follows GET /api/jobs/[id] every second until it is sent
 * or has failed.
 */
export function EmailWeekPack({ athleteId, athleteName, from, weeks = 1 }: { athleteId: string; athleteName: string; from: string; weeks?: 1 | 4 }) {
  const id = useId();
  const [size, setSize] = useState<CardSizeChoice>("a6");
  const [posting, setPosting] = useState(false);
  const [queued, setQueued] = useState<JobView | null>(null);
  const [failure, setFailure] = useState<string | null>(null);

  const jobId = queued?.id ?? null;
  const query = useQuery({
    queryKey: ["job", jobId],
    queryFn: () => api<JobResponse>(`/api/jobs/${jobId}`),
    enabled: jobId !== null && queued !== null && !FINAL.has(queued.status),
    initialData: queued ? { job: queued } : undefined,
    refetchInterval: (q) => (q.state.data && FINAL.has(q.state.data.job.status) ? false : 1000),
  });
  const job = queued ? (query.data?.job ?? queued) : null;
  const waiting = posting || (job !== null && !FINAL.has(job.status));

  async function send(e: React.FormEvent) {
    e.preventDefault();
    setPosting(true);
    setFailure(null);
    setQueued(null);
    try {
      const res = await api<JobResponse>(`/api/athletes/${encodeURIComponent(athleteId)}/cards`, { method: "POST", json: { from, weeks, size } });
      setQueued(res.job);
    } catch (err) {
      setFailure(describeFailure(err));
    } finally {
      setPosting(false);
    }
  }

  let status: { kind: "ok" | "error" | "wait"; text: string } | null = null;
  if (failure) status = { kind: "error", text: failure };
  else if (job) status = describeJob(job);
  if (query.isError && job && !FINAL.has(job.status)) {
    status = { kind: "error", text: `${describeFailure(query.error)} The e-mail may still go out; reload the page to check.` };
  }
  const tone = status?.kind === "error" ? "text-ember-700" : status?.kind === "ok" ? "text-moss-700" : "text-iron-600";

  return (
    <form onSubmit={send} className="flex flex-wrap items-end gap-2" data-testid="email-week-pack" noValidate>
      <div>
        <label htmlFor={`${id}-size`} className="field-label">
          Paper
        </label>
        <select id={`${id}-size`} value={size} onChange={(e) => setSize(e.target.value as CardSizeChoice)} className="field-input min-h-11 w-44">
          {(Object.keys(CARD_SIZE_LABELS) as CardSizeChoice[]).map((s) => (
            <option key={s} value={s}>
              {CARD_SIZE_LABELS[s]}
            </option>
          ))}
        </select>
      </div>
      <button type="submit" className="btn-quiet min-h-11" disabled={waiting} aria-describedby={`${id}-status`}>
        {waiting ? "Sending…" : `E-mail ${weeks === 1 ? "the week's" : "4 weeks of"} cards to ${athleteName}`}
      </button>
      <p id={`${id}-status`} role="status" className={`w-full text-sm ${tone}`}>
        {status?.text ?? ""}
      </p>
    </form>
  );
}
