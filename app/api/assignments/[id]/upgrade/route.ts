import { applyUpgrade, previewUpgrade } from "@/db/assignmentUpgrade";
import { getDb } from "@/db/client";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, queryOf, readJson } from "@/server/http";
import { idParamsSchema } from "../schema";
import { applyBodySchema, previewQuerySchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

/** What moving to a newer version would change, session by session; changes nothing. */
export async function GET(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach", "athlete"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const { versionId } = parseWith(previewQuerySchema, queryOf(req));
    return ok({ preview: await previewUpgrade(getDb(), viewer, id, versionId) });
  });
}

/** Moves the assignment to the newer version and rewrites the sessions still ahead and unlogged. */
export async function POST(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach", "athlete"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const { versionId } = await readJson(req, applyBodySchema);
    return ok({ upgrade: await applyUpgrade(getDb(), viewer, id, versionId) });
  });
}
