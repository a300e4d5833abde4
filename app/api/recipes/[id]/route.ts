import { getDb } from "@/db/client";
import { deleteRecipe, getRecipe, readableRecipe, recipeNotFound, updateRecipe } from "@/db/recipes";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, readJson } from "@/server/http";
import { idParamsSchema, putBodySchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

/** The coach's own recipe with its attachments, or (for an athlete) a recipe attached to their programme. */
export async function GET(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach", "athlete"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const db = getDb();
    const recipe = viewer.role === "coach" ? await getRecipe(db, viewer, id) : await readableRecipe(db, viewer, id);
    if (!recipe) throw recipeNotFound();
    return ok({ recipe });
  });
}

export async function PUT(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const body = await readJson(req, putBodySchema);
    return ok({ recipe: await updateRecipe(getDb(), viewer, id, body) });
  });
}

/** Deletes the recipe and its attachments. */
export async function DELETE(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    return ok(await deleteRecipe(getDb(), viewer, id));
  });
}
