import { z } from "zod";
import { SOURCE_MAX_BYTES, titleSchema } from "@/db/templateRules";

export const IMPORT_EXTENSIONS = [".iq", ".txt"] as const;

function extensionOf(name: string): string {
  const dot = name.lastIndexOf(".");
  return dot > 0 ? name.slice(dot).toLowerCase() : "";
}

function kb(bytes: number): string {
  return `${Math.ceil(bytes / 1024)} KB`;
}

/** POST /api/templates/import (multipart/form-data): `file`, and optionally `title` to use instead of the file's own. */
export const importFormSchema = z.object({
  file: z
    .instanceof(File, { message: "Choose a .iq file to upload (form field file)" })
    .refine((f) => (IMPORT_EXTENSIONS as readonly string[]).includes(extensionOf(f.name)), {
      message: "Choose a .iq file (plain text written in the notation)",
    })
    .refine((f) => f.type === "" || f.type.startsWith("text/") || f.type === "application/octet-stream", {
      message: "That file is not plain text; choose a .iq file",
    })
    .refine((f) => f.size > 0, { message: "That file is empty" })
    .refine((f) => f.size <= SOURCE_MAX_BYTES, { message: `That file is over the ${kb(SOURCE_MAX_BYTES)} limit` }),
  title: titleSchema.optional(),
});

/** The file name without folders or extension, as a title: "upper_lower-v3.iq" → "upper lower v3". */
export function titleFromFileName(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? "";
  const ext = extensionOf(base);
  return (ext ? base.slice(0, -ext.length) : base).replace(/[-_]+/g, " ").trim();
}
