/**
 * JSON shapes of the recipe API, for the pages that call it. Types only,
 * taken from db/recipes.ts. Dates travel as ISO 8601 strings; failures are
 * the shared `ApiError` (see app/api/templates/types.ts), with fields such as
 * `ingredients.2.density`.
 */
import type { Attachment, RecipeDetail, RecipeSummary } from "@/db/recipes";
import type { AsJson } from "../json";

export type AttachmentJson = Attachment;
export type RecipeJson = AsJson<RecipeDetail>;
export type RecipeSummaryJson = AsJson<RecipeSummary>;

export type RecipeListResponse = { items: RecipeSummaryJson[] };
export type RecipeResponse = { recipe: RecipeJson };
export type AttachmentsResponse = { attachments: AttachmentJson[] };
