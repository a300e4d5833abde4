import { notFound } from "next/navigation";
import type { ReactNode } from "react";
import { PageTitle } from "@/components/AppShell";
import { AttachPanel } from "@/components/recipes/AttachPanel";
import { CardLinks } from "@/components/recipes/CardLinks";
import { DeleteRecipe } from "@/components/recipes/DeleteRecipe";
import { RecipeEditor } from "@/components/recipes/RecipeEditor";
import { getDb } from "@/db/client";
import { attachTargets, getRecipe } from "@/db/recipes";
import { isUuid } from "@/db/templateRules";
import { pageViewer } from "@/server/guard";

export const metadata = { title: "Recipe" };

export default async function RecipePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const viewer = await pageViewer(["coach"], `/coach/recipes/${id}`);
  if (!isUuid(id)) notFound();
  const db = getDb();
  const [recipe, targets] = await Promise.all([getRecipe(db, viewer, id), attachTargets(db, viewer)]);
  if (!recipe) notFound();
  const json = { ...recipe, updatedAt: recipe.updatedAt.toISOString() };
  return (
    <>
      <PageTitle title={recipe.title} lead={`Serves ${recipe.servings}`} actions={<CardLinks recipeId={id} />} />
      <RecipeEditor recipe={json} />
      <div className="mt-8 grid gap-4 lg:grid-cols-3">
        <Card title="Who sees it" className="lg:col-span-2">
          <AttachPanel recipeId={id} initial={recipe.attachments} targets={targets} />
        </Card>
        <Card title="Delete">
          <DeleteRecipe id={id} title={recipe.title} />
        </Card>
      </div>
    </>
  );
}

function Card({ title, children, className = "" }: { title: string; children: ReactNode; className?: string }) {
  return (
    <section className={`panel p-4 ${className}`} aria-label={title}>
      <h2 className="mb-3 text-sm font-semibold uppercase tracking-wider text-iron-400">{title}</h2>
      {children}
    </section>
  );
}
