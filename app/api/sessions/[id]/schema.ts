import { z } from "zod";
import { dateSchema } from "../schema";

/** Route params of /api/sessions/[id]: any text; an id that is not the viewer's is simply not found. */
export const idParamsSchema = z.object({ id: z.string().max(100) });

/** PATCH /api/sessions/[id]: the day to move the session to. */
export const moveBodySchema = z.object({ date: dateSchema("date") });
