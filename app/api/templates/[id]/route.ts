import { getDb } from "@/db/client";
import { deleteTemplate, getTemplate, updateTemplateMeta } from "@/db/templates";
import { requireViewer } from "@/server/guard";
import { answer, notFound, ok, parseWith, readJson } from "../_lib/http";
import { idParamsSchema, patchBodySchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

export async function GET(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const template = await getTemplate(getDb(), viewer, id);
    if (!template) throw notFound();
    return ok({ template });
  });
}

/** Title, description, tags, visibility, or archived (true archives, false brings it back). */
export async function PATCH(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const patch = await readJson(req, patchBodySchema);
    const db = getDb();
    await updateTemplateMeta(db, viewer, id, patch);
    return ok({ template: await getTemplate(db, viewer, id) });
  });
}

/** Deletes the template, or archives it when athletes were given it (`outcome` says which). */
export async function DELETE(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    return ok(await deleteTemplate(getDb(), viewer, id));
  });
}
