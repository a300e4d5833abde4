"use client";
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import Link from "next/link";
import type { TemplateListResponse } from "@/app/api/templates/types";
import { Pager, pageCount, usePagedSearch } from "../Pager";
import { api } from "./api";

const PAGE_SIZE = 20;
const WHEN = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric" });

/** The coach's templates: search by title or tag, page through, open one. */
export function TemplateList({ initial }: { initial: TemplateListResponse }) {
  const { q, setQ, debounced, page, setPage } = usePagedSearch();

  const query = useQuery({
    queryKey: ["templates", debounced, page],
    queryFn: () => api<TemplateListResponse>(`/api/templates?${new URLSearchParams({ q: debounced, page: String(page), pageSize: String(PAGE_SIZE) })}`),
    initialData: debounced === "" && page === 1 ? initial : undefined,
    placeholderData: keepPreviousData,
  });
  const data = query.data;
  const pages = pageCount(data);

  return (
    <div className="panel">
      <div className="flex flex-wrap items-center gap-3 border-b border-chalk-200 px-4 py-3">
        <label className="sr-only" htmlFor="tpl-search">Search templates</label>
        <input id="tpl-search" type="search" value={q} onChange={(e) => setQ(e.target.value)} placeholder="Search by title or tag" className="field-input mt-0 max-w-xs" />
        <span className="text-sm text-iron-400">{data ? `${data.total} template${data.total === 1 ? "" : "s"}` : ""}</span>
      </div>
      {query.isError ? (
        <p className="px-4 py-6 text-sm text-ember-700">The list could not be loaded. {(query.error as Error).message}</p>
      ) : data && data.items.length === 0 ? (
        <p className="px-4 py-8 text-center text-sm text-iron-400">{debounced ? `Nothing matches “${debounced}”.` : "No templates yet — start from a sample below or write one."}</p>
      ) : (
        <ul className="divide-y divide-chalk-200" data-testid="template-list">
          {data?.items.map((t) => (
            <li key={t.id}>
              <Link href={`/coach/templates/${t.id}`} className="flex flex-wrap items-center gap-x-4 gap-y-1 px-4 py-3 hover:bg-chalk-50">
                <span className="min-w-0 flex-1">
                  <span className="block truncate font-semibold text-iron">{t.title}</span>
                  {t.description ? <span className="block truncate text-sm text-iron-500">{t.description}</span> : null}
                </span>
                <span className="flex flex-wrap gap-1">
                  {t.tags.map((tag) => (
                    <span key={tag} className="rounded bg-chalk-200 px-1.5 py-0.5 text-xs text-iron-600">{tag}</span>
                  ))}
                </span>
                <span className="w-40 text-right text-xs text-iron-400">
                  {t.latestVersion ? `v${t.latestVersion.number} · ${WHEN.format(new Date(t.updatedAt))}` : "not saved"}
                  {t.hasDraft ? <span className="ml-1 text-brass-500">· draft</span> : null}
                  {t.archived ? <span className="ml-1">· archived</span> : null}
                </span>
              </Link>
            </li>
          ))}
        </ul>
      )}
      <Pager page={page} pages={pages} onPage={setPage} />
    </div>
  );
}
