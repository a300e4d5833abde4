/**
 * JSON shapes of the recipe API, for the pages that call it. Types only.
 * Dates travel as ISO 8601 strings; failures are the shared `ApiError`
 * (see app/api/templates/types.ts), with fields such as `ingredients.2.density`.
 */
import type { Ingredient, Nutrients } from "@/lib/nutrition";

export type AttachmentJson = {
  id: string;
  kind: "template" | "assignment";
  templateId: string;
  templateTitle: string;
  assignmentId: string | null;
  athleteName: string | null;
  startDate: string | null;
};

export type RecipeJson = {
  id: string;
  title: string;
  servings: number;
  steps: string[];
  ingredients: Ingredient[];
  perServing: Nutrients;
  updatedAt: string;
  attachments: AttachmentJson[];
};

export type RecipeSummaryJson = {
  id: string;
  title: string;
  servings: number;
  perServing: Nutrients;
  ingredientCount: number;
  attachmentCount: number;
  updatedAt: string;
};

export type RecipeListResponse = { items: RecipeSummaryJson[] };
export type RecipeResponse = { recipe: RecipeJson };
export type AttachmentsResponse = { attachments: AttachmentJson[] };
