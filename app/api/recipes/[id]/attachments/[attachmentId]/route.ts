import { getDb } from "@/db/client";
import { detachRecipe } from "@/db/recipes";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith } from "@/server/http";
import { paramsSchema } from "./schema";

type Ctx = { params: Promise<{ id: string; attachmentId: string }> };

export async function DELETE(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id, attachmentId } = parseWith(paramsSchema, await ctx.params);
    return ok({ attachments: await detachRecipe(getDb(), viewer, id, attachmentId) });
  });
}
