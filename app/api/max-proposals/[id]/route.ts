import { getDb } from "@/db/client";
import { acceptProposal, dismissProposal } from "@/db/maxProposals";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, readJson } from "@/server/http";
import { decisionBodySchema, proposalParamsSchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

/** Accepts or dismisses a proposal: the coach, or an athlete who coaches themself. */
export async function POST(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["athlete", "coach"]);
    const { id } = parseWith(proposalParamsSchema, await ctx.params);
    const { decision } = await readJson(req, decisionBodySchema);
    const db = getDb();
    if (decision === "accept") return ok({ decision, ...(await acceptProposal(db, viewer, id)) });
    await dismissProposal(db, viewer, id);
    return ok({ decision });
  });
}
