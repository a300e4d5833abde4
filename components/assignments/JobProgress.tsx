"use client";
import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useEffect } from "react";
import type { JobResponse, JobView } from "@/app/api/assignments/types";
import { api, describeFailure } from "@/components/templates/api";
import { OutcomeList } from "./OutcomeList";

const FINAL = new Set(["done", "failed"]);

/**
 * Progress of a bulk assignment: polls GET /api/jobs/[id] every second until
 * the run finishes, then refreshes every assignment list on the page.
 */
export function JobProgress({ initial }: { initial: JobView }) {
  const client = useQueryClient();
  const query = useQuery({
    queryKey: ["job", initial.id],
    queryFn: () => api<JobResponse>(`/api/jobs/${initial.id}`),
    enabled: initial.id !== null && !FINAL.has(initial.status),
    initialData: { job: initial },
    refetchInterval: (q) => (q.state.data && FINAL.has(q.state.data.job.status) ? false : 1000),
  });
  const job = query.data.job;
  const finished = FINAL.has(job.status);
  useEffect(() => {
    if (finished) void client.invalidateQueries({ queryKey: ["assignments"] });
  }, [finished, client]);
  const handled = job.done + job.failed;
  const percent = job.total > 0 ? Math.round((handled / job.total) * 100) : 0;
  const label = job.status === "queued" ? "Waiting to start" : job.status === "running" ? "Assigning" : job.status === "done" ? "Finished" : "Stopped";
  return (
    <div className="space-y-3" data-testid="job-progress">
      <div>
        <div className="flex justify-between text-sm">
          <span className="font-medium">{label}</span>
          <span className="text-iron-500">
            {handled} of {job.total}
            {job.failed > 0 ? ` · ${job.failed} not assigned` : ""}
          </span>
        </div>
        <div className="mt-1 h-2 overflow-hidden rounded-full bg-chalk-200" role="progressbar" aria-valuemin={0} aria-valuemax={job.total} aria-valuenow={handled} aria-label="Athletes handled">
          <div className={`h-full ${job.failed > 0 ? "bg-brass-500" : "bg-moss-500"} transition-[width]`} style={{ width: `${percent}%` }} />
        </div>
      </div>
      {job.error ? <p className="field-error">{job.error}</p> : null}
      {query.isError ? <p className="field-error">{describeFailure(query.error)} Progress will show again when the page reloads.</p> : null}
      <OutcomeList outcomes={job.result?.outcomes ?? []} />
    </div>
  );
}
