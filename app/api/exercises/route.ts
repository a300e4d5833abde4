import { getDb } from "@/db/client";
import { createExercise, listLibrary } from "@/db/exercises";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, queryOf, readJson } from "./_lib/http";
import { createBodySchema, listQuerySchema } from "./schema";

/** The built-in catalogue and the coach's own exercises: ?q= (name, alias or muscle), ?sort=name|equipment|pattern, ?dir=, ?page=, ?pageSize= (≤ 100). */
export async function GET(req: Request) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const query = parseWith(listQuerySchema, queryOf(req));
    return ok(await listLibrary(getDb(), viewer, query));
  });
}

/** A new exercise in the coach's library. */
export async function POST(req: Request) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const body = await readJson(req, createBodySchema);
    return ok({ exercise: await createExercise(getDb(), viewer, body) }, 201);
  });
}
