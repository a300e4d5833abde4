import { endAssignment } from "@/db/assignments";
import { getDb } from "@/db/client";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith } from "@/server/http";
import { idParamsSchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

/** Ends the assignment: sessions ahead and never logged go, trained ones stay. */
export async function DELETE(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach", "athlete"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    return ok(await endAssignment(getDb(), viewer, id));
  });
}
