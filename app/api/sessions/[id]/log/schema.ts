import { z } from "zod";

/** Route params of /api/sessions/[id]/log/…: any text; an id that is not a session is simply not found. */
export const sessionParamsSchema = z.object({ id: z.string().max(100) });
