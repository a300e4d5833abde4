import { z } from "zod";

/** Route params of /api/store/…/[id]: any text; an id that names nothing is simply not found. */
export const idParamsSchema = z.object({ id: z.string().max(100) });
