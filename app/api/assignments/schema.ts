import { z } from "zod";
import { assignInputSchema } from "@/db/assignments";

/** POST /api/assignments: { versionId, athleteIds, startDate, weekdays?, autoRegulate? }. */
export const assignBodySchema = assignInputSchema;

/** GET /api/assignments?athleteId=… */
export const listQuerySchema = z.object({
  athleteId: z.string({ error: "Say whose assignments: ?athleteId=…" }).min(1, "Say whose assignments: ?athleteId=…").max(100),
});
