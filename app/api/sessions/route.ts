import { getDb } from "@/db/client";
import { listSessions } from "@/db/sessions";
import { requireViewer } from "@/server/guard";
import { answer, ok, parseWith, queryOf } from "@/server/http";
import { athleteIdFor } from "./_lib/athlete";
import { listQuerySchema } from "./schema";

/** The athlete's sessions in a date range (at most 400 days), for calendars. */
export async function GET(req: Request) {
  return answer(async () => {
    const viewer = await requireViewer(["athlete", "coach"]);
    const q = parseWith(listQuerySchema, queryOf(req));
    const sessions = await listSessions(getDb(), viewer, athleteIdFor(viewer, q.athleteId), q.from, q.to);
    return ok({ sessions });
  });
}
