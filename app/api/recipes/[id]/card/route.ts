import { getDb } from "@/db/client";
import { readableRecipe, recipeNotFound } from "@/db/recipes";
import { attachmentHeader, slug } from "@/pdf/fileName";
import { renderRecipeCard } from "@/pdf/recipe/render";
import { requireViewer } from "@/server/guard";
import { answer, parseWith, queryOf } from "@/server/http";
import { cardQuerySchema, idParamsSchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

/** The printable recipe card as a PDF: the coach's own recipe, or one attached to the athlete's programme. */
export async function GET(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach", "athlete"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const { size } = parseWith(cardQuerySchema, queryOf(req));
    const recipe = await readableRecipe(getDb(), viewer, id);
    if (!recipe) throw recipeNotFound();
    const pdf = await renderRecipeCard({ ...recipe, byline: recipe.by }, size);
    return new Response(new Uint8Array(pdf), {
      headers: {
        "content-type": "application/pdf",
        "content-disposition": attachmentHeader(`recipe-${slug(recipe.title, "recipe")}-${size}.pdf`),
        "cache-control": "no-store",
      },
    });
  });
}
