"use client";
import { useEffect, useState } from "react";
import { api, describeFailure } from "@/components/templates/api";

type Feed = { url: string };

/**
 * The secret calendar link: turn it on, copy it into a calendar app, replace
 * it when it leaked, or turn it off. Anyone holding the link sees the
 * sessions, so replacing it is one tap.
 */
export function FeedPanel({ athleteId, initial, athleteName }: { athleteId: string | null; initial: Feed | null; athleteName?: string }) {
  const [feed, setFeed] = useState<Feed | null>(initial);
  const [origin, setOrigin] = useState("");
  const [busy, setBusy] = useState(false);
  const [status, setStatus] = useState<{ kind: "ok" | "error"; text: string } | null>(null);
  // Replacing or turning off breaks calendars already subscribed, so each asks once more, inline.
  const [asking, setAsking] = useState<"replace" | "off" | null>(null);
  // The page is rendered on the server, which does not know the host the athlete typed.
  useEffect(() => setOrigin(window.location.origin), []);
  const target = athleteId ? { athleteId } : {};
  const full = feed ? `${origin}${feed.url}` : "";

  async function run(fn: () => Promise<void>) {
    setBusy(true);
    setStatus(null);
    setAsking(null);
    try {
      await fn();
    } catch (err) {
      setStatus({ kind: "error", text: describeFailure(err) });
    } finally {
      setBusy(false);
    }
  }

  const turnOn = (replacing: boolean) =>
    run(async () => {
      const res = await api<{ feed: Feed }>("/api/calendar/feed", { method: "POST", json: target });
      setFeed(res.feed);
      setStatus({ kind: "ok", text: replacing ? "New link made; the old one no longer works." : "Calendar link is on." });
    });

  const turnOff = () =>
    run(async () => {
      await api("/api/calendar/feed", { method: "DELETE", json: target });
      setFeed(null);
      setStatus({ kind: "ok", text: "Calendar link turned off." });
    });

  async function copy() {
    try {
      await navigator.clipboard.writeText(full);
      setStatus({ kind: "ok", text: "Link copied." });
    } catch {
      setStatus({ kind: "error", text: "Could not copy; select the link and copy it by hand." });
    }
  }

  return (
    <section className="panel p-4" aria-labelledby="feed-heading" data-testid="calendar-feed">
      <h2 id="feed-heading" className="text-lg font-bold text-iron">
        {athleteName ? `${athleteName}’s sessions in a calendar app` : "Sessions in your calendar app"}
      </h2>
      <p className="mt-1 max-w-2xl text-base text-iron-700">
        Subscribe to this link in any calendar app to see each session as an all-day event with its lifts and loads. Keep it to yourself: anyone holding it can read the sessions.
      </p>
      {feed ? (
        <div className="mt-3 space-y-3">
          <label className="field-label" htmlFor="feed-url">
            Calendar link
          </label>
          <input id="feed-url" readOnly value={full} onFocus={(e) => e.target.select()} className="field-input font-mono text-sm" data-testid="feed-url" />
          <div className="flex flex-wrap gap-2">
            <button type="button" className="btn-primary min-h-11" onClick={copy} disabled={busy || !origin}>
              Copy link
            </button>
            {origin ? (
              <a className="btn-quiet min-h-11" href={full.replace(/^https?:/, "webcal:")}>
                Open in calendar app
              </a>
            ) : null}
            <button type="button" className="btn-quiet min-h-11" onClick={() => setAsking("replace")} disabled={busy}>
              Replace link
            </button>
            <button type="button" className="btn-quiet min-h-11" onClick={() => setAsking("off")} disabled={busy}>
              Turn off
            </button>
          </div>
          {asking ? (
            <div role="alertdialog" aria-labelledby="feed-ask" className="flex flex-wrap items-center gap-2 rounded-md border border-ember bg-ember-50 p-3" data-testid="feed-confirm">
              <p id="feed-ask" className="w-full text-base text-iron">
                {asking === "replace"
                  ? "Calendars using the old link stop updating until you give them the new one."
                  : "Calendars using this link stop updating."}
              </p>
              <button type="button" className="btn-primary min-h-11" onClick={() => (asking === "replace" ? turnOn(true) : turnOff())}>
                {asking === "replace" ? "Yes, replace the link" : "Yes, turn it off"}
              </button>
              <button type="button" className="btn-quiet min-h-11" onClick={() => setAsking(null)}>
                Keep it
              </button>
            </div>
          ) : null}
        </div>
      ) : (
        <button type="button" className="btn-primary mt-3 min-h-11" onClick={() => turnOn(false)} disabled={busy}>
          Turn on calendar link
        </button>
      )}
      <p role="status" className={`mt-2 text-base ${status?.kind === "error" ? "text-ember-700" : "text-moss-700"}`} data-testid="feed-status">
        {status?.text ?? ""}
      </p>
    </section>
  );
}
