import { z } from "zod";
import { noteSchema, versionSourceSchema } from "@/db/templateRules";

/** POST /api/templates/[id]/versions */
export const saveVersionBodySchema = z.object({
  source: versionSourceSchema,
  note: noteSchema.nullish(),
});
