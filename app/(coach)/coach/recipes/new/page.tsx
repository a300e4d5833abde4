import { PageTitle } from "@/components/AppShell";
import { RecipeEditor } from "@/components/recipes/RecipeEditor";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "New recipe" };

export default async function NewRecipePage() {
  await pageViewer(["coach"], "/coach/recipes/new");
  return (
    <>
      <PageTitle title="New recipe" lead="The panel on the right shows one serving as you type. After saving you can attach the recipe and print its card." />
      <RecipeEditor recipe={null} />
    </>
  );
}
