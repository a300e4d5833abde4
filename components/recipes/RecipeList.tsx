import Link from "next/link";
import type { Nutrients } from "@/lib/nutrition";
import { NutritionFacts } from "./NutritionFacts";

export type RecipeListItem = { id: string; title: string; servings: number; perServing: Nutrients; note: string };

/** Recipes as links, each with its per-serving values on one line. Server-safe. */
export function RecipeList({ items, hrefBase, testId }: { items: RecipeListItem[]; hrefBase: string; testId: string }) {
  return (
    <ul className="panel divide-y divide-chalk-200" data-testid={testId}>
      {items.map((r) => (
        <li key={r.id}>
          <Link href={`${hrefBase}/${r.id}`} className="block px-4 py-3 hover:bg-chalk-50">
            <span className="flex flex-wrap items-baseline justify-between gap-x-4">
              <span className="font-semibold text-iron">{r.title}</span>
              <span className="text-xs text-iron-400">{r.note}</span>
            </span>
            <span className="mt-0.5 block">
              <span className="text-xs text-iron-400">a serving: </span>
              <NutritionFacts perServing={r.perServing} testIdPrefix={`recipe-${r.id}`} compact />
            </span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
