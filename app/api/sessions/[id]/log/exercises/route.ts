import { getDb } from "@/db/client";
import { saveExerciseLog } from "@/db/logs";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, readJson } from "@/server/http";
import { exerciseBodySchema, sessionParamsSchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

/** Swaps an exercise slot to a listed substitute (or back) and/or saves its note. */
export async function PUT(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["athlete"]);
    const { id } = parseWith(sessionParamsSchema, await ctx.params);
    const body = await readJson(req, exerciseBodySchema);
    return ok({ exercise: await saveExerciseLog(getDb(), viewer, id, body) });
  });
}
