"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import type { CoachListing, ListingResponse } from "@/app/api/store/types";
import { api, ApiFailure, describeFailure } from "@/components/templates/api";
import { CURRENCIES, type Currency, formatMoney, parsePrice, toMajorText } from "@/lib/money";
import { LEVEL_LABEL } from "./format";

const schema = z
  .object({
    price: z.string().trim().min(1, "Give a price"),
    currency: z.enum(CURRENCIES),
    summary: z.string().max(2000, "Keep the public description to 2000 characters"),
    level: z.enum(["beginner", "intermediate", "advanced"]),
    versionNumber: z.string().regex(/^\d+$/, "Pick the version to sell"),
    onSale: z.boolean(),
  })
  .superRefine((v, ctx) => {
    const p = parsePrice(v.price, v.currency);
    if (!p.ok) ctx.addIssue({ code: "custom", path: ["price"], message: p.message });
  });
type Values = z.infer<typeof schema>;

const FIELD_OF: Record<string, keyof Values> = { priceMinor: "price", currency: "currency", summary: "summary", level: "level", versionNumber: "versionNumber", onSale: "onSale" };

const STATE_TEXT = { on_sale: "On sale in the store", withdrawn: "Not on sale", unlisted_by_admin: "Taken out of the store by an admin" } as const;

/**
 * Price, currency, public description, level and the version buyers get; the
 * price is typed in major units and sent as an integer of minor units.
 */
export function ListingEditor({ templateId, listing, versions }: { templateId: string; listing: CoachListing | null; versions: { number: number; note: string | null }[] }) {
  const router = useRouter();
  const [status, setStatus] = useState<{ ok: boolean; text: string } | null>(null);
  const currency = (listing?.currency ?? "eur") as Currency;
  const form = useForm<Values>({
    resolver: zodResolver(schema),
    defaultValues: {
      price: listing ? toMajorText(listing.priceMinor, currency) : "",
      currency,
      summary: listing?.summary ?? "",
      level: listing?.level ?? "intermediate",
      versionNumber: String(listing?.versionNumber ?? versions[0]?.number ?? ""),
      onSale: listing ? listing.state !== "withdrawn" : true,
    },
  });
  const { errors, isSubmitting } = form.formState;

  async function submit(v: Values) {
    setStatus(null);
    const price = parsePrice(v.price, v.currency);
    if (!price.ok) return;
    try {
      const { listing: saved } = await api<ListingResponse>(`/api/store/templates/${templateId}/listing`, {
        method: "PUT",
        json: { priceMinor: price.minor, currency: v.currency, summary: v.summary, level: v.level, versionNumber: Number(v.versionNumber), onSale: v.onSale },
      });
      setStatus({ ok: true, text: saved ? `Saved. ${STATE_TEXT[saved.state]} at ${formatMoney(saved.priceMinor, saved.currency)}.` : "Saved." });
      router.refresh();
    } catch (e) {
      if (e instanceof ApiFailure) for (const [field, message] of Object.entries(e.error.fields)) if (FIELD_OF[field]) form.setError(FIELD_OF[field], { message });
      setStatus({ ok: false, text: describeFailure(e) });
    }
  }

  return (
    <form onSubmit={form.handleSubmit(submit)} noValidate className="space-y-4" data-testid="listing-editor">
      {listing ? (
        <p className="flex flex-wrap items-center gap-2 text-sm">
          <span className={`rounded px-2 py-0.5 text-xs font-semibold ${listing.state === "on_sale" ? "bg-moss-100 text-moss-700" : listing.state === "unlisted_by_admin" ? "bg-ember-50 text-ember-700" : "bg-chalk-200 text-iron-600"}`}>{STATE_TEXT[listing.state]}</span>
          <Link href={`/store/${listing.slug}`} className="font-semibold text-ember-600 hover:underline">See the store page</Link>
        </p>
      ) : null}
      {listing?.state === "unlisted_by_admin" ? (
        <p role="note" className="rounded-md bg-ember-50 px-3 py-2 text-sm text-ember-700">
          An admin took this listing out of the store{listing.unlistedReason ? `: “${listing.unlistedReason}”` : "."} You can still change it; ask an admin to put it back.
        </p>
      ) : null}
      <div className="grid gap-3 sm:grid-cols-[1fr_8rem]">
        <div>
          <label htmlFor="l-price" className="field-label">Price</label>
          <input id="l-price" inputMode="decimal" placeholder="29.00" className="field-input" {...form.register("price")} aria-invalid={!!errors.price} aria-describedby={errors.price ? "l-price-error" : "l-price-hint"} />
          {errors.price ? <p id="l-price-error" className="field-error">{errors.price.message}</p> : <p id="l-price-hint" className="mt-1 text-xs text-iron-400">Between 1.00 and 1,000.00, as the buyer pays it.</p>}
        </div>
        <div>
          <label htmlFor="l-currency" className="field-label">Currency</label>
          <select id="l-currency" className="field-input" {...form.register("currency")}>
            {CURRENCIES.map((c) => <option key={c} value={c}>{c.toUpperCase()}</option>)}
          </select>
        </div>
      </div>
      <div>
        <label htmlFor="l-summary" className="field-label">Public description</label>
        <textarea id="l-summary" rows={5} className="field-input" placeholder="Who it is for, what a week looks like, what to expect." {...form.register("summary")} aria-invalid={!!errors.summary} />
        {errors.summary ? <p className="field-error">{errors.summary.message}</p> : null}
      </div>
      <div className="grid gap-3 sm:grid-cols-2">
        <div>
          <label htmlFor="l-level" className="field-label">Level</label>
          <select id="l-level" className="field-input" {...form.register("level")}>
            {Object.entries(LEVEL_LABEL).map(([v, label]) => <option key={v} value={v}>{label}</option>)}
          </select>
        </div>
        <div>
          <label htmlFor="l-version" className="field-label">Version buyers get</label>
          <select id="l-version" className="field-input" {...form.register("versionNumber")} aria-invalid={!!errors.versionNumber}>
            {versions.map((v) => <option key={v.number} value={v.number}>Version {v.number}{v.note ? ` — ${v.note}` : ""}</option>)}
          </select>
          {errors.versionNumber ? <p className="field-error">{errors.versionNumber.message}</p> : <p className="mt-1 text-xs text-iron-400">Saving a newer version later does not change what buyers get until you pick it here.</p>}
        </div>
      </div>
      <label className="flex items-center gap-2 text-sm font-medium text-iron-700">
        <input type="checkbox" {...form.register("onSale")} />
        Offer it in the store
      </label>
      <div className="flex flex-wrap items-center gap-3">
        <button type="submit" className="btn-primary" disabled={isSubmitting || versions.length === 0}>{isSubmitting ? "Saving…" : "Save listing"}</button>
        {status ? <span role="status" className={`text-sm ${status.ok ? "text-moss-700" : "text-ember-700"}`}>{status.text}</span> : null}
      </div>
    </form>
  );
}
