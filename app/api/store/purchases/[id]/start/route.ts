import { assignTemplate } from "@/db/assignments";
import { getDb } from "@/db/client";
import { getMyPurchase } from "@/db/purchases";
import { AppError } from "@/server/errors";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, readJson } from "@/server/http";
import { idParamsSchema, startBodySchema } from "./schema";

/**
 * The buyer gives their own copy to themself: dated sessions with their own
 * loads from the start date. Only while the purchase stands (not refunded).
 */
export async function POST(req: Request, ctx: { params: Promise<{ id: string }> }) {
  return answer(async () => {
    const viewer = await requireViewer(["athlete"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const body = await readJson(req, startBodySchema);
    const db = getDb();
    const { copy } = await getMyPurchase(db, viewer, id);
    if (!copy) throw new AppError("conflict", "This purchase has no copy to start: it is not paid yet, or it was refunded.");
    const { outcomes } = await assignTemplate(db, viewer, { versionId: copy.versionId, athleteIds: [viewer.id], startDate: body.startDate, weekdays: body.weekdays });
    const outcome = outcomes[0];
    if (outcome.status === "failed") throw new AppError(outcome.error.code === "not_found" ? "not_found" : "conflict", outcome.error.message);
    return ok({ assignmentId: outcome.assignmentId, sessions: outcome.sessions, firstDate: outcome.firstDate, diagnostics: outcome.diagnostics }, 201);
  });
}
