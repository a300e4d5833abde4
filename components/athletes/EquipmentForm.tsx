"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { useFieldArray, useForm } from "react-hook-form";
import { z } from "zod";
import type { Equipment, EquipmentResponse, Units } from "@/app/api/athletes/types";
import { api, ApiFailure, describeFailure } from "@/components/templates/api";
import { BAR_MAX, convertBodyweight, PLATES_MAX, STEP_MAX } from "@/lib/athlete/equipment";
import { defaultPresetFor, EQUIPMENT_PRESETS, type EquipmentPreset } from "@/lib/athlete/presets";
import { recomputedText } from "./format";

const toNumber = (s: string) => Number(s.trim().replace(",", "."));
const isNumber = (s: string) => /^\d+([.,]\d+)?$/.test(s.trim());

function amount(label: string, max: number) {
  return z
    .string()
    .refine((s) => s.trim() !== "", `Enter the ${label}`)
    .refine((s) => s.trim() === "" || isNumber(s), "Enter a number, e.g. 2.5")
    .refine((s) => !isNumber(s) || toNumber(s) > 0, "Must be more than 0")
    .refine((s) => !isNumber(s) || toNumber(s) <= max, `At most ${max}`);
}

const schema = z
  .object({
    units: z.enum(["kg", "lb"]),
    bodyweight: z.string().refine((s) => s.trim() === "" || (isNumber(s) && toNumber(s) > 0 && toNumber(s) <= 1000), "Enter a number up to 1000, or leave it empty"),
    bar: amount("bar's weight", BAR_MAX),
    counted: z.boolean(),
    plates: z.array(z.object({ weight: amount("plate's weight", 1000), pairs: z.string() })).min(1, "List at least one plate").max(PLATES_MAX, `At most ${PLATES_MAX} plate sizes`),
    dumbbellStep: amount("dumbbell step", STEP_MAX),
    machineStep: amount("machine step", STEP_MAX),
  })
  .superRefine((v, ctx) => {
    if (!v.counted) return;
    v.plates.forEach((p, i) => {
      if (!/^\d+$/.test(p.pairs.trim()) || Number(p.pairs) > 100) ctx.addIssue({ code: "custom", message: "Pairs: a whole number, 0–100", path: ["plates", i, "pairs"] });
    });
  });
type Values = z.infer<typeof schema>;

function fromEquipment(e: Pick<Equipment, "units" | "bar" | "plates" | "dumbbellStep" | "machineStep">, bodyweight: string): Values {
  const counted = e.plates.length > 0 && typeof e.plates[0] !== "number";
  return {
    units: e.units,
    bodyweight,
    bar: String(e.bar),
    counted,
    plates: e.plates.map((p) => (typeof p === "number" ? { weight: String(p), pairs: "" } : { weight: String(p.weight), pairs: String(p.pairs) })),
    dumbbellStep: String(e.dumbbellStep),
    machineStep: String(e.machineStep),
  };
}

function payload(v: Values) {
  return {
    units: v.units,
    bodyweight: v.bodyweight.trim() === "" ? null : toNumber(v.bodyweight),
    bar: toNumber(v.bar),
    plates: v.counted ? v.plates.map((p) => ({ weight: toNumber(p.weight), pairs: Number(p.pairs) })) : v.plates.map((p) => toNumber(p.weight)),
    dumbbellStep: toNumber(v.dumbbellStep),
    machineStep: toNumber(v.machineStep),
  };
}

/** Server field paths ("plates.2", "plates.2.pairs") onto the form's own fields. */
function formField(path: string): string {
  const plain = /^plates\.(\d+)$/.exec(path);
  return plain ? `plates.${plain[1]}.weight` : path;
}

