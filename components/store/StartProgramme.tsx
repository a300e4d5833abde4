"use client";
import Link from "next/link";
import { useState } from "react";
import type { StartResponse } from "@/app/api/store/types";
import { api, ApiFailure, describeFailure } from "@/components/templates/api";
import { dayText } from "./format";

const WEEKDAYS = ["mon", "tue", "wed", "thu", "fri", "sat", "sun"] as const;
const LABEL: Record<(typeof WEEKDAYS)[number], string> = { mon: "Mon", tue: "Tue", wed: "Wed", thu: "Thu", fri: "Fri", sat: "Sat", sun: "Sun" };

/**
 * "Start this programme": the buyer gives their copy to themself from a start
 * date. Days the programme pins to a weekday keep it; the others take the
 * weekdays ticked here, in order.
 */
export function StartProgramme({ purchaseId, defaultStart, untaggedDays }: { purchaseId: string; defaultStart: string; untaggedDays: number }) {
  const [startDate, setStartDate] = useState(defaultStart);
  const [weekdays, setWeekdays] = useState<string[]>(["mon", "wed", "fri", "tue", "thu", "sat", "sun"].slice(0, untaggedDays));
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<{ message: string; fields: Record<string, string> } | null>(null);
  const [done, setDone] = useState<StartResponse | null>(null);

  async function start() {
    setBusy(true);
    setError(null);
    try {
      const ordered = WEEKDAYS.filter((d) => weekdays.includes(d));
      setDone(await api<StartResponse>(`/api/store/purchases/${purchaseId}/start`, { method: "POST", json: { startDate, weekdays: ordered } }));
    } catch (e) {
      setError({ message: describeFailure(e), fields: e instanceof ApiFailure ? e.error.fields : {} });
    } finally {
      setBusy(false);
    }
  }

  if (done) {
    return (
      <div role="status" className="space-y-2" data-testid="programme-started">
        <p className="font-semibold text-moss-700">Started: {done.sessions} sessions from {dayText(done.firstDate)}.</p>
        {done.diagnostics.some((d) => d.code === "no-max") ? <p className="text-sm text-iron-500">Some lifts have no max yet; they show the target effort with an empty load box until you add one.</p> : null}
        <Link href="/athlete" className="btn-primary">Go to today&apos;s training</Link>
      </div>
    );
  }
  return (
    <form
      noValidate
      className="space-y-3"
      onSubmit={(e) => {
        e.preventDefault();
        void start();
      }}
    >
      <div>
        <label htmlFor="start-date" className="field-label">First week starts on</label>
        <input id="start-date" type="date" className="field-input" value={startDate} onChange={(e) => setStartDate(e.target.value)} aria-invalid={error?.fields.startDate ? true : undefined} />
        {error?.fields.startDate ? <p className="field-error">{error.fields.startDate}</p> : null}
      </div>
      {untaggedDays > 0 ? (
        <fieldset>
          <legend className="field-label">Training days ({untaggedDays} a week without a set weekday)</legend>
          <div className="mt-1 flex flex-wrap gap-1">
            {WEEKDAYS.map((d) => (
              <label key={d} className="inline-flex items-center gap-1 rounded-md border border-iron-200 bg-white px-2 py-1.5 text-sm">
                <input type="checkbox" checked={weekdays.includes(d)} onChange={(e) => setWeekdays((w) => (e.target.checked ? [...w, d] : w.filter((x) => x !== d)))} />
                {LABEL[d]}
              </label>
            ))}
          </div>
        </fieldset>
      ) : null}
      {error && !error.fields.startDate ? <p role="alert" className="field-error">{error.message}</p> : null}
      <button type="submit" className="btn-primary" disabled={busy}>{busy ? "Planning your sessions…" : "Start this programme"}</button>
    </form>
  );
}
