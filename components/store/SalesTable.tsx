"use client";
import { useQuery, useQueryClient } from "@tanstack/react-query";
import { createColumnHelper, flexRender, getCoreRowModel, getSortedRowModel, type SortingState, useReactTable } from "@tanstack/react-table";
import { useMemo, useState } from "react";
import type { RefundResponse, SaleRow, SalesResponse } from "@/app/api/store/types";
import { api, describeFailure } from "@/components/templates/api";
import { dayText, formatMoney, monthText } from "./format";
import { SortableHead } from "../SortableHead";

const col = createColumnHelper<SaleRow>();

function Status({ row }: { row: SaleRow }) {
  return row.status === "refunded" ? (
    <span className="rounded bg-chalk-200 px-1.5 py-0.5 text-xs font-semibold text-iron-600" title={`Refunded ${dayText(row.refundedAt)}`}>refunded</span>
  ) : (
    <span className="rounded bg-moss-100 px-1.5 py-0.5 text-xs font-semibold text-moss-700">paid</span>
  );
}

/**
 * Every sale with date, programme, buyer, amount and status, sortable; totals
 * per month and currency; a full refund per paid row (the buyer loses the copy).
 */
export function SalesTable({ initial, showSeller = false }: { initial: SalesResponse; showSeller?: boolean }) {
  const client = useQueryClient();
  const query = useQuery({ queryKey: ["sales"], queryFn: () => api<SalesResponse>("/api/store/sales"), initialData: initial });
  const [sorting, setSorting] = useState<SortingState>([{ id: "date", desc: true }]);
  const [confirming, setConfirming] = useState<string | null>(null);
  const [busy, setBusy] = useState<string | null>(null);
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);

  async function refund(row: SaleRow) {
    setBusy(row.id);
    setNotice(null);
    try {
      await api<RefundResponse>(`/api/store/sales/${row.id}/refund`, { method: "POST" });
      setNotice({ ok: true, text: `Refunded ${formatMoney(row.amountMinor, row.currency)} to ${row.buyerName}; their copy is withdrawn.` });
      await client.invalidateQueries({ queryKey: ["sales"] });
    } catch (e) {
      setNotice({ ok: false, text: describeFailure(e) });
    } finally {
      setBusy(null);
      setConfirming(null);
    }
  }

  const columns = useMemo(
    () => [
      col.accessor("date", { id: "date", header: "Date", cell: (c) => <span className="whitespace-nowrap">{dayText(c.getValue())}</span> }),
      col.accessor("title", { id: "title", header: "Template", cell: (c) => <span className="font-semibold text-iron">{c.getValue()}</span> }),
      col.accessor("buyerName", {
        id: "buyer",
        header: "Buyer",
        cell: (c) => (
          <span>
            {c.getValue()}
            <span className="block text-xs text-iron-400">{c.row.original.buyerEmail}</span>
          </span>
        ),
      }),
      ...(showSeller ? [col.accessor("sellerName", { id: "seller", header: "Coach" })] : []),
      col.accessor("amountMinor", {
        id: "amount",
        header: "Amount",
        // Sorting by the integer alone would mix currencies; sort by currency, then amount.
        sortingFn: (a, b) => a.original.currency.localeCompare(b.original.currency) || a.original.amountMinor - b.original.amountMinor,
        cell: (c) => <span className="font-mono">{formatMoney(c.getValue(), c.row.original.currency)}</span>,
      }),
      col.accessor("status", { id: "status", header: "Status", cell: (c) => <Status row={c.row.original} /> }),
      col.display({
        id: "actions",
        header: () => <span className="sr-only">Actions</span>,
        cell: (c) => {
          const row = c.row.original;
          if (row.status !== "paid") return null;
          if (confirming === row.id) {
            return (
              <span className="flex flex-wrap items-center gap-1">
                <button type="button" className="btn-primary px-3 py-1.5" disabled={busy === row.id} onClick={() => refund(row)}>{busy === row.id ? "Refunding…" : "Confirm refund"}</button>
                <button type="button" className="btn-quiet px-3 py-1.5" onClick={() => setConfirming(null)}>Keep</button>
              </span>
            );
          }
          return <button type="button" className="btn-quiet px-3 py-1.5" onClick={() => setConfirming(row.id)} aria-label={`Refund ${row.buyerName}'s purchase of ${row.title}`}>Refund</button>;
        },
      }),
    ],
    [confirming, busy, showSeller],
  );

  const table = useReactTable({
    data: query.data.rows,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId: (r) => r.id,
  });

  return (
    <div className="space-y-6">
      <section aria-labelledby="totals-h" className="panel">
        <h2 id="totals-h" className="border-b border-chalk-200 px-4 py-3 text-sm font-semibold uppercase tracking-wider text-iron-400">Totals per month</h2>
        {query.data.months.length === 0 ? (
          <p className="px-4 py-6 text-sm text-iron-400">No sales yet. When someone buys one of your listed templates, the month&apos;s takings show here.</p>
        ) : (
          <div className="overflow-x-auto">
            <table className="w-full min-w-[34rem] text-left text-sm" data-testid="sales-totals">
              <thead className="bg-chalk-50 text-xs uppercase tracking-wider text-iron-400">
                <tr>
                  <th scope="col" className="px-4 py-2 font-semibold">Month</th>
                  <th scope="col" className="px-4 py-2 text-right font-semibold">Sales</th>
                  <th scope="col" className="px-4 py-2 text-right font-semibold">Takings</th>
                  <th scope="col" className="px-4 py-2 text-right font-semibold">Refunded</th>
                  <th scope="col" className="px-4 py-2 text-right font-semibold">Net</th>
                </tr>
              </thead>
              <tbody className="divide-y divide-chalk-200 font-mono">
                {query.data.months.map((m) => (
                  <tr key={`${m.month}-${m.currency}`}>
                    <td className="px-4 py-2 font-sans">{monthText(m.month)} <span className="text-xs text-iron-400">{m.currency.toUpperCase()}</span></td>
                    <td className="px-4 py-2 text-right">{m.sold}</td>
                    <td className="px-4 py-2 text-right">{formatMoney(m.grossMinor, m.currency)}</td>
                    <td className="px-4 py-2 text-right">{m.refundedMinor ? `−${formatMoney(m.refundedMinor, m.currency)}` : "—"}</td>
                    <td className="px-4 py-2 text-right font-bold">{formatMoney(m.netMinor, m.currency)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>

      <section aria-labelledby="sales-h" className="panel">
        <h2 id="sales-h" className="border-b border-chalk-200 px-4 py-3 text-sm font-semibold uppercase tracking-wider text-iron-400">Sales</h2>
        {notice ? <p role="status" className={`border-b border-chalk-200 px-4 py-2 text-sm ${notice.ok ? "bg-moss-100 text-moss-700" : "bg-ember-50 text-ember-700"}`}>{notice.text}</p> : null}
        {query.data.rows.length === 0 ? (
          <p className="px-4 py-6 text-sm text-iron-400">Nothing sold yet.</p>
        ) : (
          <div className="overflow-x-auto">
            <table className="w-full min-w-[46rem] text-left text-sm" data-testid="sales-table">
              <thead className="border-b border-chalk-200 bg-chalk-50 text-xs uppercase tracking-wider text-iron-400">
                {table.getHeaderGroups().map((hg) => (
                  <tr key={hg.id}>
                    {hg.headers.map((header) => (
                      <SortableHead key={header.id} header={header} />
                    ))}
                  </tr>
                ))}
              </thead>
              <tbody className="divide-y divide-chalk-200">
                {table.getRowModel().rows.map((row) => (
                  <tr key={row.id}>
                    {row.getVisibleCells().map((cell) => (
                      <td key={cell.id} className="px-4 py-2.5 align-middle">{flexRender(cell.column.columnDef.cell, cell.getContext())}</td>
                    ))}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>
    </div>
  );
}
