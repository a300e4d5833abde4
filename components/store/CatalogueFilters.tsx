import Link from "next/link";
import { LEVEL_LABEL, WEEKS_LABEL } from "./format";

export type FilterValues = { q?: string; tag?: string; weeks?: string; days?: number; level?: string };

/**
 * Search and filters as a plain GET form: works before any script loads,
 * and every filtered view has its own address to share.
 */
export function CatalogueFilters({ values, tags }: { values: FilterValues; tags: string[] }) {
  const active = Object.values(values).some((v) => v !== undefined && v !== "");
  return (
    <form method="get" action="/store" className="panel grid gap-3 p-4 sm:grid-cols-2 lg:grid-cols-[2fr_1fr_1fr_1fr_1fr_auto] lg:items-end" role="search" aria-label="Find a programme">
      <div>
        <label htmlFor="f-q" className="field-label">Search</label>
        <input id="f-q" name="q" type="search" defaultValue={values.q ?? ""} placeholder="Title, description or tag" className="field-input" maxLength={100} />
      </div>
      <div>
        <label htmlFor="f-tag" className="field-label">Tag</label>
        <select id="f-tag" name="tag" defaultValue={values.tag ?? ""} className="field-input">
          <option value="">Any tag</option>
          {tags.map((t) => <option key={t} value={t}>{t}</option>)}
        </select>
      </div>
      <div>
        <label htmlFor="f-weeks" className="field-label">Length</label>
        <select id="f-weeks" name="weeks" defaultValue={values.weeks ?? ""} className="field-input">
          <option value="">Any length</option>
          {Object.entries(WEEKS_LABEL).map(([v, label]) => <option key={v} value={v}>{label}</option>)}
        </select>
      </div>
      <div>
        <label htmlFor="f-days" className="field-label">Days a week</label>
        <select id="f-days" name="days" defaultValue={values.days ? String(values.days) : ""} className="field-input">
          <option value="">Any</option>
          {[1, 2, 3, 4, 5, 6, 7].map((d) => <option key={d} value={d}>{d}</option>)}
        </select>
      </div>
      <div>
        <label htmlFor="f-level" className="field-label">Level</label>
        <select id="f-level" name="level" defaultValue={values.level ?? ""} className="field-input">
          <option value="">Any level</option>
          {Object.entries(LEVEL_LABEL).map(([v, label]) => <option key={v} value={v}>{label}</option>)}
        </select>
      </div>
      <div className="flex gap-2">
        <button type="submit" className="btn-primary">Show</button>
        {active ? <Link href="/store" className="btn-quiet">Clear</Link> : null}
      </div>
    </form>
  );
}
