"use client";
import { useRef, useState } from "react";
import type { ExerciseResponse, LibraryEntry } from "@/app/api/exercises/types";
import { api, ApiFailure, describeFailure } from "@/components/templates/api";

const MB = 1024 * 1024;
const RULE = "JPEG, PNG or WebP image up to 5 MB, or MP4 or WebM video up to 25 MB.";
const LIMITS: Record<string, number> = { "image/jpeg": 5 * MB, "image/png": 5 * MB, "image/webp": 5 * MB, "video/mp4": 25 * MB, "video/webm": 25 * MB };

/**
 * Picture or short clip for an exercise. The browser's own check only saves a
 * wasted upload; the server reads the file's bytes and has the last word.
 */
export function MediaControl({ entry, onChange }: { entry: LibraryEntry; onChange: (e: LibraryEntry) => void }) {
  const input = useRef<HTMLInputElement>(null);
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<{ tone: "ok" | "bad"; text: string } | null>(null);

  async function send(file: File) {
    setMessage(null);
    const limit = LIMITS[file.type];
    if (file.type && !limit) return setMessage({ tone: "bad", text: `“${file.name}” is not an accepted file. Use a ${RULE}` });
    if (limit && file.size > limit) return setMessage({ tone: "bad", text: `“${file.name}” is ${(file.size / MB).toFixed(1)} MB, over the ${limit / MB} MB limit.` });
    setBusy(true);
    try {
      const form = new FormData();
      form.append("file", file);
      const { exercise } = await api<ExerciseResponse>(`/api/exercises/${entry.id}/media`, { method: "POST", body: form });
      onChange(exercise);
      setMessage({ tone: "ok", text: "Uploaded." });
    } catch (e) {
      // The server's message already names the allowed types and limits.
      setMessage({ tone: "bad", text: e instanceof ApiFailure ? `“${file.name}” was not accepted. ${e.error.message}` : describeFailure(e) });
    } finally {
      setBusy(false);
      if (input.current) input.current.value = "";
    }
  }

  async function remove() {
    setMessage(null);
    setBusy(true);
    try {
      const { exercise } = await api<ExerciseResponse>(`/api/exercises/${entry.id}/media`, { method: "DELETE" });
      onChange(exercise);
      setMessage({ tone: "ok", text: "Removed." });
    } catch (e) {
      setMessage({ tone: "bad", text: describeFailure(e) });
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className="space-y-3 text-sm">
      {entry.media ? (
        entry.media.type.startsWith("video/") ? (
          <video src={entry.media.url} controls muted playsInline className="max-h-56 w-full rounded-lg bg-iron object-contain" />
        ) : (
          // eslint-disable-next-line @next/next/no-img-element -- served from our own authenticated route, not the image optimiser
          <img src={entry.media.url} alt={`How ${entry.name} looks`} className="max-h-56 w-full rounded-lg border border-chalk-200 bg-chalk-50 object-contain" />
        )
      ) : (
        <p className="rounded-lg border border-dashed border-chalk-300 px-3 py-4 text-center text-iron-400">No picture or clip yet.</p>
      )}
      <div className="flex flex-wrap items-center gap-2">
        <input
          ref={input}
          id={`media-${entry.id}`}
          type="file"
          accept="image/jpeg,image/png,image/webp,video/mp4,video/webm"
          className="sr-only"
          onChange={(e) => {
            const f = e.target.files?.[0];
            if (f) void send(f);
          }}
        />
        <label htmlFor={`media-${entry.id}`} className={`btn-quiet cursor-pointer ${busy ? "pointer-events-none opacity-60" : ""}`}>
          {busy ? "Working…" : entry.media ? "Replace" : "Upload picture or clip"}
        </label>
        {entry.media ? (
          <button type="button" className="btn-quiet" disabled={busy} onClick={remove}>Remove</button>
        ) : null}
      </div>
      <p className="text-xs text-iron-400">{RULE}</p>
      {message ? <p role="status" className={message.tone === "ok" ? "text-moss" : "text-ember-700"}>{message.text}</p> : null}
    </div>
  );
}
