"use client";
import { createColumnHelper, flexRender, getCoreRowModel, getFilteredRowModel, getSortedRowModel, type SortingState, useReactTable } from "@tanstack/react-table";
import Link from "next/link";
import { useMemo, useState } from "react";
import type { DashboardRow } from "@/db/dashboard";

const col = createColumnHelper<DashboardRow>();
const DATE = new Intl.DateTimeFormat("en-GB", { weekday: "short", day: "numeric", month: "short", timeZone: "UTC" });

const FLAG_TEXT = { missed: "missed sessions", "off-target": "sets off target", stalled: "stalled" } as const;
const FLAG_STYLE = {
  missed: "bg-ember-100 text-ember-700",
  "off-target": "bg-brass-100 text-iron-700",
  stalled: "bg-chalk-200 text-iron-600",
} as const;
type FlagFilter = "all" | "any" | keyof typeof FLAG_TEXT;

// On a phone the row keeps who, this week and what needs a look; the history columns wait for a wider screen.
// Flags may wrap onto a second line rather than push the row past a phone's edge.
type ColumnLook = { phoneHidden?: boolean; wraps?: boolean };
const PHONE_HIDDEN: ColumnLook = { phoneHidden: true };
const WRAPS: ColumnLook = { wraps: true };
const look = (meta: unknown) => (meta ?? {}) as ColumnLook;
const headClass = (meta: unknown) => (look(meta).phoneHidden ? "hidden sm:table-cell" : "");
const cellClass = (meta: unknown) => `${headClass(meta)} ${look(meta).wraps ? "min-w-[7rem]" : "whitespace-nowrap"}`;

function Ratio({ done, of, open = false }: { done: number; of: number; open?: boolean }) {
  if (of === 0) return <span className="text-iron-300">—</span>;
  const share = done / of;
  // The week under way is not behind yet: no warning colours until it is over.
  const tone = share >= 0.99 ? "bg-moss-500" : open ? "bg-iron-400" : share >= 0.5 ? "bg-brass-500" : "bg-ember";
  return (
    <span className="inline-flex items-center gap-2">
      <span className="font-mono font-semibold">
        {done}/{of}
      </span>
      <span className="hidden h-1.5 w-14 overflow-hidden rounded-full bg-chalk-200 sm:inline-block" aria-hidden="true">
        <span className={`block h-1.5 rounded-full ${tone}`} style={{ width: `${Math.min(1, share) * 100}%` }} />
      </span>
    </span>
  );
}

function flagTitle(r: DashboardRow, f: keyof typeof FLAG_TEXT): string {
  if (f === "missed") return `${r.missed} session${r.missed === 1 ? "" : "s"} in the past five weeks with nothing logged`;
  if (f === "off-target") return `${r.offTargetSets} sets in the last 14 days more than 20 % short of the planned reps`;
  return `No new best in three weeks: ${r.stalled.join(", ")}`;
}

