"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import type { LibraryEntry } from "@/app/api/exercises/types";
import { ApiFailure, describeFailure } from "@/components/templates/api";

export const EQUIPMENT = ["barbell", "dumbbell", "cable", "machine", "bodyweight", "other"] as const;
export const PATTERNS = ["squat", "hinge", "horizontal push", "vertical push", "horizontal pull", "vertical pull", "lunge", "carry", "core", "isolation"];

const list = (s: string) => s.split(",").map((t) => t.replace(/\s+/g, " ").trim()).filter(Boolean);

const schema = z.object({
  name: z.string().trim().min(1, "Give the exercise a name").max(80, "Keep the name to 80 characters"),
  aliases: z
    .string()
    .refine((s) => list(s).length <= 12, "At most 12 aliases")
    .refine((s) => list(s).every((a) => a.length <= 80), "Keep each alias to 80 characters"),
  equipment: z.enum(EQUIPMENT, { error: "Choose the equipment" }),
  primaryMuscles: z
    .string()
    .refine((s) => list(s).length <= 8, "List at most 8 muscles")
    .refine((s) => list(s).every((m) => m.length <= 40), "Keep each muscle to 40 characters"),
  movementPattern: z.string().trim().max(40, "Keep the pattern to 40 characters"),
  substitutionGroup: z.string().trim().max(60, "Keep the group to 60 characters"),
  cues: z.string().max(2000, "Keep the cues to 2000 characters"),
});
type Values = z.infer<typeof schema>;
export type ExercisePayload = {
  name: string;
  aliases: string[];
  equipment: (typeof EQUIPMENT)[number];
  primaryMuscles: string[];
  movementPattern: string;
  substitutionGroup: string;
  cues: string;
};

function defaults(entry: Partial<LibraryEntry> | undefined): Values {
  return {
    name: entry?.name ?? "",
    aliases: entry?.aliases?.join(", ") ?? "",
    equipment: entry?.equipment ?? ("" as Values["equipment"]),
    primaryMuscles: entry?.primaryMuscles?.join(", ") ?? "",
    movementPattern: entry?.movementPattern ?? "",
    substitutionGroup: entry?.substitutionGroup ?? "",
    cues: entry?.cues ?? "",
  };
}

/** The fields of one exercise, for adding and for editing. Server refusals land on the field at fault. */
export function ExerciseForm({
  initial,
  submitLabel,
  groups,
  onSubmit,
  onCancel,
}: {
  initial?: Partial<LibraryEntry>;
  submitLabel: string;
  groups: string[];
  onSubmit: (payload: ExercisePayload) => Promise<void>;
  onCancel: () => void;
}) {
  const [status, setStatus] = useState<string | null>(null);
  const form = useForm<Values>({ resolver: zodResolver(schema), defaultValues: defaults(initial) });
  const { errors, isSubmitting } = form.formState;

  async function submit(values: Values) {
    setStatus(null);
    try {
      await onSubmit({ ...values, aliases: list(values.aliases), primaryMuscles: list(values.primaryMuscles) });
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

  const field = (id: keyof Values) => ({ id: `ex-${id}`, "aria-invalid": !!errors[id], "aria-describedby": errors[id] ? `ex-${id}-err` : undefined });
  const error = (id: keyof Values) => (errors[id] ? <p id={`ex-${id}-err`} className="field-error">{errors[id]?.message}</p> : null);

  return (
    <form onSubmit={form.handleSubmit(submit)} noValidate className="space-y-4 text-sm">
      <div>
        <label className="field-label" htmlFor="ex-name">Name</label>
        <input className="field-input" autoComplete="off" {...field("name")} {...form.register("name")} />
        {error("name")}
      </div>
      <div>
        <label className="field-label" htmlFor="ex-aliases">Other names <span className="font-normal text-iron-400">(comma-separated)</span></label>
        <input className="field-input" autoComplete="off" placeholder="e.g. rack squat, pin squat" {...field("aliases")} {...form.register("aliases")} />
        {error("aliases")}
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <div>
          <label className="field-label" htmlFor="ex-equipment">Equipment</label>
          <select className="field-input" {...field("equipment")} {...form.register("equipment")}>
            <option value="" disabled>Choose…</option>
            {EQUIPMENT.map((e) => (
              <option key={e} value={e}>{e}</option>
            ))}
          </select>
          {error("equipment")}
        </div>
        <div>
          <label className="field-label" htmlFor="ex-movementPattern">Movement pattern</label>
          <input className="field-input" list="ex-patterns" autoComplete="off" placeholder="e.g. squat" {...field("movementPattern")} {...form.register("movementPattern")} />
          <datalist id="ex-patterns">
            {PATTERNS.map((p) => (
              <option key={p} value={p} />
            ))}
          </datalist>
          {error("movementPattern")}
        </div>
      </div>
      <div>
        <label className="field-label" htmlFor="ex-primaryMuscles">Main muscles <span className="font-normal text-iron-400">(comma-separated)</span></label>
        <input className="field-input" autoComplete="off" placeholder="e.g. quads, glutes" {...field("primaryMuscles")} {...form.register("primaryMuscles")} />
        {error("primaryMuscles")}
      </div>
      <div>
        <label className="field-label" htmlFor="ex-substitutionGroup">Swap group <span className="font-normal text-iron-400">(exercises that can stand in for each other)</span></label>
        <input className="field-input" list="ex-groups" autoComplete="off" placeholder="e.g. knee-dominant squat" {...field("substitutionGroup")} {...form.register("substitutionGroup")} />
        <datalist id="ex-groups">
          {groups.map((g) => (
            <option key={g} value={g} />
          ))}
        </datalist>
        {error("substitutionGroup")}
      </div>
      <div>
        <label className="field-label" htmlFor="ex-cues">Coaching cues</label>
        <textarea rows={4} className="field-input" placeholder="What you tell the athlete while they lift" {...field("cues")} {...form.register("cues")} />
        {error("cues")}
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <button type="submit" className="btn-primary" disabled={isSubmitting}>{isSubmitting ? "Saving…" : submitLabel}</button>
        <button type="button" className="btn-quiet" onClick={onCancel}>Cancel</button>
        {status ? <p role="status" className="w-full text-ember-700">{status}</p> : null}
      </div>
    </form>
  );
}
