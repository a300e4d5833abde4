"use client";
import { useRouter } from "next/navigation";
import { useId, useState, useTransition } from "react";
import { api, ApiFailure, describeFailure } from "@/components/templates/api";
import { longDate } from "./dates";

/**
 * Puts the session on another day (PATCH /api/sessions/[id]); the page then
 * re-reads itself so the calendar and the heading show the new day.
 */
export function MoveSession({ sessionId, date, completed }: { sessionId: string; date: string; completed: boolean }) {
  const router = useRouter();
  const inputId = useId();
  const [value, setValue] = useState(date);
  const [status, setStatus] = useState<{ kind: "ok" | "error"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const [, startTransition] = useTransition();

  if (completed) {
    return <p className="text-base text-iron-700" data-testid="move-session">This session is done, so it stays on the day it was trained.</p>;
  }

  async function move(e: React.FormEvent) {
    e.preventDefault();
    if (value === date) {
      setStatus({ kind: "error", text: "Pick a different day first." });
      return;
    }
    setBusy(true);
    setStatus(null);
    try {
      const res = await api<{ session: { date: string } }>(`/api/sessions/${sessionId}`, { method: "PATCH", json: { date: value } });
      setStatus({ kind: "ok", text: `Moved to ${longDate(res.session.date)}.` });
      startTransition(() => router.refresh());
    } catch (err) {
      const field = err instanceof ApiFailure ? err.error.fields.date : undefined;
      setStatus({ kind: "error", text: field ? `${field}.` : describeFailure(err) });
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={move} className="flex flex-wrap items-end gap-3" data-testid="move-session" noValidate>
      <div>
        <label htmlFor={inputId} className="field-label">
          New date
        </label>
        <input id={inputId} type="date" required value={value} onChange={(e) => setValue(e.target.value)} className="field-input min-h-12 w-48" aria-describedby={`${inputId}-status`} />
      </div>
      <button type="submit" className="btn-primary min-h-12 px-6 text-base" disabled={busy}>
        {busy ? "Moving…" : "Move"}
      </button>
      <p id={`${inputId}-status`} role="status" className={`w-full text-base ${status?.kind === "error" ? "text-ember-700" : "text-moss-700"}`} data-testid="move-status">
        {status?.text ?? ""}
      </p>
    </form>
  );
}
