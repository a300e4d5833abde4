import { z } from "zod";

/** Route params of DELETE /api/athletes/[id]/maxes/[maxId]. */
export const maxParamsSchema = z.object({ id: z.string().max(100), maxId: z.string().max(100) });
