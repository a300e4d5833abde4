"use client";
import { useEffect, useState } from "react";

/** Previous / Page n of m / Next under a list; nothing when everything fits on one page. */
export function Pager({ page, pages, onPage }: { page: number; pages: number; onPage(page: number): void }) {
  if (pages <= 1) return null;
  return (
    <nav aria-label="Pages" className="flex items-center justify-end gap-2 border-t border-chalk-200 px-4 py-2 text-sm">
      <button type="button" className="btn-quiet px-3 py-1.5" disabled={page <= 1} onClick={() => onPage(page - 1)}>Previous</button>
      <span>Page {page} of {pages}</span>
      <button type="button" className="btn-quiet px-3 py-1.5" disabled={page >= pages} onClick={() => onPage(page + 1)}>Next</button>
    </nav>
  );
}

/** Pages needed for `total` rows at `pageSize` a page; at least one, so an empty list reads "Page 1 of 1". */
export function pageCount(data: { total: number; pageSize: number } | undefined): number {
  return data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;
}

/**
 * A search box over a paged list: the query settles 250 ms after the last
 * keystroke, and a new query goes back to the first page.
 */
export function usePagedSearch() {
  const [q, setQ] = useState("");
  const [debounced, setDebounced] = useState("");
  const [page, setPage] = useState(1);
  useEffect(() => {
    const t = setTimeout(() => {
      setDebounced(q.trim());
      setPage(1);
    }, 250);
    return () => clearTimeout(t);
  }, [q]);
  return { q, setQ, debounced, page, setPage };
}
