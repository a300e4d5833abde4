import { z } from "zod";

/** Any text: a token that is not a live feed is simply not found. A trailing ".ics" is allowed. */
export const tokenParamsSchema = z.object({ token: z.string().max(200).transform((t) => t.replace(/\.ics$/i, "")) });
