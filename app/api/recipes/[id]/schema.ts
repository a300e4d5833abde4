import { z } from "zod";
import { recipeInputSchema } from "@/lib/nutrition";

/** Route params of /api/recipes/[id]/…: any text; an id that is not a readable recipe is simply not found. */
export const idParamsSchema = z.object({ id: z.string().max(100) });

/** PUT /api/recipes/[id]: the whole recipe, replacing the stored one (attachments stay). */
export const putBodySchema = recipeInputSchema;
