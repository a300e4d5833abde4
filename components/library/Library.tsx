"use client";
import { keepPreviousData, useQuery, useQueryClient } from "@tanstack/react-query";
import { createColumnHelper, flexRender, getCoreRowModel, type SortingState, useReactTable } from "@tanstack/react-table";
import { usePathname, useRouter } from "next/navigation";
import { useCallback, useMemo, useState } from "react";
import type { ExerciseResponse, LibraryEntry, LibraryResponse } from "@/app/api/exercises/types";
import { Pager, pageCount, usePagedSearch } from "../Pager";
import { api } from "@/components/templates/api";
import { ExerciseEditor } from "./ExerciseEditor";
import { ExerciseForm } from "./ExerciseForm";
import { SidePanel } from "./SidePanel";
import { SortableHead } from "../SortableHead";

const PAGE_SIZE = 25;
const SORTABLE = new Set(["name", "equipment", "pattern"]);
const col = createColumnHelper<LibraryEntry>();

function MediaCell({ entry }: { entry: LibraryEntry }) {
  if (!entry.media) return <span className="text-iron-300">—</span>;
  if (entry.media.type.startsWith("video/")) return <span className="rounded bg-iron px-1.5 py-0.5 text-xs font-semibold text-chalk">video</span>;
  // eslint-disable-next-line @next/next/no-img-element -- served from our own authenticated route
  return <img src={entry.media.url} alt="" className="h-10 w-10 rounded border border-chalk-200 object-cover" loading="lazy" />;
}

function Source({ builtIn }: { builtIn: boolean }) {
  return builtIn ? (
    <span className="rounded bg-chalk-200 px-1.5 py-0.5 text-xs text-iron-500">built-in</span>
  ) : (
    <span className="rounded bg-moss-100 px-1.5 py-0.5 text-xs font-semibold text-moss-700">yours</span>
  );
}

function Muscles({ list }: { list: string[] }) {
  return list.length ? <span className="text-iron-600">{list.join(", ")}</span> : <span className="text-iron-300">—</span>;
}

