import { getDb } from "@/db/client";
import { listVersions, saveVersion } from "@/db/templateVersions";
import { requireViewer } from "@/server/guard";
import { answer, notFound, ok, parseWith, readJson } from "../../_lib/http";
import { idParamsSchema } from "../schema";
import { saveVersionBodySchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

export async function GET(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const versions = await listVersions(getDb(), viewer, id);
    if (!versions) throw notFound();
    return ok({ versions });
  });
}

/** Saves the next version (201); text identical to the latest version saves nothing (200, created: false). */
export async function POST(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const body = await readJson(req, saveVersionBodySchema);
    const result = await saveVersion(getDb(), viewer, id, body);
    const message = result.created
      ? `Saved as version ${result.version.number}.`
      : `Nothing changed since version ${result.version.number}; no new version was made.`;
    return ok({ ...result, message }, result.created ? 201 : 200);
  });
}
