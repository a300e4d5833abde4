import { getDb } from "@/db/client";
import { listRoster } from "@/db/athleteAccess";
import { requireViewer } from "@/server/guard";
import { answer, ok } from "@/server/http";

/** The coach's athletes, by name. Each one's gym and maxes: GET /api/athletes/[id]. */
export async function GET() {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    return ok({ athletes: await listRoster(getDb(), viewer) });
  });
}
