import { z } from "zod";
import { aliasesSchema, cuesSchema, equipmentSchema, groupSchema, musclesSchema, nameSchema, patternSchema } from "@/db/exerciseRules";

/** Route params of /api/exercises/[id]/…: any text; an id that is not one of the coach's exercises is simply not found. */
export const idParamsSchema = z.object({ id: z.string().max(100) });

/** PATCH /api/exercises/[id]: any of these, at least one. */
export const patchBodySchema = z
  .object({
    name: nameSchema.optional(),
    aliases: aliasesSchema.optional(),
    equipment: equipmentSchema.optional(),
    primaryMuscles: musclesSchema.optional(),
    movementPattern: patternSchema.optional(),
    cues: cuesSchema.optional(),
    substitutionGroup: groupSchema.optional(),
  })
  .refine((b) => Object.values(b).some((v) => v !== undefined), "Send at least one of name, aliases, equipment, primaryMuscles, movementPattern, cues, substitutionGroup");
