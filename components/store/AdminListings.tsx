"use client";
import Link from "next/link";
import { useState } from "react";
import type { AdminListing } from "@/app/api/store/types";
import { api, describeFailure } from "@/components/templates/api";
import { dayText, formatMoney } from "./format";

const STATE_TEXT = { on_sale: "on sale", withdrawn: "withdrawn by coach", unlisted_by_admin: "unlisted by admin" } as const;

/** Every listing, with a way to take one out of the store (with a reason the coach sees) or put it back. */
export function AdminListings({ initial }: { initial: AdminListing[] }) {
  const [rows, setRows] = useState(initial);
  const [open, setOpen] = useState<string | null>(null);
  const [reason, setReason] = useState("");
  const [busy, setBusy] = useState(false);
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);

  async function change(row: AdminListing, unlisted: boolean) {
    setBusy(true);
    setNotice(null);
    try {
      const { listing } = await api<{ listing: AdminListing }>(`/api/store/admin/listings/${row.id}`, { method: "PATCH", json: { unlisted, reason: unlisted ? reason : null } });
      setRows((all) => all.map((r) => (r.id === row.id ? listing : r)));
      setNotice({ ok: true, text: unlisted ? `“${row.title}” is out of the store.` : `“${row.title}” may be sold again.` });
      setOpen(null);
      setReason("");
    } catch (e) {
      setNotice({ ok: false, text: describeFailure(e) });
    } finally {
      setBusy(false);
    }
  }

  if (rows.length === 0) return <p className="panel px-4 py-8 text-center text-sm text-iron-400">No coach has listed a template yet.</p>;
  return (
    <div className="panel">
      {notice ? <p role="status" className={`border-b border-chalk-200 px-4 py-2 text-sm ${notice.ok ? "bg-moss-100 text-moss-700" : "bg-ember-50 text-ember-700"}`}>{notice.text}</p> : null}
      <ul className="divide-y divide-chalk-200" data-testid="admin-listings">
        {rows.map((row) => (
          <li key={row.id} className="flex flex-wrap items-start gap-3 px-4 py-3">
            <div className="min-w-0 flex-1">
              <Link href={`/store/${row.slug}`} className="font-semibold text-iron hover:text-ember-600">{row.title}</Link>
              <p className="text-xs text-iron-400">
                {row.sellerName} · {row.sellerEmail} · {formatMoney(row.priceMinor, row.currency)} · {row.sales} sold · changed {dayText(row.updatedAt)}
              </p>
              <p className="mt-1 text-xs">
                <span className={`rounded px-1.5 py-0.5 font-semibold ${row.state === "on_sale" ? "bg-moss-100 text-moss-700" : row.state === "unlisted_by_admin" ? "bg-ember-50 text-ember-700" : "bg-chalk-200 text-iron-600"}`}>{STATE_TEXT[row.state]}</span>
                {row.unlistedReason ? <span className="ml-2 text-iron-500">“{row.unlistedReason}”</span> : null}
              </p>
              {open === row.id ? (
                <div className="mt-2 flex flex-wrap items-end gap-2">
                  <div className="min-w-[16rem] flex-1">
                    <label htmlFor={`reason-${row.id}`} className="field-label">Reason the coach will see</label>
                    <input id={`reason-${row.id}`} className="field-input" maxLength={500} value={reason} onChange={(e) => setReason(e.target.value)} />
                  </div>
                  <button type="button" className="btn-primary" disabled={busy} onClick={() => change(row, true)}>{busy ? "Unlisting…" : "Unlist"}</button>
                  <button type="button" className="btn-quiet" onClick={() => setOpen(null)}>Cancel</button>
                </div>
              ) : null}
            </div>
            {open !== row.id ? (
              row.state === "unlisted_by_admin" ? (
                <button type="button" className="btn-quiet px-3 py-1.5" disabled={busy} onClick={() => change(row, false)}>Allow again</button>
              ) : (
                <button type="button" className="btn-quiet px-3 py-1.5" onClick={() => setOpen(row.id)} aria-label={`Unlist ${row.title}`}>Unlist</button>
              )
            ) : null}
          </li>
        ))}
      </ul>
    </div>
  );
}
