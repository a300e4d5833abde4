import { getDb } from "@/db/client";
import { deleteExercise, getExercise, updateExercise } from "@/db/exercises";
import { requireViewer } from "@/server/guard";
import { getStorage } from "@/server/storage";
import { answer, exerciseNotFound, ok, parseWith, readJson } from "../_lib/http";
import { idParamsSchema, patchBodySchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

export async function GET(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const exercise = await getExercise(getDb(), viewer, id);
    if (!exercise) throw exerciseNotFound();
    return ok({ exercise });
  });
}

/** Any of the exercise's fields; the others stay. */
export async function PATCH(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const patch = await readJson(req, patchBodySchema);
    return ok({ exercise: await updateExercise(getDb(), viewer, id, patch) });
  });
}

/** Deletes the exercise and its media. */
export async function DELETE(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    return ok(await deleteExercise(getDb(), getStorage(), viewer, id));
  });
}
