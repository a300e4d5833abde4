import { catalogueQuerySchema } from "@/app/api/store/listings/schema";
import { EmptyState } from "@/components/EmptyState";
import { CatalogueFilters } from "@/components/store/CatalogueFilters";
import { ListingCard } from "@/components/store/ListingCard";
import { type CatalogueFilters as Filters, listCatalogue } from "@/db/catalogue";
import { getDb } from "@/db/client";
import Link from "next/link";

export const metadata = { title: "Programme store" };
export const dynamic = "force-dynamic";

type Search = Record<string, string | string[] | undefined>;

/** Each filter is read on its own: one bad value is named and dropped, the others still apply. */
function readFilters(search: Search): { filters: Filters; problems: string[] } {
  const filters: Record<string, unknown> = {};
  const problems: string[] = [];
  for (const key of ["q", "tag", "weeks", "days", "level", "page"] as const) {
    const raw = search[key];
    const value = Array.isArray(raw) ? raw[0] : raw;
    if (value === undefined || value === "") continue;
    const parsed = catalogueQuerySchema.shape[key].safeParse(value);
    if (parsed.success) filters[key] = parsed.data;
    else problems.push(`${key}: ${parsed.error.issues[0]?.message ?? "not understood"}`);
  }
  return { filters: filters as Filters, problems };
}

export default async function StorePage({ searchParams }: { searchParams: Promise<Search> }) {
  const { filters, problems } = readFilters(await searchParams);
  const page = await listCatalogue(getDb(), { ...filters, pageSize: 24 });
  const pages = Math.max(1, Math.ceil(page.total / page.pageSize));
  const link = (n: number) => `/store?${new URLSearchParams(Object.entries({ ...filters, page: n }).filter(([, v]) => v !== undefined && v !== "").map(([k, v]) => [k, String(v)]))}`;
  return (
    <>
      <div className="mb-6">
        <h1 className="text-2xl font-bold tracking-tight text-iron sm:text-3xl">Programmes from coaches</h1>
        <p className="mt-1 max-w-2xl text-sm text-iron-500">Each one is worked out for you: loads from your own maxes, rounded to the plates in your gym, dated into your week.</p>
      </div>
      <CatalogueFilters values={filters} tags={page.tags} />
      {problems.length ? <p role="alert" className="mt-3 text-sm text-ember-700">Left out of the search — {problems.join("; ")}</p> : null}
      <p className="mt-4 text-sm text-iron-500" aria-live="polite">{page.total === 1 ? "1 programme" : `${page.total} programmes`}</p>
      {page.items.length === 0 ? (
        <div className="mt-3">
          <EmptyState title="Nothing matches" action={<Link href="/store" className="btn-quiet">Show every programme</Link>}>
            No programme on sale fits these filters. Try fewer filters or another word.
          </EmptyState>
        </div>
      ) : (
        <ul className="mt-3 grid gap-4 sm:grid-cols-2 lg:grid-cols-3" data-testid="catalogue">
          {page.items.map((item) => (
            <li key={item.id}>
              <ListingCard item={item} />
            </li>
          ))}
        </ul>
      )}
      {pages > 1 ? (
        <nav aria-label="Pages" className="mt-6 flex items-center justify-center gap-3 text-sm">
          {page.page > 1 ? <Link href={link(page.page - 1)} className="btn-quiet">Previous</Link> : null}
          <span className="text-iron-500">Page {page.page} of {pages}</span>
          {page.page < pages ? <Link href={link(page.page + 1)} className="btn-quiet">Next</Link> : null}
        </nav>
      ) : null}
    </>
  );
}
