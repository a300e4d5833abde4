import { listingInputSchema } from "@/db/listings";

export { idParamsSchema } from "../../../schema";

/** PUT /api/store/templates/[id]/listing: the whole listing; priceMinor in integer minor units (2900 = 29.00). */
export const listingBodySchema = listingInputSchema;
