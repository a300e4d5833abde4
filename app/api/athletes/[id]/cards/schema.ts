import { z } from "zod";
import { dateSchema } from "../../../sessions/schema";
import { sizeSchema } from "../../../sessions/[id]/card/schema";

export { athleteParamsSchema } from "../schema";

/**
 * GET /api/athletes/[id]/cards?from=YYYY-MM-DD&weeks=1|4&size=a6|a5|letter:
 * the ISO week holding `from` (and the three after it with weeks=4).
 */
export const cardsQuerySchema = z.object({
  from: dateSchema("from"),
  weeks: z
    .enum(["1", "4"], { error: "weeks is 1 or 4" })
    .optional()
    .transform((w) => (w === "4" ? 4 : 1)),
  size: sizeSchema,
});

/**
 * POST /api/athletes/[id]/cards: e-mail the pack to the athlete, in the
 * background; answers 202 `{ job }` (JobView of app/api/assignments/types.ts,
 * kind "card-pack", total 1).
 */
export const emailBodySchema = z.object({
  from: dateSchema("from"),
  weeks: z.union([z.literal(1), z.literal(4)], { error: "weeks is 1 or 4" }).optional(),
  size: sizeSchema,
});

/** `result` of a finished "card-pack" job, as GET /api/jobs/[id] reports it (a type only; nothing server-side reaches the browser). */
export type { CardPackResult } from "@/server/jobs/cardPack";
