import { getDb } from "@/db/client";
import { applyMaxesCsv, previewMaxesCsv } from "@/db/athleteMaxes";
import { CSV_MAX_BYTES } from "@/lib/athlete/maxesCsv";
import { AppError } from "@/server/errors";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, queryOf } from "@/server/http";
import { athleteParamsSchema, csvFormSchema, csvQuerySchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

// Room for the multipart envelope around a file at the limit.
const BODY_MAX_BYTES = CSV_MAX_BYTES + 16 * 1024;

function tooLarge(): AppError {
  return new AppError("invalid_input", `That file is over the ${CSV_MAX_BYTES / 1024} KB limit; split it into smaller files.`, { file: "Too large" });
}

/** UTF-8 text; a spreadsheet's own file format or another encoding gets a message saying how to save it instead. */
function decode(bytes: Uint8Array): string {
  if (bytes.length > CSV_MAX_BYTES) throw tooLarge();
  if (bytes[0] === 0x50 && bytes[1] === 0x4b) {
    throw new AppError("invalid_input", "That is a spreadsheet file, not CSV. Save it as “CSV UTF-8” and upload that.", { file: "Not a CSV file" });
  }
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    throw new AppError("invalid_input", "That file is not UTF-8 text. Save it as “CSV UTF-8” and upload it again.", { file: "Not UTF-8 text" });
  }
  // eslint-disable-next-line no-control-regex
  const bad = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/.exec(text);
  if (bad) {
    const line = text.slice(0, bad.index).split("\n").length;
    throw new AppError("invalid_input", `That file is not plain text (a control character on line ${line}).`, { file: "Not plain text" });
  }
  return text;
}

async function readCsv(req: Request): Promise<string> {
  if (Number(req.headers.get("content-length") ?? "0") > BODY_MAX_BYTES) throw tooLarge();
  const type = (req.headers.get("content-type") ?? "").toLowerCase();
  if (type.startsWith("multipart/form-data")) {
    let form: FormData;
    try {
      form = await req.formData();
    } catch {
      throw new AppError("invalid_input", "Send the file as multipart/form-data in a field named file.", { file: "No file received" });
    }
    const { file } = parseWith(csvFormSchema, { file: form.get("file") ?? undefined });
    return decode(new Uint8Array(await file.arrayBuffer()));
  }
  if (type.startsWith("text/csv") || type.startsWith("text/plain")) {
    return decode(new Uint8Array(await req.arrayBuffer()));
  }
  throw new AppError("invalid_input", "Send the CSV as a file (multipart/form-data, field file) or as a text/csv body.", { file: "No file received" });
}

/**
 * Maxes from a CSV file. `mode=preview` checks every row and writes nothing;
 * `mode=apply` checks again and adds all rows in one transaction, or none
 * when any row has a problem (422 with the problems by line and column).
 */
export async function POST(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach", "athlete"]);
    const { id } = parseWith(athleteParamsSchema, await ctx.params);
    const { mode } = parseWith(csvQuerySchema, queryOf(req));
    const db = getDb();
    const text = await readCsv(req);
    if (mode === "preview") return ok({ mode, ...(await previewMaxesCsv(db, viewer, id, text)) });
    return ok({ mode, ...(await applyMaxesCsv(db, viewer, id, text)) });
  });
}
