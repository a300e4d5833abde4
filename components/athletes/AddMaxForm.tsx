"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useEffect, useMemo, useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import type { AddMaxResponse, Units } from "@/app/api/athletes/types";
import { api, ApiFailure, describeFailure } from "@/components/templates/api";
import { exerciseMatcher, type KnownName } from "@/lib/athlete/exerciseMatch";
import { KIND_LABEL, mass, recomputedText, SOURCE_LABEL } from "./format";

const FIELDS = ["exercise", "value", "unit", "date", "kind", "source", "note"] as const;

const schema = z.object({
  exercise: z.string().trim().min(1, "Enter the exercise").max(80, "Keep the name to 80 characters"),
  value: z
    .string()
    .trim()
    .min(1, "Enter the max")
    .refine((s) => /^\d+([.,]\d+)?$/.test(s), "Enter a number, e.g. 142.5")
    .refine((s) => Number(s.replace(",", ".")) > 0, "Must be more than 0"),
  unit: z.enum(["kg", "lb"]),
  date: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, "Choose the day it was measured"),
  kind: z.enum(["1rm", "tm"]),
  source: z.enum(["tested", "estimated", "logs"]),
  note: z.string().max(500, "Keep the note to 500 characters"),
});
type Values = z.infer<typeof schema>;

/** The calendar day on the person's own device; the server allows up to a day ahead of UTC for this. */
function localToday(): string {
  const d = new Date();
  return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, "0")}-${String(d.getDate()).padStart(2, "0")}`;
}

/** Adds one max. Exercise names are checked as they are typed against the same names the server accepts. */
export function AddMaxForm({ athleteId, units, names, onAdded }: { athleteId: string; units: Units; names: KnownName[]; onAdded: (message: string) => Promise<void> }) {
  const [status, setStatus] = useState<string | null>(null);
  const [suggestions, setSuggestions] = useState<string[]>([]);
  const match = useMemo(() => exerciseMatcher(names), [names]);
  const listed = useMemo(() => [...new Set(names.map((n) => n.name))], [names]);
  const form = useForm<Values>({
    resolver: zodResolver(schema),
    defaultValues: { exercise: "", value: "", unit: units, date: "", kind: "1rm", source: "tested", note: "" },
  });
  const { errors, isSubmitting } = form.formState;

  // Set after hydration: the server's day and the device's day can differ.
  useEffect(() => {
    if (!form.getValues("date")) form.setValue("date", localToday());
  }, [form]);

  function checkName() {
    const name = form.getValues("exercise");
    if (!name.trim()) return setSuggestions([]);
    const m = match(name);
    setSuggestions(m.ok ? [] : m.suggestions);
    if (!m.ok) form.setError("exercise", { message: m.suggestions.length ? "Not a known exercise — did you mean one of these?" : "Not a known exercise: use a built-in name or add it to the exercise library first" });
    else form.clearErrors("exercise");
  }

  async function submit(values: Values) {
    setStatus(null);
    try {
      const res = await api<AddMaxResponse>(`/api/athletes/${athleteId}/maxes`, { method: "POST", json: { ...values, note: values.note.trim() || null } });
      form.reset({ ...values, exercise: "", value: "", note: "" });
      setSuggestions([]);
      await onAdded(`Added ${res.max.exercise} ${mass(res.max.value, res.max.units)}. ${recomputedText(res.recomputed)}`);
    } catch (e) {
      if (e instanceof ApiFailure) {
        for (const [field, message] of Object.entries(e.error.fields)) if ((FIELDS as readonly string[]).includes(field)) form.setError(field as keyof Values, { message });
      }
      setStatus(describeFailure(e));
    }
  }

  const field = (id: keyof Values) => ({ id: `max-${id}`, "aria-invalid": !!errors[id], "aria-describedby": errors[id] ? `max-${id}-err` : undefined });
  const error = (id: keyof Values) => (errors[id] ? <p id={`max-${id}-err`} className="field-error">{errors[id]?.message}</p> : null);

  return (
    <form onSubmit={form.handleSubmit(submit)} noValidate className="space-y-4 text-sm" aria-label="Add a max">
      <div>
        <label className="field-label" htmlFor="max-exercise">Exercise</label>
        <input className="field-input" list="max-exercise-names" autoComplete="off" placeholder="e.g. back squat" {...field("exercise")} {...form.register("exercise", { onBlur: checkName })} />
        <datalist id="max-exercise-names">
          {listed.map((n) => (
            <option key={n} value={n} />
          ))}
        </datalist>
        {error("exercise")}
        {suggestions.length ? (
          <div className="mt-2 flex flex-wrap gap-2" aria-label="Suggested exercises">
            {suggestions.map((s) => (
              <button
                key={s}
                type="button"
                className="rounded-full border border-iron-200 bg-white px-3 py-1 text-sm hover:border-ember"
                onClick={() => {
                  form.setValue("exercise", s);
                  form.clearErrors("exercise");
                  setSuggestions([]);
                }}
              >
                {s}
              </button>
            ))}
          </div>
        ) : null}
      </div>
      <div className="grid grid-cols-2 gap-4 sm:grid-cols-4">
        <div>
          <label className="field-label" htmlFor="max-value">Max</label>
          <input className="field-input" inputMode="decimal" placeholder="e.g. 142.5" {...field("value")} {...form.register("value")} />
          {error("value")}
        </div>
        <div>
          <label className="field-label" htmlFor="max-unit">Unit</label>
          <select className="field-input" {...field("unit")} {...form.register("unit")}>
            <option value="kg">kg</option>
            <option value="lb">lb</option>
          </select>
          {error("unit")}
        </div>
        <div>
          <label className="field-label" htmlFor="max-kind">Kind</label>
          <select className="field-input" {...field("kind")} {...form.register("kind")}>
            <option value="1rm">{KIND_LABEL["1rm"]}</option>
            <option value="tm">{KIND_LABEL.tm}</option>
          </select>
          {error("kind")}
        </div>
        <div>
          <label className="field-label" htmlFor="max-source">Source</label>
          <select className="field-input" {...field("source")} {...form.register("source")}>
            {(Object.keys(SOURCE_LABEL) as (keyof typeof SOURCE_LABEL)[]).map((k) => (
              <option key={k} value={k}>{SOURCE_LABEL[k]}</option>
            ))}
          </select>
          {error("source")}
        </div>
      </div>
      <div className="grid gap-4 sm:grid-cols-[12rem_1fr]">
        <div>
          <label className="field-label" htmlFor="max-date">Date measured</label>
          <input type="date" className="field-input" {...field("date")} {...form.register("date")} />
          {error("date")}
        </div>
        <div>
          <label className="field-label" htmlFor="max-note">Note <span className="font-normal text-iron-400">(optional)</span></label>
          <input className="field-input" autoComplete="off" placeholder="e.g. belt, no knee sleeves" {...field("note")} {...form.register("note")} />
          {error("note")}
        </div>
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <button type="submit" className="btn-primary" disabled={isSubmitting}>{isSubmitting ? "Adding…" : "Add max"}</button>
        {status ? <p role="status" className="text-ember-700">{status}</p> : null}
      </div>
    </form>
  );
}
