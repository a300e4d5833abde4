import Link from "next/link";
import type { CatalogueResponse } from "@/app/api/store/types";
import { daysText, formatMoney, LEVEL_LABEL, weeksText } from "./format";

/** One programme in the catalogue: what it is, for whom, how long, and the price. */
export function ListingCard({ item }: { item: CatalogueResponse["items"][number] }) {
  return (
    <article className="panel flex h-full flex-col p-4" data-testid="listing-card">
      <div className="flex items-start justify-between gap-3">
        <h2 className="text-base font-semibold leading-snug text-iron">
          <Link href={`/store/${item.slug}`} className="hover:text-ember-600">{item.title}</Link>
        </h2>
        <span className="shrink-0 rounded-md bg-iron px-2 py-1 font-mono text-sm font-semibold text-chalk">{formatMoney(item.priceMinor, item.currency)}</span>
      </div>
      <p className="mt-0.5 text-xs text-iron-400">by {item.coachName}</p>
      <p className="mt-2 line-clamp-3 text-sm leading-relaxed text-iron-600">{item.summary || "No description yet."}</p>
      <dl className="mt-3 flex flex-wrap gap-x-3 gap-y-1 text-xs text-iron-500">
        <div><dt className="sr-only">Level</dt><dd className="font-semibold text-moss-700">{LEVEL_LABEL[item.level]}</dd></div>
        <div><dt className="sr-only">Length</dt><dd>{weeksText(item.weeks)}</dd></div>
        <div><dt className="sr-only">Days</dt><dd>{daysText(item.daysPerWeek)}</dd></div>
      </dl>
      {item.tags.length ? (
        <ul className="mt-3 flex flex-wrap gap-1" aria-label="Tags">
          {item.tags.map((t) => <li key={t} className="rounded bg-chalk-200 px-1.5 py-0.5 text-[11px] text-iron-600">{t}</li>)}
        </ul>
      ) : null}
      <div className="mt-auto pt-4">
        <Link href={`/store/${item.slug}`} className="btn-quiet" aria-label={`See ${item.title}`}>See the programme</Link>
      </div>
    </article>
  );
}
