import { getDb } from "@/db/client";
import { createRecipe, listRecipes } from "@/db/recipes";
import { requireViewer } from "@/server/guard";
import { answer, ok, readJson } from "@/server/http";
import { createBodySchema } from "./schema";

/** The coach's recipes, most recently changed first, with per-serving values. */
export async function GET() {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    return ok({ items: await listRecipes(getDb(), viewer) });
  });
}

/** A new recipe. */
export async function POST(req: Request) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const body = await readJson(req, createBodySchema);
    return ok({ recipe: await createRecipe(getDb(), viewer, body) }, 201);
  });
}
