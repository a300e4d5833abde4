"use client";
import { flexRender, type Header } from "@tanstack/react-table";

/**
 * One column heading of a sortable table: a button that turns the sort, with
 * the direction shown and announced (`aria-sort`). A column that cannot sort
 * is a plain heading.
 */
export function SortableHead<T>({ header, sortable = header.column.getCanSort() }: { header: Header<T, unknown>; sortable?: boolean }) {
  const dir = header.column.getIsSorted();
  const label = flexRender(header.column.columnDef.header, header.getContext());
  return (
    <th scope="col" className="whitespace-nowrap px-4 py-2.5 font-semibold" aria-sort={dir ? (dir === "asc" ? "ascending" : "descending") : undefined}>
      {sortable ? (
        <button type="button" className="inline-flex items-center gap-1 uppercase hover:text-iron" onClick={header.column.getToggleSortingHandler()}>
          {label}
          <span aria-hidden="true" className={dir ? "text-ember" : "text-iron-200"}>{dir === "desc" ? "▼" : "▲"}</span>
        </button>
      ) : (
        label
      )}
    </th>
  );
}
