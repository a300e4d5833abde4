import { z } from "zod";

/** POST /api/store/checkout: which listing, and an id the page makes once per checkout attempt. */
export const checkoutBodySchema = z.object({
  listingId: z.string({ error: "Say which programme to buy" }).uuid("Say which programme to buy"),
  attemptId: z.string({ error: "attemptId is missing; reload the page" }).uuid("attemptId is not an id; reload the page"),
});
