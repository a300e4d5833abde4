"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { api, describeFailure } from "@/components/templates/api";

/** Delete after a second, explicit confirmation; athletes stop seeing it at once. */
export function DeleteRecipe({ id, title }: { id: string; title: string }) {
  const router = useRouter();
  const [confirming, setConfirming] = useState(false);
  const [message, setMessage] = useState<string | null>(null);

  async function remove() {
    try {
      await api(`/api/recipes/${id}`, { method: "DELETE" });
      router.push("/coach/recipes");
      router.refresh();
    } catch (e) {
      setMessage(describeFailure(e));
    }
  }

  return (
    <div className="space-y-2 text-sm">
      {confirming ? (
        <div className="flex flex-wrap gap-2">
          <button type="button" className="btn bg-ember-700 text-white hover:bg-ember-600" onClick={() => void remove()}>Delete “{title}” for good</button>
          <button type="button" className="btn-quiet" onClick={() => setConfirming(false)}>Keep it</button>
        </div>
      ) : (
        <button type="button" className="btn-quiet text-ember-700" onClick={() => setConfirming(true)}>Delete recipe…</button>
      )}
      {message ? <p role="status" className="text-iron-600">{message}</p> : null}
    </div>
  );
}