/** Unit, bodyweight, bar, plates on hand and the steps of dumbbells and machine stacks; starts from a preset. */
export function EquipmentForm({ athleteId, initial }: { athleteId: string; initial: Equipment }) {
  const client = useQueryClient();
  const [status, setStatus] = useState<string | null>(initial.stored ? null : "Nothing saved yet: these are the club gym (kg) defaults. Check them and save.");
  const [unitNote, setUnitNote] = useState<string | null>(null);
  const [presetId, setPresetId] = useState<string>(initial.preset ?? "");
  const form = useForm<Values>({ resolver: zodResolver(schema), defaultValues: fromEquipment(initial, initial.bodyweight === null ? "" : String(initial.bodyweight)) });
  const plates = useFieldArray({ control: form.control, name: "plates" });
  const { errors, isSubmitting } = form.formState;
  const units = form.watch("units");
  const counted = form.watch("counted");

  /** Fills in a preset, keeping the bodyweight (converted when the unit changes). */
  function applyPreset(p: EquipmentPreset, fromUnits: Units) {
    const bw = form.getValues("bodyweight");
    const carried = bw.trim() !== "" && isNumber(bw) ? String(convertBodyweight(toNumber(bw), fromUnits, p.units)) : bw;
    form.reset(fromEquipment(p, carried), { keepDefaultValues: true });
    setPresetId(p.id);
    setUnitNote(p.units !== fromUnits ? unitMessage(p.units) : null);
    setStatus(`Filled in “${p.label}”. Adjust anything that differs, then save.`);
  }

  // A kg plate list means nothing on a pound bar, so a change of unit starts from that unit's preset.
  function switchUnits(next: Units) {
    if (next !== units) applyPreset(defaultPresetFor(next), units);
  }

  async function submit(values: Values) {
    setStatus(null);
    try {
      const res = await api<EquipmentResponse>(`/api/athletes/${athleteId}/equipment`, { method: "PUT", json: payload(values) });
      form.reset(fromEquipment(res.equipment, res.equipment.bodyweight === null ? "" : String(res.equipment.bodyweight)));
      setPresetId(res.equipment.preset ?? "");
      setUnitNote(null);
      setStatus(`Saved. ${recomputedText(res.recomputed)}`);
      await client.invalidateQueries({ queryKey: ["athlete-maxes", athleteId] });
    } catch (e) {
      if (e instanceof ApiFailure) for (const [field, message] of Object.entries(e.error.fields)) form.setError(formField(field) as keyof Values, { message });
      setStatus(describeFailure(e));
    }
  }

  const err = (message: string | undefined, id: string) => (message ? <p id={id} className="field-error">{message}</p> : null);

  return (
    <form onSubmit={form.handleSubmit(submit)} noValidate className="space-y-5 text-sm" aria-label="Gym and equipment">
      <div className="flex flex-wrap items-end gap-2">
        <div className="min-w-0 flex-1">
          <label className="field-label" htmlFor="eq-preset">Start from a preset</label>
          <select id="eq-preset" className="field-input" value={presetId} onChange={(e) => setPresetId(e.target.value)}>
            <option value="">Choose a preset…</option>
            {EQUIPMENT_PRESETS.map((p) => (
              <option key={p.id} value={p.id}>{p.label}</option>
            ))}
          </select>
        </div>
        <button type="button" className="btn-quiet" disabled={!presetId} onClick={() => applyPreset(EQUIPMENT_PRESETS.find((p) => p.id === presetId)!, units)}>
          Use preset
        </button>
      </div>

      <div className="grid gap-4 sm:grid-cols-2">
        <div>
          <label className="field-label" htmlFor="eq-units">Units</label>
          <select id="eq-units" className="field-input" {...form.register("units", { onChange: (e) => switchUnits(e.target.value as Units) })}>
            <option value="kg">kg</option>
            <option value="lb">lb</option>
          </select>
          <p className="mt-1 text-xs text-iron-400">Changing it starts the bar and plates from that unit&apos;s preset. Maxes keep the unit they were entered in and are converted when loads are worked out.</p>
        </div>
        <div>
          <label className="field-label" htmlFor="eq-bodyweight">Bodyweight ({units}) <span className="font-normal text-iron-400">(optional)</span></label>
          <input id="eq-bodyweight" inputMode="decimal" className="field-input" aria-invalid={!!errors.bodyweight} {...form.register("bodyweight")} />
          {err(errors.bodyweight?.message, "eq-bodyweight-err")}
        </div>
      </div>
      {unitNote ? <p role="note" className="rounded-md border border-brass-500/40 bg-brass-100/60 px-3 py-2 text-iron-700">{unitNote}</p> : null}

      <div className="grid gap-4 sm:grid-cols-3">
        <div>
          <label className="field-label" htmlFor="eq-bar">Bar ({units})</label>
          <input id="eq-bar" inputMode="decimal" className="field-input" aria-invalid={!!errors.bar} {...form.register("bar")} />
          {err(errors.bar?.message, "eq-bar-err")}
        </div>
        <div>
          <label className="field-label" htmlFor="eq-dumbbellStep">Dumbbell step ({units})</label>
          <input id="eq-dumbbellStep" inputMode="decimal" className="field-input" aria-invalid={!!errors.dumbbellStep} {...form.register("dumbbellStep")} />
          {err(errors.dumbbellStep?.message, "eq-db-err")}
        </div>
        <div>
          <label className="field-label" htmlFor="eq-machineStep">Machine step ({units})</label>
          <input id="eq-machineStep" inputMode="decimal" className="field-input" aria-invalid={!!errors.machineStep} {...form.register("machineStep")} />
          {err(errors.machineStep?.message, "eq-m-err")}
        </div>
      </div>

      <fieldset>
        <legend className="field-label">Plates ({units})</legend>
        <div className="mt-2 flex flex-wrap gap-x-5 gap-y-2">
          <label className="flex items-center gap-2">
            <input type="radio" checked={!counted} onChange={() => form.setValue("counted", false)} /> As many pairs as needed
          </label>
          <label className="flex items-center gap-2">
            <input type="radio" checked={counted} onChange={() => form.setValue("counted", true)} /> Only so many pairs
          </label>
        </div>
        <ul className="mt-3 space-y-2" data-testid="plate-rows">
          {plates.fields.map((f, i) => (
            <li key={f.id} className="flex flex-wrap items-start gap-2">
              <div className="w-28">
                <label className="sr-only" htmlFor={`eq-plate-${i}`}>Plate {i + 1} weight</label>
                <input id={`eq-plate-${i}`} inputMode="decimal" placeholder="weight" className="field-input mt-0" aria-invalid={!!errors.plates?.[i]?.weight} {...form.register(`plates.${i}.weight`)} />
              </div>
              {counted ? (
                <div className="w-28">
                  <label className="sr-only" htmlFor={`eq-pairs-${i}`}>Plate {i + 1} pairs</label>
                  <input id={`eq-pairs-${i}`} inputMode="numeric" placeholder="pairs" className="field-input mt-0" aria-invalid={!!errors.plates?.[i]?.pairs} {...form.register(`plates.${i}.pairs`)} />
                </div>
              ) : null}
              <button type="button" className="btn-quiet px-3 py-2" onClick={() => plates.remove(i)} aria-label={`Remove plate ${i + 1}`}>Remove</button>
              {errors.plates?.[i]?.weight || errors.plates?.[i]?.pairs ? (
                <p className="field-error w-full">{errors.plates?.[i]?.weight?.message ?? errors.plates?.[i]?.pairs?.message}</p>
              ) : null}
            </li>
          ))}
        </ul>
        {err(errors.plates?.message ?? errors.plates?.root?.message, "eq-plates-err")}
        <button type="button" className="btn-quiet mt-2 px-3 py-2" disabled={plates.fields.length >= PLATES_MAX} onClick={() => plates.append({ weight: "", pairs: counted ? "1" : "" })}>
          Add a plate size
        </button>
      </fieldset>

      <div className="flex flex-wrap items-center gap-3">
        <button type="submit" className="btn-primary" disabled={isSubmitting}>{isSubmitting ? "Saving…" : "Save equipment"}</button>
        {status ? <p role="status" className="text-iron-600">{status}</p> : null}
      </div>
    </form>
  );
}

function unitMessage(next: Units): string {
  return `Switched to ${next}: the bar, plates and steps now follow the ${next} preset and bodyweight is converted — check them, then save. Maxes keep the unit they were entered in; loads are worked out from them converted to ${next} (1 lb = 0.45359237 kg) and rounded to these plates.`;
}
