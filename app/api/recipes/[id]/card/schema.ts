import { z } from "zod";
import { CARD_SIZES } from "@/pdf/sizes";

export { idParamsSchema } from "../schema";

/** GET /api/recipes/[id]/card?size=a6|a5|letter (A6 when left out). */
export const cardQuerySchema = z.object({
  size: z
    .string()
    .transform((s) => s.toLowerCase())
    .pipe(z.enum(CARD_SIZES, { error: "size is a6, a5 or letter" }))
    .optional()
    .transform((s) => s ?? "a6"),
});
