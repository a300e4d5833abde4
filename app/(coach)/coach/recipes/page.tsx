import Link from "next/link";
import { PageTitle } from "@/components/AppShell";
import { EmptyState } from "@/components/EmptyState";
import { RecipeList } from "@/components/recipes/RecipeList";
import { getDb } from "@/db/client";
import { listRecipes } from "@/db/recipes";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Recipes" };

export default async function RecipesPage() {
  const viewer = await pageViewer(["coach"], "/coach/recipes");
  const recipes = await listRecipes(getDb(), viewer);
  const items = recipes.map((r) => ({
    id: r.id,
    title: r.title,
    servings: r.servings,
    perServing: r.perServing,
    note: `serves ${r.servings} · ${r.ingredientCount} ingredient${r.ingredientCount === 1 ? "" : "s"} · ${r.attachmentCount === 0 ? "not attached" : `attached ${r.attachmentCount}×`}`,
  }));
  return (
    <>
      <PageTitle
        title="Recipes"
        lead="Simple recipes with energy and macros per serving, worked from the food labels. Attach them to a template or an athlete's programme and they print as cards."
        actions={<Link href="/coach/recipes/new" className="btn-primary">New recipe</Link>}
      />
      {items.length === 0 ? (
        <EmptyState title="No recipes yet" action={<Link href="/coach/recipes/new" className="btn-primary">Write the first recipe</Link>}>
          Add the ingredients with the values from each label; the energy and macros per serving are worked out as you type.
        </EmptyState>
      ) : (
        <RecipeList items={items} hrefBase="/coach/recipes" testId="recipe-list" />
      )}
    </>
  );
}
