import { z } from "zod";

/** GET /api/store/checkout/status?session_id=… */
export const statusQuerySchema = z.object({
  session_id: z.string({ error: "session_id is missing" }).regex(/^[\w-]{1,255}$/, "session_id is not a checkout reference"),
});
