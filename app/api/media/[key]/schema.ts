import { z } from "zod";

/** Route params of /api/media/[key]: a short key; one that is not a media key is simply not found. */
export const keyParamsSchema = z.object({ key: z.string().max(200) });
