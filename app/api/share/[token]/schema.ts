import { z } from "zod";

/** Any text: a token that is not one of ours is simply not found. */
export const tokenParamsSchema = z.object({ token: z.string().max(200) });
