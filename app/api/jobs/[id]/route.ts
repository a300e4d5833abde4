import { getDb } from "@/db/client";
import { getJobFor } from "@/db/jobs";
import { AppError } from "@/server/errors";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith } from "@/server/http";
import { idParamsSchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

/** Progress of background work, only to the person who asked for it. */
export async function GET(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["admin", "coach", "athlete"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const job = await getJobFor(getDb(), viewer, id);
    if (!job) throw new AppError("not_found", "That job does not exist or is not yours.");
    return ok({ job });
  });
}
