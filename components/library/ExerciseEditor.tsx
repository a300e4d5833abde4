"use client";
import { useState } from "react";
import type { ExerciseResponse, LibraryEntry } from "@/app/api/exercises/types";
import { api, describeFailure } from "@/components/templates/api";
import { ExerciseForm } from "./ExerciseForm";
import { MediaControl } from "./MediaControl";

/** Edit one of the coach's own exercises: fields, media, and delete behind a confirmation. */
export function ExerciseEditor({
  entry,
  groups,
  onSaved,
  onDeleted,
  onClose,
}: {
  entry: LibraryEntry;
  groups: string[];
  onSaved: (e: LibraryEntry) => void;
  onDeleted: () => void;
  onClose: () => void;
}) {
  const [confirming, setConfirming] = useState(false);
  const [deleting, setDeleting] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);

  async function remove() {
    setDeleting(true);
    setProblem(null);
    try {
      await api(`/api/exercises/${entry.id}`, { method: "DELETE" });
      onDeleted();
    } catch (e) {
      setProblem(describeFailure(e));
      setDeleting(false);
    }
  }

  return (
    <div className="space-y-8">
      <ExerciseForm
        key={entry.id}
        initial={entry}
        groups={groups}
        submitLabel="Save changes"
        onCancel={onClose}
        onSubmit={async (payload) => {
          const { exercise } = await api<ExerciseResponse>(`/api/exercises/${entry.id}`, { method: "PATCH", json: payload });
          onSaved(exercise);
          onClose();
        }}
      />
      <section aria-labelledby="media-h" className="border-t border-chalk-200 pt-6">
        <h3 id="media-h" className="mb-3 text-sm font-semibold uppercase tracking-wider text-iron-400">Picture or clip</h3>
        <MediaControl entry={entry} onChange={onSaved} />
      </section>
      <section aria-labelledby="delete-h" className="border-t border-chalk-200 pt-6 text-sm">
        <h3 id="delete-h" className="mb-3 text-sm font-semibold uppercase tracking-wider text-iron-400">Delete</h3>
        {confirming ? (
          <div className="rounded-lg border border-ember-400 bg-ember-50 p-4">
            <p className="text-iron-700">Delete “{entry.name}” and its picture or clip? Programmes that name it will show it as unknown.</p>
            <div className="mt-3 flex flex-wrap gap-2">
              <button type="button" className="btn-primary" disabled={deleting} onClick={remove}>{deleting ? "Deleting…" : "Yes, delete"}</button>
              <button type="button" className="btn-quiet" disabled={deleting} onClick={() => setConfirming(false)}>Keep it</button>
            </div>
          </div>
        ) : (
          <button type="button" className="btn-quiet text-ember-700" onClick={() => setConfirming(true)}>Delete exercise…</button>
        )}
        {problem ? <p role="status" className="mt-2 text-ember-700">{problem}</p> : null}
      </section>
    </div>
  );
}
