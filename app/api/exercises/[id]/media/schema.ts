import { z } from "zod";
import { MEDIA_RULE } from "@/db/exerciseRules";

export { idParamsSchema } from "../schema";

/** POST /api/exercises/[id]/media (multipart/form-data): one `file`; its bytes are checked by the query module. */
export const mediaFormSchema = z.object({
  file: z.instanceof(File, { message: `Choose a file to upload (form field file). ${MEDIA_RULE}` }),
});
