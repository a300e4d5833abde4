import { z } from "zod";
import { aliasesSchema, cuesSchema, equipmentSchema, groupSchema, musclesSchema, nameSchema, patternSchema, SORTS } from "@/db/exerciseRules";

const pageNumber = (name: string, max: number, fallback: number) =>
  z
    .string()
    .regex(/^\d{1,6}$/, `${name} is a whole number`)
    .transform(Number)
    .refine((n) => n >= 1 && n <= max, `${name} is between 1 and ${max}`)
    .optional()
    .transform((n) => n ?? fallback);

/** GET /api/exercises */
export const listQuerySchema = z.object({
  q: z.string().trim().max(100, "Keep the search to 100 characters").optional(),
  sort: z.enum(SORTS, { error: "sort is name, equipment or pattern" }).optional(),
  dir: z.enum(["asc", "desc"], { error: "dir is asc or desc" }).optional(),
  page: pageNumber("page", 100_000, 1),
  pageSize: pageNumber("pageSize", 100, 25),
});

/** POST /api/exercises */
export const createBodySchema = z.object({
  name: nameSchema,
  aliases: aliasesSchema.optional(),
  equipment: equipmentSchema,
  primaryMuscles: musclesSchema.optional(),
  movementPattern: patternSchema.optional(),
  cues: cuesSchema.optional(),
  substitutionGroup: groupSchema.optional(),
});