/** The coach's roster: who trained, who missed, whose sets fell short, whose lifts stalled. Sortable, filterable. */
export function DashboardTable({ rows, weekOf }: { rows: DashboardRow[]; weekOf: string }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: "attention", desc: true }]);
  const [q, setQ] = useState("");
  const [flag, setFlag] = useState<FlagFilter>("all");

  const data = useMemo(
    () => rows.filter((r) => (flag === "all" ? true : flag === "any" ? r.flags.length > 0 || r.openProposals > 0 : r.flags.includes(flag))),
    [rows, flag],
  );

  const columns = useMemo(
    () => [
      col.accessor("name", {
        header: "Athlete",
        cell: (c) => (
          <Link href={`/coach/athletes/${c.row.original.id}/log`} className="font-semibold text-iron hover:text-ember-600" data-testid="dashboard-athlete">
            {c.getValue()}
          </Link>
        ),
      }),
      col.accessor((r) => (r.thisWeek.planned ? r.thisWeek.logged / r.thisWeek.planned : -1), {
        id: "thisWeek",
        header: "This week",
        cell: (c) => <Ratio done={c.row.original.thisWeek.logged} of={c.row.original.thisWeek.planned} open />,
      }),
      col.accessor((r) => (r.lastFourWeeks.planned ? r.lastFourWeeks.logged / r.lastFourWeeks.planned : -1), {
        id: "lastFourWeeks",
        header: "Last 4 weeks",
        meta: PHONE_HIDDEN,
        cell: (c) => <Ratio done={c.row.original.lastFourWeeks.logged} of={c.row.original.lastFourWeeks.planned} />,
      }),
      col.accessor((r) => r.lastSession ?? "", {
        id: "lastSession",
        header: "Last session",
        meta: PHONE_HIDDEN,
        cell: (c) => (c.row.original.lastSession ? <span data-testid="dashboard-last-session">{DATE.format(new Date(`${c.row.original.lastSession}T00:00:00Z`))}</span> : <span className="text-iron-300">never</span>),
      }),
      // Missed sessions weigh most: an athlete who stops training needs a call before a stalled lift does.
      col.accessor((r) => r.missed * 2 + (r.flags.includes("off-target") ? 3 : 0) + (r.flags.includes("stalled") ? 2 : 0) + (r.openProposals > 0 ? 1 : 0), {
        id: "attention",
        header: "Needs a look",
        meta: WRAPS,
        cell: (c) => {
          const r = c.row.original;
          if (r.flags.length === 0 && r.openProposals === 0) {
            // No sessions in the last four weeks or this one: "on track" would say more than is known.
            if (r.thisWeek.planned === 0 && r.lastFourWeeks.planned === 0) {
              return (
                <Link href={`/coach/athletes/${r.id}`} className="text-sm text-iron-500 underline decoration-iron-300 underline-offset-2 hover:text-ember-700" data-testid="dashboard-unplanned">
                  nothing planned
                </Link>
              );
            }
            return <span className="text-sm text-moss-700">on track</span>;
          }
          return (
            <span className="flex flex-wrap gap-1">
              {r.flags.map((f) => (
                <span key={f} title={flagTitle(r, f)} className={`rounded px-1.5 py-0.5 text-xs font-semibold ${FLAG_STYLE[f]}`} data-testid="dashboard-flag">
                  {f === "missed" ? `${r.missed} missed` : FLAG_TEXT[f]}
                </span>
              ))}
              {r.openProposals > 0 ? (
                <Link href={`/coach/athletes/${r.id}/log`} className="rounded bg-moss-100 px-1.5 py-0.5 text-xs font-semibold text-moss-700">
                  {r.openProposals} max to review
                </Link>
              ) : null}
            </span>
          );
        },
      }),
    ],
    [],
  );

  const table = useReactTable({
    data,
    columns,
    state: { sorting, globalFilter: q },
    onSortingChange: setSorting,
    onGlobalFilterChange: setQ,
    globalFilterFn: (row, _id, value: string) => row.original.name.toLowerCase().includes(value.trim().toLowerCase()) || row.original.email.toLowerCase().includes(value.trim().toLowerCase()),
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });

  const counts = { any: rows.filter((r) => r.flags.length > 0 || r.openProposals > 0).length, missed: rows.filter((r) => r.flags.includes("missed")).length, "off-target": rows.filter((r) => r.flags.includes("off-target")).length, stalled: rows.filter((r) => r.flags.includes("stalled")).length };
  const chip = (value: FlagFilter, label: string) => (
    <button type="button" aria-pressed={flag === value} onClick={() => setFlag(value)} className={`h-10 rounded-full px-3 text-sm font-semibold ${flag === value ? "bg-iron text-white" : "border border-iron-200 bg-white text-iron-600 hover:border-iron-300"}`}>
      {label}
    </button>
  );

  return (
    <div className="panel" data-testid="dashboard-table">
      <div className="flex flex-wrap items-center gap-2 border-b border-chalk-200 px-4 py-3">
        <label className="sr-only" htmlFor="roster-search">Find an athlete</label>
        <input id="roster-search" type="search" value={q} onChange={(e) => setQ(e.target.value)} placeholder="Find an athlete" className="field-input mt-0 h-10 max-w-xs py-1.5" />
        <div className="flex flex-wrap gap-1.5" role="group" aria-label="Show">
          {chip("all", `All ${rows.length}`)}
          {chip("any", `Needs a look ${counts.any}`)}
          {chip("missed", `Missed ${counts.missed}`)}
          {chip("off-target", `Off target ${counts["off-target"]}`)}
          {chip("stalled", `Stalled ${counts.stalled}`)}
        </div>
        <span className="ml-auto text-xs text-iron-400">week of {DATE.format(new Date(`${weekOf}T00:00:00Z`))}</span>
      </div>
      <div className="overflow-x-auto">
        <table className="w-full text-sm">
          <thead>
            {table.getHeaderGroups().map((g) => (
              <tr key={g.id} className="border-b border-chalk-200 text-left">
                {g.headers.map((h) => {
                  const dir = h.column.getIsSorted();
                  return (
                    <th key={h.id} className={`px-3 py-2 font-semibold whitespace-nowrap text-iron-600 sm:px-4 ${headClass(h.column.columnDef.meta)}`} aria-sort={dir === "asc" ? "ascending" : dir === "desc" ? "descending" : "none"}>
                      <button type="button" onClick={h.column.getToggleSortingHandler()} className="inline-flex items-center gap-1 hover:text-iron">
                        {flexRender(h.column.columnDef.header, h.getContext())}
                        <span className="text-iron-300">{dir === "asc" ? "▲" : dir === "desc" ? "▼" : "↕"}</span>
                      </button>
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((r) => (
              <tr key={r.id} className="border-b border-chalk-100 last:border-0 hover:bg-chalk-50" data-testid="dashboard-row">
                {r.getVisibleCells().map((c) => (
                  <td key={c.id} className={`px-3 py-3 sm:px-4 ${cellClass(c.column.columnDef.meta)}`}>
                    {flexRender(c.column.columnDef.cell, c.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        {table.getRowModel().rows.length === 0 ? <p className="px-4 py-8 text-center text-sm text-iron-400">No athlete matches.</p> : null}
      </div>
      <p className="border-t border-chalk-200 px-4 py-2 text-xs text-iron-400">
        Missed: a past session in the last five weeks with nothing logged. Off target: two or more sets in 14 days more than 20 % short of the planned reps. Stalled: no new estimated-1RM best in three weeks.
      </p>
    </div>
  );
}
