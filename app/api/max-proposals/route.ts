import { getDb } from "@/db/client";
import { listProposals } from "@/db/maxProposals";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, queryOf } from "@/server/http";
import { proposalsQuerySchema } from "./schema";

/** Open max proposals of an athlete, for them or their coach. */
export async function GET(req: Request) {
  return answer(async () => {
    const viewer = await requireViewer(["athlete", "coach"]);
    const { athleteId } = parseWith(proposalsQuerySchema, queryOf(req));
    return ok({ proposals: await listProposals(getDb(), viewer, athleteId) });
  });
}
