"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useEffect, useMemo, useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import type { AssignBody, AssignResponse, JobView } from "@/app/api/assignments/types";
import type { TemplateListResponse, VersionListResponse, VersionResponse } from "@/app/api/templates/types";
import { ApiFailure, api, describeFailure } from "@/components/templates/api";
import { isDateString, WEEKDAY_ORDER } from "@/lib/dates/date";
import { DEFAULT_WEEKDAYS } from "@/lib/load/schedule";
import { nextMonday, weekdaysFrom } from "./dates";
import { JobProgress } from "./JobProgress";

export type AthleteOption = { id: string; name: string };

const DAY_NAMES: Record<string, string> = { mon: "Mon", tue: "Tue", wed: "Wed", thu: "Thu", fri: "Fri", sat: "Sat", sun: "Sun" };

const schema = z.object({
  athleteIds: z.array(z.string()).min(1, "Pick at least one athlete"),
  templateId: z.string().min(1, "Pick a template"),
  versionId: z.string().min(1, "Pick a version"),
  startDate: z.string().refine(isDateString, "Pick a start date"),
  weekdays: z.array(z.string()),
  autoRegulate: z.boolean(),
});
type Values = z.infer<typeof schema>;

/** The most days without a weekday tag in any one block: how many weekdays the coach should tick. */
function untaggedDays(model: VersionResponse["version"]["model"] | undefined): number {
  if (!model) return 0;
  return Math.max(0, ...model.blocks.map((b) => b.days.filter((d) => d.weekday === null).length));
}

/**
 * Gives a template version to one athlete (pass one) or to several (pass the
 * roster with `selectable`). Template, then version (newest by default), start
 * date (next Monday by default) and, when the programme has days without a
 * weekday, which weekdays they take. One athlete is assigned at once; several
 * run in the background with a progress bar. Notes from working out the loads
 * ("no 1RM on file for back squat: loads left empty") are shown per athlete.
 */
