import { z } from "zod";

/** Route params of /api/assignments/[id]/…: any text; an id that is not an assignment is simply not found. */
export const idParamsSchema = z.object({ id: z.string().max(100) });
