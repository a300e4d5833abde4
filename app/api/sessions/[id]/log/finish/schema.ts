import { z } from "zod";

export { sessionParamsSchema } from "../schema";
/** POST body: nothing needed. */
export const finishBodySchema = z.object({});
