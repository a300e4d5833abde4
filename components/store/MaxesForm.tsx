"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { api, describeFailure } from "@/components/templates/api";

export type MaxRow = { exercise: string; current: number | null };

function today(): string {
  const d = new Date();
  return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, "0")}-${String(d.getDate()).padStart(2, "0")}`;
}

/**
 * The maxes this programme works from, entered by the athlete for themself
 * through the athlete maxes API. Empty rows are skipped; each saved row
 * becomes today's max for that lift, and the preview refreshes.
 */
export function MaxesForm({ athleteId, units, rows }: { athleteId: string; units: "kg" | "lb"; rows: MaxRow[] }) {
  const router = useRouter();
  const [values, setValues] = useState<Record<string, string>>({});
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [status, setStatus] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function save() {
    setBusy(true);
    setStatus(null);
    const nextErrors: Record<string, string> = {};
    let saved = 0;
    for (const row of rows) {
      const value = values[row.exercise]?.trim();
      if (!value) continue;
      try {
        await api(`/api/athletes/${athleteId}/maxes`, { method: "POST", json: { exercise: row.exercise, value, unit: units, date: today(), kind: "1rm" } });
        saved++;
      } catch (e) {
        nextErrors[row.exercise] = describeFailure(e);
      }
    }
    setErrors(nextErrors);
    setBusy(false);
    if (saved > 0) {
      setValues((v) => Object.fromEntries(Object.entries(v).filter(([k]) => k in nextErrors)));
      router.refresh();
    }
    setStatus(saved > 0 ? `Saved ${saved} max${saved === 1 ? "" : "es"}.` : Object.keys(nextErrors).length ? "Nothing saved; see the rows marked." : "Type at least one max first.");
  }

  if (rows.length === 0) return <p className="text-sm text-iron-500">This programme sets its loads by feel or by fixed weights; it needs no maxes.</p>;
  return (
    <form
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        void save();
      }}
      className="space-y-3"
    >
      <ul className="divide-y divide-chalk-200">
        {rows.map((row) => {
          const id = `max-${row.exercise.replace(/[^a-z0-9]+/gi, "-")}`;
          return (
            <li key={row.exercise} className="grid grid-cols-[1fr_8rem] items-center gap-3 py-2">
              <label htmlFor={id} className="text-sm">
                <span className="font-semibold capitalize text-iron">{row.exercise}</span>
                <span className="block text-xs text-iron-400">{row.current !== null ? `On file: ${row.current} ${units}` : "No max on file"}</span>
              </label>
              <div>
                <div className="flex items-center gap-1">
                  <input
                    id={id}
                    inputMode="decimal"
                    className="field-input mt-0 text-right"
                    placeholder={row.current !== null ? String(row.current) : "1RM"}
                    value={values[row.exercise] ?? ""}
                    onChange={(e) => setValues((v) => ({ ...v, [row.exercise]: e.target.value }))}
                    aria-invalid={errors[row.exercise] ? true : undefined}
                    aria-describedby={errors[row.exercise] ? `${id}-error` : undefined}
                  />
                  <span className="text-sm text-iron-500">{units}</span>
                </div>
              </div>
              {errors[row.exercise] ? <p id={`${id}-error`} className="field-error col-span-2 mt-0">{errors[row.exercise]}</p> : null}
            </li>
          );
        })}
      </ul>
      <div className="flex items-center gap-3">
        <button type="submit" className="btn-quiet" disabled={busy}>{busy ? "Saving…" : "Save maxes"}</button>
        {status ? <span role="status" className="text-sm text-iron-500">{status}</span> : null}
      </div>
    </form>
  );
}
