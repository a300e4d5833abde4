import { getDb } from "@/db/client";
import { coachDashboard } from "@/db/dashboard";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, queryOf } from "@/server/http";
import { dashboardQuerySchema } from "./schema";

/** The coach's roster: planned vs logged, last session, flags, open proposals per athlete. */
export async function GET(req: Request) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { today } = parseWith(dashboardQuerySchema, queryOf(req));
    return ok({ dashboard: await coachDashboard(getDb(), viewer, today ? { today } : {}) });
  });
}
