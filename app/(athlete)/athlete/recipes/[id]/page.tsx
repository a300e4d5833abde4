import { notFound } from "next/navigation";
import { PageTitle } from "@/components/AppShell";
import { CardLinks } from "@/components/recipes/CardLinks";
import { RecipeView } from "@/components/recipes/RecipeView";
import { getDb } from "@/db/client";
import { listAthleteRecipes } from "@/db/recipes";
import { isUuid } from "@/db/templateRules";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Recipe" };

export default async function AthleteRecipePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const viewer = await pageViewer(["athlete"], `/athlete/recipes/${id}`);
  if (!isUuid(id)) notFound();
  const [recipe] = await listAthleteRecipes(getDb(), viewer, id);
  if (!recipe) notFound();
  return (
    <>
      <PageTitle title={recipe.title} lead={`From ${recipe.by} · with ${recipe.via.join(", ")}`} actions={<CardLinks recipeId={id} />} />
      <RecipeView recipe={recipe} />
    </>
  );
}