/** The exercise library: the built-in catalogue and the coach's own, searchable and sortable; own rows open for editing. */
export function Library({ initial, addName }: { initial: LibraryResponse; addName: string | null }) {
  const router = useRouter();
  const pathname = usePathname();
  const client = useQueryClient();
  const { q, setQ, debounced, page, setPage } = usePagedSearch();
  const [sorting, setSorting] = useState<SortingState>([{ id: "name", desc: false }]);
  const [adding, setAdding] = useState<string | null>(addName);
  const [editing, setEditing] = useState<LibraryEntry | null>(null);
  const [notice, setNotice] = useState<string | null>(null);


  const sort = sorting[0] ?? { id: "name", desc: false };
  const isFirst = debounced === "" && page === 1 && sort.id === "name" && !sort.desc;
  const query = useQuery({
    queryKey: ["library", debounced, page, sort.id, sort.desc],
    queryFn: () =>
      api<LibraryResponse>(`/api/exercises?${new URLSearchParams({ q: debounced, page: String(page), pageSize: String(PAGE_SIZE), sort: sort.id, dir: sort.desc ? "desc" : "asc" })}`),
    initialData: isFirst ? initial : undefined,
    placeholderData: keepPreviousData,
  });
  const data = query.data;
  const pages = pageCount(data);
  const groups = useMemo(() => [...new Set((data?.items ?? []).map((e) => e.substitutionGroup).filter((g): g is string => !!g))].sort(), [data]);

  const refresh = useCallback(() => client.invalidateQueries({ queryKey: ["library"] }), [client]);
  const closeAdd = useCallback(() => {
    setAdding(null);
    // Drop ?add= so a reload does not open the form again.
    if (addName !== null) router.replace(pathname, { scroll: false });
  }, [addName, pathname, router]);
  const closeEdit = useCallback(() => setEditing(null), []);

  const columns = useMemo(
    () => [
      col.accessor("name", {
        id: "name",
        header: "Name",
        cell: (c) => (
          <div className="min-w-[11rem]">
            <span className="font-semibold text-iron">{c.row.original.name}</span>
            {c.row.original.aliases.length ? <span className="block text-xs text-iron-400">also: {c.row.original.aliases.join(", ")}</span> : null}
          </div>
        ),
      }),
      col.accessor("equipment", { id: "equipment", header: "Equipment", cell: (c) => <span className="capitalize">{c.getValue()}</span> }),
      col.accessor("primaryMuscles", { id: "muscles", header: "Muscles", enableSorting: false, cell: (c) => <Muscles list={c.getValue()} /> }),
      col.accessor("movementPattern", { id: "pattern", header: "Pattern", cell: (c) => c.getValue() ?? <span className="text-iron-300">—</span> }),
      col.accessor("substitutionGroup", { id: "group", header: "Swap group", enableSorting: false, cell: (c) => c.getValue() ?? <span className="text-iron-300">—</span> }),
      col.display({ id: "media", header: "Media", cell: (c) => <MediaCell entry={c.row.original} /> }),
      col.accessor("builtIn", { id: "source", header: "Source", enableSorting: false, cell: (c) => <Source builtIn={c.getValue()} /> }),
      col.display({
        id: "actions",
        header: () => <span className="sr-only">Actions</span>,
        cell: (c) =>
          c.row.original.builtIn ? (
            <span className="whitespace-nowrap text-xs text-iron-300" title="Built-in exercises cannot be changed">read-only</span>
          ) : (
            <button type="button" className="btn-quiet px-3 py-1.5" onClick={() => setEditing(c.row.original)} aria-label={`Edit ${c.row.original.name}`}>Edit</button>
          ),
      }),
    ],
    [],
  );

  const table = useReactTable({
    data: data?.items ?? [],
    columns,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualPagination: true,
    enableSortingRemoval: false,
    state: { sorting },
    onSortingChange: (next) => {
      setSorting(next);
      setPage(1);
    },
    getRowId: (row) => row.id,
  });

  return (
    <>
      <div className="panel">
        <div className="flex flex-wrap items-center gap-3 border-b border-chalk-200 px-4 py-3">
          <label className="sr-only" htmlFor="lib-search">Search exercises</label>
          <input id="lib-search" type="search" value={q} onChange={(e) => setQ(e.target.value)} placeholder="Search name, other name or muscle" className="field-input mt-0 w-full sm:w-72" />
          <label className="flex items-center gap-2 text-sm text-iron-500 sm:hidden">
            <span>Sort</span>
            <select
              className="field-input mt-0 w-auto py-2"
              value={`${sort.id}:${sort.desc ? "desc" : "asc"}`}
              onChange={(e) => {
                const [id, dir] = e.target.value.split(":");
                setSorting([{ id, desc: dir === "desc" }]);
                setPage(1);
              }}
            >
              <option value="name:asc">Name A–Z</option>
              <option value="name:desc">Name Z–A</option>
              <option value="equipment:asc">Equipment</option>
              <option value="pattern:asc">Pattern</option>
            </select>
          </label>
          <span className="text-sm text-iron-400" aria-live="polite">{data ? `${data.total} exercise${data.total === 1 ? "" : "s"}` : ""}</span>
          <button type="button" className="btn-primary ml-auto" onClick={() => setAdding("")}>Add exercise</button>
        </div>
        {notice ? <p role="status" className="border-b border-chalk-200 bg-moss-100 px-4 py-2 text-sm text-moss-700">{notice}</p> : null}
        {query.isError ? (
          <p className="px-4 py-6 text-sm text-ember-700">The library could not be loaded. {(query.error as Error).message}</p>
        ) : data && data.items.length === 0 ? (
          <div className="px-4 py-8 text-center text-sm text-iron-400">
            <p>Nothing matches “{debounced}”.</p>
            <button type="button" className="btn-quiet mt-3" onClick={() => setAdding(debounced)}>Add “{debounced}” to your library</button>
          </div>
        ) : (
          <>
            <div className="hidden overflow-x-auto sm:block">
              <table className="w-full min-w-[56rem] text-left text-sm" data-testid="library-table">
                <thead className="border-b border-chalk-200 bg-chalk-50 text-xs uppercase tracking-wider text-iron-400">
                  {table.getHeaderGroups().map((hg) => (
                    <tr key={hg.id}>
                      {hg.headers.map((header) => (
                        <SortableHead key={header.id} header={header} sortable={SORTABLE.has(header.column.id)} />
                      ))}
                    </tr>
                  ))}
                </thead>
                <tbody className="divide-y divide-chalk-200">
                  {table.getRowModel().rows.map((row) => (
                    <tr key={row.id} className={row.original.builtIn ? "" : "bg-moss-100/20"}>
                      {row.getVisibleCells().map((cell) => (
                        <td key={cell.id} className="px-4 py-2.5 align-middle">{flexRender(cell.column.columnDef.cell, cell.getContext())}</td>
                      ))}
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
            <ul className="divide-y divide-chalk-200 sm:hidden" data-testid="library-cards">
              {table.getRowModel().rows.map(({ original: e }) => (
                <li key={e.id} className="flex gap-3 px-4 py-3">
                  <div className="min-w-0 flex-1">
                    <div className="flex flex-wrap items-center gap-2">
                      <span className="font-semibold text-iron">{e.name}</span>
                      <Source builtIn={e.builtIn} />
                    </div>
                    {e.aliases.length ? <p className="truncate text-xs text-iron-400">also: {e.aliases.join(", ")}</p> : null}
                    <p className="mt-1 text-sm text-iron-500">
                      <span className="capitalize">{e.equipment}</span>
                      {e.movementPattern ? ` · ${e.movementPattern}` : ""}
                      {e.primaryMuscles.length ? ` · ${e.primaryMuscles.join(", ")}` : ""}
                    </p>
                    {e.substitutionGroup ? <p className="text-xs text-iron-400">swap group: {e.substitutionGroup}</p> : null}
                  </div>
                  <div className="flex shrink-0 flex-col items-end gap-2">
                    {e.media ? <MediaCell entry={e} /> : null}
                    {e.builtIn ? null : (
                      <button type="button" className="btn-quiet px-3 py-1.5" onClick={() => setEditing(e)} aria-label={`Edit ${e.name}`}>Edit</button>
                    )}
                  </div>
                </li>
              ))}
            </ul>
          </>
        )}
        <Pager page={page} pages={pages} onPage={setPage} />
      </div>

      {adding !== null ? (
        <SidePanel title="Add exercise" onClose={closeAdd}>
          <ExerciseForm
            initial={{ name: adding }}
            groups={groups}
            submitLabel="Add to library"
            onCancel={closeAdd}
            onSubmit={async (payload) => {
              const { exercise } = await api<ExerciseResponse>("/api/exercises", { method: "POST", json: payload });
              closeAdd();
              setNotice(`Added “${exercise.name}”. Add a picture or clip from its Edit panel.`);
              await refresh();
            }}
          />
        </SidePanel>
      ) : null}
      {editing ? (
        <SidePanel title={`Edit ${editing.name}`} onClose={closeEdit}>
          <ExerciseEditor
            entry={editing}
            groups={groups}
            onClose={closeEdit}
            onSaved={(e) => {
              setEditing((cur) => (cur && cur.id === e.id ? e : cur));
              void refresh();
            }}
            onDeleted={() => {
              setNotice(`Deleted “${editing.name}”.`);
              setEditing(null);
              void refresh();
            }}
          />
        </SidePanel>
      ) : null}
    </>
  );
}
