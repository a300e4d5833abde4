import { z } from "zod";
import { CARD_SIZES } from "@/pdf/sizes";

/** Route params of /api/sessions/[id]/card: any text; an id that is not the viewer's is simply not found. */
export const idParamsSchema = z.object({ id: z.string().max(100) });

/** `?size=a6|a5|letter`, any case; A6 when left out. */
export const sizeSchema = z
  .string()
  .transform((s) => s.toLowerCase())
  .pipe(z.enum(CARD_SIZES, { error: "size is a6, a5 or letter" }))
  .optional()
  .transform((s) => s ?? "a6");

/** GET /api/sessions/[id]/card?size=a6|a5|letter */
export const cardQuerySchema = z.object({ size: sizeSchema });
