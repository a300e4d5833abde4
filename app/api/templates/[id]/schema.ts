import { z } from "zod";
import { descriptionSchema, tagsSchema, titleSchema, visibilitySchema } from "@/db/templateRules";

/** Route params of /api/templates/[id]/…: any text; an id that is not a template is simply not found. */
export const idParamsSchema = z.object({ id: z.string().max(100) });

/** PATCH /api/templates/[id]: any of these, at least one. */
export const patchBodySchema = z
  .object({
    title: titleSchema.optional(),
    description: descriptionSchema.optional(),
    tags: tagsSchema.optional(),
    visibility: visibilitySchema.optional(),
    archived: z.boolean({ error: "archived is true or false" }).optional(),
  })
  .refine((b) => Object.values(b).some((v) => v !== undefined), "Send at least one of title, description, tags, visibility, archived");
