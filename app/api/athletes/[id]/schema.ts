import { z } from "zod";

/** Route params of /api/athletes/[id]/…: any text; an id that is not one of the viewer's athletes is simply not found. */
export const athleteParamsSchema = z.object({ id: z.string().max(100) });
