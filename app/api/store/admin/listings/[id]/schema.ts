import { z } from "zod";
import { REASON_MAX } from "@/db/listings";

export { idParamsSchema } from "../../../schema";

/** PATCH /api/store/admin/listings/[id]: take it out of the store (with a reason the coach sees) or let it back. */
export const unlistBodySchema = z.object({
  unlisted: z.boolean({ error: "unlisted is true or false" }),
  reason: z.string({ error: "The reason is text" }).trim().max(REASON_MAX, `Keep the reason to ${REASON_MAX} characters`).nullish(),
});
