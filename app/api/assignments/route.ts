import { assignTemplate, listAssignments } from "@/db/assignments";
import { getDb } from "@/db/client";
import { toJobView } from "@/db/jobs";
import { AppError } from "@/server/errors";
import { guardedBoss } from "@/server/jobs/boss";
import { enqueueBulkAssign } from "@/server/jobs/bulkAssign";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, queryOf, readJson } from "@/server/http";
import { assignBodySchema, listQuerySchema } from "./schema";

/** An athlete's assignments (their coach, or the athlete themself). */
export async function GET(req: Request) {
  return answer(async () => {
    const viewer = await requireViewer(["coach", "athlete"]);
    const { athleteId } = parseWith(listQuerySchema, queryOf(req));
    return ok({ assignments: await listAssignments(getDb(), viewer, athleteId) });
  });
}

/**
 * Gives a template version to athletes. One athlete is assigned now (201);
 * several become a background job (202) whose progress GET /api/jobs/[id]
 * answers. Both answer `{ job }` in the same shape; an inline job has no id.
 */
export async function POST(req: Request) {
  return answer(async () => {
    const viewer = await requireViewer(["coach", "athlete"]);
    const body = await readJson(req, assignBodySchema);
    const db = getDb();
    if (body.athleteIds.length > 1) {
      const run = await enqueueBulkAssign(db, await guardedBoss(), viewer, body);
      return ok({ job: toJobView(run) }, 202);
    }
    const { outcomes } = await assignTemplate(db, viewer, body);
    const only = outcomes[0];
    if (only.status === "failed") {
      const code = only.error.code === "not_found" || only.error.code === "conflict" || only.error.code === "invalid_input" ? only.error.code : "internal";
      throw new AppError(code, only.error.message, code === "internal" ? {} : { "athleteIds.0": only.error.message });
    }
    const now = new Date();
    const job = { id: null, kind: "bulk-assign", status: "done", total: 1, done: 1, failed: 0, result: { outcomes }, error: null, createdAt: now, finishedAt: now };
    return ok({ job }, 201);
  });
}
