import { recipeInputSchema } from "@/lib/nutrition";

/** POST /api/recipes: the whole recipe (lib/nutrition/rules.ts names every field at fault). */
export const createBodySchema = recipeInputSchema;
