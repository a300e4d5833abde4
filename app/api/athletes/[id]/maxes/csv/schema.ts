import { z } from "zod";
import { CSV_MAX_BYTES } from "@/lib/athlete/maxesCsv";

export { athleteParamsSchema } from "../../schema";

/** POST /api/athletes/[id]/maxes/csv?mode=preview|apply — preview writes nothing; apply writes every row or none. */
export const csvQuerySchema = z.object({
  mode: z.enum(["preview", "apply"], { error: "mode is preview or apply" }),
});

/** The multipart form: the file in a field named `file`. A text/csv or text/plain body is taken as the file itself. */
export const csvFormSchema = z.object({
  file: z
    .instanceof(File, { message: "Choose a .csv file to upload (form field file)" })
    .refine((f) => f.size > 0, { message: "That file is empty" })
    .refine((f) => f.size <= CSV_MAX_BYTES, { message: `That file is over the ${CSV_MAX_BYTES / 1024} KB limit; split it into smaller files` }),
});
