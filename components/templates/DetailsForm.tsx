"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import type { TemplateResponse, Visibility } from "@/app/api/templates/types";
import { api, ApiFailure, describeFailure } from "./api";

const schema = z.object({
  title: z.string().trim().min(1, "Give the template a title").max(120, "Keep the title under 120 characters"),
  description: z.string().max(2000, "Keep the description under 2000 characters"),
  tags: z
    .string()
    .refine((s) => s.split(",").filter((t) => t.trim()).length <= 12, "At most 12 tags")
    .refine((s) => s.split(",").every((t) => t.trim().length <= 32), "Each tag at most 32 characters"),
  visibility: z.enum(["private", "link", "listed"]),
});
type Values = z.infer<typeof schema>;

/** Title, description, tags and who may see the template. */
export function DetailsForm({ id, initial }: { id: string; initial: { title: string; description: string; tags: string[]; visibility: Visibility } }) {
  const router = useRouter();
  const [status, setStatus] = useState<string | null>(null);
  const form = useForm<Values>({ resolver: zodResolver(schema), defaultValues: { ...initial, tags: initial.tags.join(", ") } });
  const { errors, isSubmitting } = form.formState;

  async function submit(values: Values) {
    setStatus(null);
    try {
      const tags = values.tags.split(",").map((t) => t.trim()).filter(Boolean);
      await api<TemplateResponse>(`/api/templates/${id}`, { method: "PATCH", json: { ...values, tags } });
      setStatus("Saved.");
      router.refresh();
    } catch (e) {
      if (e instanceof ApiFailure) for (const [field, message] of Object.entries(e.error.fields)) if (field in values) form.setError(field as keyof Values, { message });
      setStatus(describeFailure(e));
    }
  }

  return (
    <form onSubmit={form.handleSubmit(submit)} noValidate className="space-y-3 text-sm">
      <div>
        <label className="field-label" htmlFor="d-title">Title</label>
        <input id="d-title" className="field-input" {...form.register("title")} aria-invalid={!!errors.title} />
        {errors.title ? <p className="field-error">{errors.title.message}</p> : null}
      </div>
      <div>
        <label className="field-label" htmlFor="d-desc">Description</label>
        <textarea id="d-desc" rows={3} className="field-input" {...form.register("description")} />
        {errors.description ? <p className="field-error">{errors.description.message}</p> : null}
      </div>
      <div>
        <label className="field-label" htmlFor="d-tags">Tags <span className="font-normal text-iron-400">(comma-separated)</span></label>
        <input id="d-tags" className="field-input" {...form.register("tags")} />
        {errors.tags ? <p className="field-error">{errors.tags.message}</p> : null}
      </div>
      <div>
        <label className="field-label" htmlFor="d-vis">Who can see it</label>
        <select id="d-vis" className="field-input" {...form.register("visibility")}>
          <option value="private">Only me</option>
          <option value="link">Anyone with a share link</option>
          <option value="listed">Listed in the store</option>
        </select>
      </div>
      <div className="flex items-center gap-3">
        <button type="submit" className="btn-quiet" disabled={isSubmitting}>{isSubmitting ? "Saving…" : "Save details"}</button>
        {status ? <span role="status" className="text-iron-500">{status}</span> : null}
      </div>
    </form>
  );
}
