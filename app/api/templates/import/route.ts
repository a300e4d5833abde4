import { getDb } from "@/db/client";
import { SOURCE_MAX_BYTES } from "@/db/templateRules";
import { createTemplate, getTemplate } from "@/db/templates";
import { parseProgramme } from "@/lib/notation/index";
import { AppError } from "@/server/errors";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith } from "../_lib/http";
import { describeProgramme } from "../_lib/samples";
import { importFormSchema, titleFromFileName } from "./schema";

// Room for the multipart envelope around a file at the limit.
const BODY_MAX_BYTES = SOURCE_MAX_BYTES + 16 * 1024;

/** Text only: valid UTF-8 without control characters other than tab and line breaks. */
function decodeText(bytes: ArrayBuffer): string {
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    throw new AppError("invalid_input", "That file is not UTF-8 text; save it as UTF-8 and upload it again.", { file: "Not UTF-8 text" });
  }
  // eslint-disable-next-line no-control-regex
  const bad = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/.exec(text);
  if (bad) {
    const line = text.slice(0, bad.index).split("\n").length;
    throw new AppError("invalid_input", `That file is not plain text (a control character on line ${line}).`, { file: "Not plain text" });
  }
  return text;
}

/**
 * Uploads a .iq file (≤ 256 KB) as a new template. Its title comes from the
 * form, else the file's `title:` line, else the file name.
 */
export async function POST(req: Request) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const declared = Number(req.headers.get("content-length") ?? "0");
    if (declared > BODY_MAX_BYTES) {
      throw new AppError("invalid_input", `That file is over the ${SOURCE_MAX_BYTES / 1024} KB limit.`, { file: "Too large" });
    }
    let form: FormData;
    try {
      form = await req.formData();
    } catch {
      throw new AppError("invalid_input", "Send the file as multipart/form-data in a field named file.", { file: "No file received" });
    }
    const { file, title } = parseWith(importFormSchema, { file: form.get("file") ?? undefined, title: form.get("title") || undefined });
    const source = decodeText(await file.arrayBuffer());
    const meta = describeProgramme(parseProgramme(source).programme, source, titleFromFileName(file.name) || "Imported programme");
    const db = getDb();
    const created = await createTemplate(db, viewer, {
      ...meta,
      title: title ?? meta.title,
      source,
      note: `Imported from ${file.name.split(/[\\/]/).pop()}`.slice(0, 500),
    });
    return ok({ template: await getTemplate(db, viewer, created.id) }, 201);
  });
}
