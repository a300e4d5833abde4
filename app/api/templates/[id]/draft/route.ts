import { draftHandlers } from "../../_lib/drafts";
import { parseWith } from "../../_lib/http";
import { idParamsSchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

const handlers = draftHandlers(async (ctx) => parseWith(idParamsSchema, await (ctx as Ctx).params).id);

/** The coach's unsaved work on this template: { draft: { source, baseVersion, updatedAt } | null }. */
export async function GET(req: Request, ctx: Ctx) {
  return handlers.GET(req, ctx);
}

/** Autosave { source, baseVersion? }: kept whatever it contains. */
export async function PUT(req: Request, ctx: Ctx) {
  return handlers.PUT(req, ctx);
}

export async function DELETE(req: Request, ctx: Ctx) {
  return handlers.DELETE(req, ctx);
}