export function AssignPanel({ athletes, selectable = false }: { athletes: AthleteOption[]; selectable?: boolean }) {
  const client = useQueryClient();
  const [job, setJob] = useState<JobView | null>(null);
  const [status, setStatus] = useState<string | null>(null);
  const form = useForm<Values>({
    resolver: zodResolver(schema),
    defaultValues: { athleteIds: selectable ? [] : athletes.map((a) => a.id), templateId: "", versionId: "", startDate: nextMonday(), weekdays: [], autoRegulate: false },
  });
  const { errors, isSubmitting } = form.formState;
  const templateId = form.watch("templateId");
  const versionId = form.watch("versionId");
  const picked = form.watch("athleteIds");
  const ticked = form.watch("weekdays");

  const templates = useQuery({ queryKey: ["templates", "picker"], queryFn: () => api<TemplateListResponse>("/api/templates?pageSize=100") });
  const versions = useQuery({
    queryKey: ["templates", templateId, "versions"],
    queryFn: () => api<VersionListResponse>(`/api/templates/${templateId}/versions`),
    enabled: templateId !== "",
  });
  const versionNumber = versions.data?.versions.find((v) => v.id === versionId)?.number;
  const detail = useQuery({
    queryKey: ["templates", templateId, "version", versionNumber],
    queryFn: () => api<VersionResponse>(`/api/templates/${templateId}/versions/${versionNumber}`),
    enabled: templateId !== "" && versionNumber !== undefined,
    staleTime: Infinity,
  });
  const untagged = untaggedDays(detail.data?.version.model);

  // A newly picked template starts on its newest version (the list comes newest first).
  useEffect(() => {
    const list = versions.data?.versions;
    if (list && list.length > 0 && !list.some((v) => v.id === form.getValues("versionId"))) form.setValue("versionId", list[0].id);
  }, [versions.data, form]);
  // The usual spread for that many free days, until the coach ticks their own.
  useEffect(() => {
    if (untagged > 0) form.setValue("weekdays", [...(DEFAULT_WEEKDAYS[Math.min(7, untagged)] ?? [])]);
  }, [untagged, detail.data, form]);

  const usable = useMemo(() => (templates.data?.items ?? []).filter((t) => t.latestVersion !== null), [templates.data]);

  async function submit(values: Values) {
    setStatus(null);
    setJob(null);
    const body: AssignBody = {
      versionId: values.versionId,
      athleteIds: values.athleteIds,
      startDate: values.startDate,
      weekdays: untagged > 0 ? weekdaysFrom(values.startDate, values.weekdays) : [],
      autoRegulate: values.autoRegulate,
    };
    try {
      const res = await api<AssignResponse>("/api/assignments", { method: "POST", json: body });
      setJob(res.job);
      if (res.job.status === "done") void client.invalidateQueries({ queryKey: ["assignments"] });
    } catch (e) {
      if (e instanceof ApiFailure) {
        for (const [field, message] of Object.entries(e.error.fields)) {
          const top = field.split(".")[0];
          if (top in values) form.setError(top as keyof Values, { message });
        }
      }
      setStatus(describeFailure(e));
    }
  }

  const toggle = (list: string[], value: string) => (list.includes(value) ? list.filter((v) => v !== value) : [...list, value]);
  const single = !selectable && athletes.length === 1 ? athletes[0] : null;

  return (
    <section className="panel space-y-4 p-4 sm:p-5" aria-labelledby="assign-title" data-testid="assign-panel">
      <h2 id="assign-title" className="text-lg font-semibold">{single ? `Give ${single.name} a template` : "Give athletes a template"}</h2>
      <form className="space-y-4" onSubmit={form.handleSubmit(submit)} noValidate>
        {selectable ? (
          <fieldset>
            <legend className="field-label">Athletes</legend>
            <div className="mt-1 flex flex-wrap gap-2">
              <button type="button" className="btn-quiet px-3 py-1.5" onClick={() => form.setValue("athleteIds", picked.length === athletes.length ? [] : athletes.map((a) => a.id))}>
                {picked.length === athletes.length ? "Clear all" : "Select all"}
              </button>
              {athletes.map((a) => (
                <label key={a.id} className="flex items-center gap-2 rounded-md border border-iron-200 bg-white px-3 py-1.5 text-sm">
                  <input type="checkbox" checked={picked.includes(a.id)} onChange={() => form.setValue("athleteIds", toggle(picked, a.id), { shouldValidate: true })} />
                  {a.name}
                </label>
              ))}
            </div>
            {errors.athleteIds ? <p className="field-error">{errors.athleteIds.message}</p> : null}
          </fieldset>
        ) : null}

        <div className="grid gap-4 sm:grid-cols-2">
          <label className="block">
            <span className="field-label">Template</span>
            <select aria-label="Template" className="field-input" {...form.register("templateId", { onChange: () => form.setValue("versionId", "") })} disabled={templates.isLoading}>
              <option value="">{templates.isLoading ? "Loading templates…" : usable.length === 0 ? "No saved templates yet" : "Pick a template"}</option>
              {usable.map((t) => (
                <option key={t.id} value={t.id}>{t.title}</option>
              ))}
            </select>
            {errors.templateId ? <span className="field-error block">{errors.templateId.message}</span> : null}
            {templates.isError ? <span className="field-error block">{describeFailure(templates.error)}</span> : null}
          </label>
          <label className="block">
            <span className="field-label">Version</span>
            <select aria-label="Version" className="field-input" {...form.register("versionId")} disabled={!versions.data}>
              {!versions.data ? <option value="">{templateId ? "Loading versions…" : "Pick a template first"}</option> : null}
              {versions.data?.versions.map((v, i) => (
                <option key={v.id} value={v.id}>
                  Version {v.number}
                  {i === 0 ? " (newest)" : ""}
                  {v.note ? ` — ${v.note}` : ""}
                </option>
              ))}
            </select>
            {errors.versionId ? <span className="field-error block">{errors.versionId.message}</span> : null}
          </label>
          <label className="block">
            <span className="field-label">First day of week 1</span>
            <input type="date" className="field-input" {...form.register("startDate")} />
            {errors.startDate ? <span className="field-error block">{errors.startDate.message}</span> : null}
          </label>
          <label className="flex items-center gap-2 self-end pb-3 text-sm">
            <input type="checkbox" {...form.register("autoRegulate")} />
            Adjust loads from logged sets
          </label>
        </div>

        {untagged > 0 ? (
          <fieldset>
            <legend className="field-label">
              Training days for the {untagged} day{untagged === 1 ? "" : "s"} without a weekday
            </legend>
            <div className="mt-1 flex flex-wrap gap-2">
              {WEEKDAY_ORDER.map((d) => (
                <label key={d} className="flex items-center gap-1.5 rounded-md border border-iron-200 bg-white px-2.5 py-1.5 text-sm">
                  <input type="checkbox" checked={ticked.includes(d)} onChange={() => form.setValue("weekdays", toggle(ticked, d))} />
                  {DAY_NAMES[d]}
                </label>
              ))}
            </div>
            {ticked.length < untagged ? (
              <p className="mt-1 text-sm text-brass-500">Tick {untagged} days; days left over fall on the usual spread.</p>
            ) : null}
            {errors.weekdays ? <p className="field-error">{errors.weekdays.message}</p> : null}
          </fieldset>
        ) : null}

        <div className="flex flex-wrap items-center gap-3">
          <button type="submit" className="btn-primary" disabled={isSubmitting || (job !== null && job.status !== "done" && job.status !== "failed")}>
            {isSubmitting ? "Assigning…" : selectable && picked.length > 1 ? `Assign to ${picked.length} athletes` : "Assign"}
          </button>
          {status ? <p role="status" className="text-sm text-ember-700">{status}</p> : null}
        </div>
      </form>
      {job ? <JobProgress key={job.id ?? "inline"} initial={job} /> : null}
    </section>
  );
}
