"use client";
import { useId, useState } from "react";
import { api, describeFailure } from "@/components/templates/api";
import { CARD_SIZE_LABELS, type CardSizeChoice } from "./urls";

type Sent = { to: string; sessions: number; fileName: string };

/**
 * For the coach's athlete page: e-mails the athlete the week's session cards
 * as a PDF attachment (POST /api/athletes/[id]/cards).
 */
export function EmailWeekPack({ athleteId, athleteName, from, weeks = 1 }: { athleteId: string; athleteName: string; from: string; weeks?: 1 | 4 }) {
  const id = useId();
  const [size, setSize] = useState<CardSizeChoice>("a6");
  const [busy, setBusy] = useState(false);
  const [status, setStatus] = useState<{ kind: "ok" | "error"; text: string } | null>(null);

  async function send(e: React.FormEvent) {
    e.preventDefault();
    setBusy(true);
    setStatus(null);
    try {
      const res = await api<{ sent: Sent }>(`/api/athletes/${encodeURIComponent(athleteId)}/cards`, { method: "POST", json: { from, weeks, size } });
      const n = res.sent.sessions;
      setStatus({ kind: "ok", text: `Sent ${n} card${n === 1 ? "" : "s"} to ${res.sent.to}.` });
    } catch (err) {
      setStatus({ kind: "error", text: describeFailure(err) });
    } finally {
      setBusy(false);
    }
  }

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
      <button type="submit" className="btn-quiet min-h-11" disabled={busy} aria-describedby={`${id}-status`}>
        {busy ? "Sending…" : `E-mail ${weeks === 1 ? "the week's" : "4 weeks of"} cards to ${athleteName}`}
      </button>
      <p id={`${id}-status`} role="status" className={`w-full text-sm ${status?.kind === "error" ? "text-ember-700" : "text-moss-700"}`}>
        {status?.text ?? ""}
      </p>
    </form>
  );
}
