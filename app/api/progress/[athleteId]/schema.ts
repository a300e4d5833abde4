import { z } from "zod";

/** Route params of /api/progress/[athleteId]: an id that is not the viewer's athlete is simply not found. */
export const progressParamsSchema = z.object({ athleteId: z.string().max(100) });
