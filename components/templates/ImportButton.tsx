"use client";
import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import type { TemplateResponse } from "@/app/api/templates/types";
import { api, describeFailure } from "./api";

/** Upload a .iq file as a new template; problems in the file are named with their line. */
export function ImportButton() {
  const input = useRef<HTMLInputElement>(null);
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function upload(file: File) {
    setBusy(true);
    setMessage(null);
    const form = new FormData();
    form.set("file", file);
    try {
      const res = await api<TemplateResponse>("/api/templates/import", { method: "POST", body: form });
      router.push(`/coach/templates/${res.template.id}`);
    } catch (e) {
      setMessage(describeFailure(e));
    } finally {
      setBusy(false);
      if (input.current) input.current.value = "";
    }
  }

  return (
    <span className="inline-flex flex-col items-start gap-1">
      <input ref={input} type="file" accept=".iq,text/plain" className="sr-only" id="iq-import" onChange={(e) => e.target.files?.[0] && void upload(e.target.files[0])} />
      <label htmlFor="iq-import" className="btn-quiet cursor-pointer">{busy ? "Importing…" : "Import .iq file"}</label>
      {message ? <span role="alert" className="max-w-xs text-sm text-ember-700">{message}</span> : null}
    </span>
  );
}
