"use client";
import { useId, useState } from "react";
import { CARD_SIZE_LABELS, fileNameFrom, sessionCardUrl, weekCardsUrl, type CardSizeChoice } from "./urls";

type Props = {
  /** Builds the download address for the chosen paper size. */
  urlFor: (size: CardSizeChoice) => string;
  label: string;
  fallbackName: string;
  defaultSize?: CardSizeChoice;
  testId?: string;
};

/**
 * A paper-size choice and a download button for printable cards. Without
 * JavaScript the form simply GETs the PDF; with it, the PDF is fetched so a
 * problem (no sessions that week, signed out) shows here instead of a bare
 * error page.
 */
export function CardDownload({ urlFor, label, fallbackName, defaultSize = "a6", testId }: Props) {
  const id = useId();
  const [size, setSize] = useState<CardSizeChoice>(defaultSize);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const href = urlFor(size);
  const [action, query] = href.split("?");
  const hidden = [...new URLSearchParams(query)].filter(([k]) => k !== "size");

  async function download(e: React.FormEvent) {
    e.preventDefault();
    setBusy(true);
    setError(null);
    try {
      const res = await fetch(href);
      if (!res.ok) {
        const body = (await res.json().catch(() => null)) as { error?: { message?: string } } | null;
        setError(body?.error?.message ?? `The server answered ${res.status}.`);
        return;
      }
      const blob = await res.blob();
      const url = URL.createObjectURL(blob);
      const a = document.createElement("a");
      a.href = url;
      a.download = fileNameFrom(res.headers.get("content-disposition")) ?? fallbackName;
      document.body.appendChild(a);
      a.click();
      a.remove();
      setTimeout(() => URL.revokeObjectURL(url), 10_000);
    } catch {
      setError("Could not reach Ironquill. Check your connection and try again.");
    } finally {
      setBusy(false);
    }
  }

  return (
    <form method="get" action={action} onSubmit={download} className="flex flex-wrap items-end gap-2" data-testid={testId}>
      {hidden.map(([k, v]) => (
        <input key={k} type="hidden" name={k} value={v} />
      ))}
      <div>
        <label htmlFor={`${id}-size`} className="field-label">
          Paper
        </label>
        <select id={`${id}-size`} name="size" value={size} onChange={(e) => setSize(e.target.value as CardSizeChoice)} className="field-input min-h-11 w-44">
          {(Object.keys(CARD_SIZE_LABELS) as CardSizeChoice[]).map((s) => (
            <option key={s} value={s}>
              {CARD_SIZE_LABELS[s]}
            </option>
          ))}
        </select>
      </div>
      <button type="submit" className="btn-quiet min-h-11" disabled={busy} aria-describedby={`${id}-status`}>
        {busy ? "Preparing…" : label}
      </button>
      <p id={`${id}-status`} role="status" className="w-full text-sm text-ember-700">
        {error ?? ""}
      </p>
    </form>
  );
}

/** "Download card" for one session (athlete's session view, coach's session list). */
export function SessionCardDownload({ sessionId, defaultSize }: { sessionId: string; defaultSize?: CardSizeChoice }) {
  return (
    <CardDownload
      urlFor={(size) => sessionCardUrl(sessionId, size)}
      label="Download card (PDF)"
      fallbackName="session-card.pdf"
      defaultSize={defaultSize}
      testId="session-card-download"
    />
  );
}

/** "Download week's cards" (or four weeks') for an athlete, from the ISO week holding `from`. */
export function WeekCardsDownload({ athleteId, from, weeks = 1, defaultSize }: { athleteId: string; from: string; weeks?: 1 | 4; defaultSize?: CardSizeChoice }) {
  return (
    <CardDownload
      urlFor={(size) => weekCardsUrl(athleteId, from, weeks, size)}
      label={weeks === 1 ? "Download week's cards (PDF)" : "Download 4 weeks of cards (PDF)"}
      fallbackName={weeks === 1 ? "week-cards.pdf" : "four-weeks-cards.pdf"}
      defaultSize={defaultSize}
      testId={weeks === 1 ? "week-cards-download" : "four-week-cards-download"}
    />
  );
}
