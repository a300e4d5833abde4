import { z } from "zod";

/** Route params of /api/jobs/[id]: any text; an id that is not the viewer's job is simply not found. */
export const idParamsSchema = z.object({ id: z.string().max(100) });
