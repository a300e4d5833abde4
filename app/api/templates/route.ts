import { getDb } from "@/db/client";
import { createTemplate, getTemplate, listTemplates } from "@/db/templates";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, queryOf, readJson } from "./_lib/http";
import { createBodySchema, listQuerySchema } from "./schema";

/** The coach's templates: ?q= (title or tag), ?tag=, ?page=, ?pageSize= (≤ 100), ?archived=include. */
export async function GET(req: Request) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const query = parseWith(listQuerySchema, queryOf(req));
    const page = await listTemplates(getDb(), viewer, { ...query, includeArchived: query.archived === "include" });
    return ok(page);
  });
}

/** A new template with its version 1. */
export async function POST(req: Request) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const body = await readJson(req, createBodySchema);
    const db = getDb();
    const created = await createTemplate(db, viewer, body, { clearNewDraft: body.fromDraft === true });
    return ok({ template: await getTemplate(db, viewer, created.id) }, 201);
  });
}
