import { z } from "zod";
import { WEEKS_BUCKETS } from "@/db/catalogue";
import { LEVELS } from "@/db/listings";

/** GET /api/store/listings: the public catalogue's search and filters. */
export const catalogueQuerySchema = z.object({
  q: z.string().trim().max(100, "Keep the search to 100 characters").optional(),
  tag: z.string().trim().toLowerCase().max(32, "A tag has at most 32 characters").optional(),
  weeks: z.enum(WEEKS_BUCKETS as [string, ...string[]], { error: `weeks is one of ${WEEKS_BUCKETS.join(", ")}` }).optional(),
  days: z
    .string()
    .regex(/^[1-7]$/, "days is a number of days per week, 1 to 7")
    .transform(Number)
    .optional(),
  level: z.enum(LEVELS, { error: "level is beginner, intermediate or advanced" }).optional(),
  page: z
    .string()
    .regex(/^\d{1,5}$/, "page is a whole number")
    .transform(Number)
    .refine((n) => n >= 1, "page starts at 1")
    .optional(),
});
