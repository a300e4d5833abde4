import { getDb } from "@/db/client";
import { finishSession } from "@/db/logs";
import { sessionSummary } from "@/db/progress";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, readJson } from "@/server/http";
import { finishBodySchema, sessionParamsSchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

/** Marks the session finished, looks for max changes to propose, and answers its summary. */
export async function POST(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["athlete"]);
    const { id } = parseWith(sessionParamsSchema, await ctx.params);
    await readJson(req, finishBodySchema, { emptyIsObject: true });
    const db = getDb();
    const finished = await finishSession(db, viewer, id);
    return ok({ ...finished, summary: await sessionSummary(db, viewer, id) });
  });
}
