import { AppError } from "@/server/errors";
import { getDb } from "@/db/client";
import { createTemplate, getTemplate } from "@/db/templates";
import { parseProgramme } from "@/lib/notation/index";
import { requireViewer } from "@/server/guard";
import { answer, ok, readJson } from "../_lib/http";
import { describeProgramme, readSample } from "../_lib/samples";
import { fromSampleBodySchema } from "./schema";

/** A new template of the coach's own whose version 1 is a sample's text. */
export async function POST(req: Request) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { sample } = await readJson(req, fromSampleBodySchema);
    const source = await readSample(sample);
    if (source === null) throw new AppError("not_found", `There is no sample called ${sample}.`, { sample: "No such sample" });
    const meta = describeProgramme(parseProgramme(source).programme, source, sample);
    const db = getDb();
    const created = await createTemplate(db, viewer, { ...meta, source, note: `Started from the sample “${meta.title}”` });
    return ok({ template: await getTemplate(db, viewer, created.id) }, 201);
  });
}
