"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import type { DeleteTemplateResponse, TemplateResponse } from "@/app/api/templates/types";
import { api, describeFailure } from "./api";

/** Duplicate, or delete after a second, explicit confirmation. */
export function TemplateActions({ id, title }: { id: string; title: string }) {
  const router = useRouter();
  const [confirming, setConfirming] = useState(false);
  const [message, setMessage] = useState<string | null>(null);

  async function fork() {
    try {
      const res = await api<TemplateResponse>(`/api/templates/${id}/fork`, { method: "POST", json: {} });
      router.push(`/coach/templates/${res.template.id}`);
    } catch (e) {
      setMessage(describeFailure(e));
    }
  }
  async function remove() {
    try {
      const res = await api<DeleteTemplateResponse>(`/api/templates/${id}`, { method: "DELETE" });
      if (res.outcome === "archived") {
        setMessage("Athletes have this template, so it was archived instead of deleted.");
        router.refresh();
      } else router.push("/coach/templates");
    } catch (e) {
      setMessage(describeFailure(e));
    }
  }

  return (
    <div className="space-y-3 text-sm">
      <div className="flex flex-wrap gap-2">
        <button type="button" className="btn-quiet" onClick={() => void fork()}>Duplicate</button>
        {confirming ? (
          <>
            <button type="button" className="btn bg-ember-700 text-white hover:bg-ember-600" onClick={() => void remove()}>Delete “{title}” for good</button>
            <button type="button" className="btn-quiet" onClick={() => setConfirming(false)}>Keep it</button>
          </>
        ) : (
          <button type="button" className="btn-quiet text-ember-700" onClick={() => setConfirming(true)}>Delete…</button>
        )}
      </div>
      {message ? <p role="status" className="text-iron-600">{message}</p> : null}
    </div>
  );
}
