import { z } from "zod";
import { SAMPLE_NAME } from "../_lib/samples";

/** POST /api/templates/from-sample */
export const fromSampleBodySchema = z.object({
  sample: z.string({ error: "Choose a sample" }).regex(SAMPLE_NAME, "That is not the name of a sample"),
});
