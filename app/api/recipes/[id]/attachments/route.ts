import { getDb } from "@/db/client";
import { attachRecipe } from "@/db/recipes";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, readJson } from "@/server/http";
import { attachBodySchema, idParamsSchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

/** Attaches the recipe to a template (all its athletes see it) or to one athlete's assignment. */
export async function POST(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const target = await readJson(req, attachBodySchema);
    return ok({ attachments: await attachRecipe(getDb(), viewer, id, target) }, 201);
  });
}
