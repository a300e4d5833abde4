"use client";
import { useRouter } from "next/navigation";
import { useCallback, useRef, useState } from "react";
import type { SaveVersionResponse } from "@/app/api/templates/types";
import type { LibraryName } from "@/lib/exercises/resolve";
import { useLibraryNames } from "../editor/useLibraryNames";
import { Workbench, type SaveState } from "../editor/Workbench";
import { api, describeFailure } from "./api";

/** The workbench for a saved template: each save is a new version; the draft follows every change. */
export function TemplateEditor({ id, initialText, baseVersion, library }: { id: string; initialText: string; baseVersion: number | null; library: LibraryName[] }) {
  const names = useLibraryNames(library);
  const router = useRouter();
  const note = useRef<HTMLInputElement>(null);
  const [base, setBase] = useState(baseVersion);

  const onSave = useCallback(
    async (source: string): Promise<SaveState> => {
      try {
        const res = await api<SaveVersionResponse>(`/api/templates/${id}/versions`, { method: "POST", json: { source, note: note.current?.value.trim() || null } });
        if (note.current) note.current.value = "";
        setBase(res.version.number);
        router.refresh();
        return { kind: "saved", message: res.created ? `Saved as version ${res.version.number}.` : res.message };
      } catch (e) {
        return { kind: "error", message: describeFailure(e) };
      }
    },
    [id, router],
  );
  const onDraft = useCallback(async (source: string) => {
    await api(`/api/templates/${id}/draft`, { method: "PUT", json: { source, baseVersion: base } });
  }, [id, base]);

  return (
    <Workbench
      draftKey={`template:${id}`}
      initialText={initialText}
      library={names}
      onSave={onSave}
      onDraft={onDraft}
      toolbar={
        <input ref={note} aria-label="What changed in this version" placeholder="What changed? (optional)" maxLength={500} className="field-input mt-0 w-full py-2 text-sm sm:w-64" />
      }
    />
  );
}
