import { z } from "zod";
import {
  descriptionSchema,
  draftSourceSchema,
  noteSchema,
  tagsSchema,
  titleSchema,
  versionSourceSchema,
} from "@/db/templateRules";

const pageNumber = (name: string, max: number, fallback: number) =>
  z
    .string()
    .regex(/^\d{1,6}$/, `${name} is a whole number`)
    .transform(Number)
    .refine((n) => n >= 1 && n <= max, `${name} is between 1 and ${max}`)
    .optional()
    .transform((n) => n ?? fallback);

/** GET /api/templates */
export const listQuerySchema = z.object({
  q: z.string().trim().max(100, "Keep the search to 100 characters").optional(),
  tag: z.string().trim().toLowerCase().max(32, "A tag has at most 32 characters").optional(),
  page: pageNumber("page", 100_000, 1),
  pageSize: pageNumber("pageSize", 100, 20),
  archived: z.enum(["include", "exclude"], { error: "archived is include or exclude" }).optional(),
});

/** POST /api/templates */
export const createBodySchema = z.object({
  title: titleSchema,
  description: descriptionSchema.optional(),
  tags: tagsSchema.optional(),
  source: versionSourceSchema,
  note: noteSchema.nullish(),
  /** True when the editor saves its "new" draft: that draft is cleared with the save. */
  fromDraft: z.boolean({ error: "fromDraft is true or false" }).optional(),
});

/** PUT of a draft (shared by /api/templates/[id]/draft and /api/templates/drafts/new). */
export const draftBodySchema = z.object({
  source: draftSourceSchema,
  baseVersion: z.number({ error: "baseVersion is a version number" }).int("baseVersion is a version number").min(1).nullish(),
});
