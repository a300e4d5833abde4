import { PageTitle } from "@/components/AppShell";
import { EmptyState } from "@/components/EmptyState";
import { RecipeList } from "@/components/recipes/RecipeList";
import { getDb } from "@/db/client";
import { listAthleteRecipes } from "@/db/recipes";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Recipes" };

export default async function AthleteRecipesPage() {
  const viewer = await pageViewer(["athlete"], "/athlete/recipes");
  const recipes = await listAthleteRecipes(getDb(), viewer);
  const items = recipes.map((r) => ({ id: r.id, title: r.title, servings: r.servings, perServing: r.perServing, note: `serves ${r.servings} · with ${r.via.join(", ")}` }));
  return (
    <>
      <PageTitle title="Recipes" lead="Recipes your coach attached to your programme, with energy and macros for one serving." />
      {items.length === 0 ? (
        <EmptyState title="No recipes yet">When your coach attaches a recipe to your programme, it shows here and you can print its card.</EmptyState>
      ) : (
        <RecipeList items={items} hrefBase="/athlete/recipes" testId="athlete-recipes" />
      )}
    </>
  );
}
