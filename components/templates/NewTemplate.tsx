"use client";
import { useRouter } from "next/navigation";
import { useCallback } from "react";
import { parseProgramme } from "@/lib/notation";
import type { LibraryName } from "@/lib/exercises/resolve";
import { useLibraryNames } from "../editor/useLibraryNames";
import { Workbench, type SaveState } from "../editor/Workbench";
import type { TemplateResponse } from "@/app/api/templates/types";
import { api, describeFailure } from "./api";

/** A template not saved yet: the first save creates it with version 1. */
export function NewTemplate({ initialText, sample, library }: { initialText: string; sample: string | null; library: LibraryName[] }) {
  const names = useLibraryNames(library);
  const router = useRouter();
  const onSave = useCallback(
    async (source: string): Promise<SaveState> => {
      const title = parseProgramme(source).programme.title?.trim() || "Untitled programme";
      try {
        const created = await api<TemplateResponse>("/api/templates", {
          method: "POST",
          json: { title, source, note: sample ? `Started from the sample “${sample}”` : "First version", fromDraft: true },
        });
        router.replace(`/coach/templates/${created.template.id}`);
        return { kind: "saved", message: "Saved as version 1." };
      } catch (e) {
        return { kind: "error", message: describeFailure(e) };
      }
    },
    [router, sample],
  );
  const onDraft = useCallback(async (source: string) => {
    await api("/api/templates/drafts/new", { method: "PUT", json: { source } });
  }, []);
  return <Workbench draftKey="template:new" initialText={initialText} library={names} onSave={onSave} onDraft={onDraft} saveLabel="Save template" />;
}
