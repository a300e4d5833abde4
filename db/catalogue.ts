import "server-only";
import { sql } from "kysely";
import type { Programme } from "../lib/notation/model";
import type { ListingLevel, Role } from "./database";
import type { Db } from "./templateAccess";
import { readModel } from "./templateVersions";

/**
 * What anyone may read of the store, signed in or not: listings on sale
 * (coach offers it, no admin unlisting, template neither archived nor taken
 * off "listed"), searchable and filtered by tag, length, days and level.
 *
 * @example
 * const page = await listCatalogue(db, { q: "squat", level: "beginner", days: 3 });
 * page.items[0].slug; // "full-body-basics"
 */

export type WeeksBucket = "1-4" | "5-8" | "9-12" | "13+";
export const WEEKS_BUCKETS: readonly WeeksBucket[] = ["1-4", "5-8", "9-12", "13+"];

export type CatalogueFilters = { q?: string; tag?: string; weeks?: WeeksBucket; days?: number; level?: ListingLevel; page?: number; pageSize?: number };

export type CatalogueItem = {
  id: string;
  slug: string;
  title: string;
  summary: string;
  tags: string[];
  coachName: string;
  priceMinor: number;
  currency: string;
  level: ListingLevel;
  weeks: number;
  daysPerWeek: number;
};

export type CataloguePage = { items: CatalogueItem[]; total: number; page: number; pageSize: number; tags: string[] };

type CardRow = {
  id: string;
  slug: string;
  title: string;
  summary: string;
  tags: string[];
  coach_name: string;
  price_minor: number;
  currency: CatalogueItem["currency"];
  level: CatalogueItem["level"];
  weeks: number;
  days_per_week: number;
};

/** The card fields shared by the catalogue list and a listing page. */
function toCatalogueItem(r: CardRow): CatalogueItem {
  return {
    id: r.id,
    slug: r.slug,
    title: r.title,
    summary: r.summary,
    tags: r.tags,
    coachName: r.coach_name,
    priceMinor: r.price_minor,
    currency: r.currency,
    level: r.level,
    weeks: r.weeks,
    daysPerWeek: r.days_per_week,
  };
}

function likePattern(text: string): string {
  return `%${text.toLowerCase().replace(/[\\%_]/g, "\\$&")}%`;
}

function base(db: Db) {
  return db
    .selectFrom("listings as l")
    .innerJoin("templates as t", "t.id", "l.template_id")
    .innerJoin("users as u", "u.id", "l.seller_id")
    .where("l.listed_at", "is not", null)
    .where("l.unlisted_at", "is", null)
    .where("t.archived_at", "is", null)
    .where("t.visibility", "=", "listed")
    .where("u.disabled_at", "is", null);
}

/** Listings on sale, newest first, with the tags in use across the whole store for the filter. */
export async function listCatalogue(db: Db, filters: CatalogueFilters = {}): Promise<CataloguePage> {
  const page = Math.max(1, Math.floor(filters.page ?? 1));
  const pageSize = Math.min(60, Math.max(1, Math.floor(filters.pageSize ?? 24)));
  let query = base(db);
  const q = filters.q?.trim();
  if (q) {
    const pattern = likePattern(q);
    query = query.where((eb) =>
      eb.or([eb("t.title", "ilike", pattern), eb("l.summary", "ilike", pattern), sql<boolean>`exists (select 1 from unnest(t.tags) as tag where tag like ${pattern})`]),
    );
  }
  const tag = filters.tag?.trim().toLowerCase();
  if (tag) query = query.where(sql<boolean>`t.tags @> array[${tag}]::text[]`);
  if (filters.level) query = query.where("l.level", "=", filters.level);
  if (filters.days) query = query.where("l.days_per_week", "=", filters.days);
  if (filters.weeks) {
    const [lo, hi] = filters.weeks === "13+" ? [13, 520] : filters.weeks.split("-").map(Number);
    query = query.where("l.weeks", ">=", lo).where("l.weeks", "<=", hi);
  }
  const [rows, count, tags] = await Promise.all([
    query
      .select(["l.id", "l.slug", "t.title", "l.summary", "t.tags", "u.name as coach_name", "l.price_minor", "l.currency", "l.level", "l.weeks", "l.days_per_week"])
      .orderBy("l.listed_at", "desc")
      .orderBy("l.id")
      .limit(pageSize)
      .offset((page - 1) * pageSize)
      .execute(),
    query.select((eb) => eb.fn.countAll<string>().as("n")).executeTakeFirstOrThrow(),
    base(db)
      .select(sql<string>`unnest(t.tags)`.as("tag"))
      .distinct()
      .orderBy("tag")
      .limit(60)
      .execute(),
  ]);
  return {
    items: rows.map(toCatalogueItem),
    total: Number(count.n),
    page,
    pageSize,
    tags: tags.map((t) => t.tag),
  };
}

export type ListingPage = CatalogueItem & {
  versionId: string;
  versionNumber: number;
  programme: Programme;
  /** False when the page is shown only because the viewer is its seller or an admin. */
  onSale: boolean;
  sellerId: string;
};

/**
 * One listing by slug: anyone sees it while it is on sale; its seller and
 * admins also see it when it is not (with `onSale: false`). Null otherwise.
 */
export async function getListingPage(db: Db, slug: string, viewer: { id: string; role: Role } | null): Promise<ListingPage | null> {
  if (!/^[a-z0-9]+(-[a-z0-9]+)*$/.test(slug) || slug.length > 80) return null;
  const r = await db
    .selectFrom("listings as l")
    .innerJoin("templates as t", "t.id", "l.template_id")
    .innerJoin("users as u", "u.id", "l.seller_id")
    .innerJoin("template_versions as v", "v.id", "l.version_id")
    .select([
      "l.id",
      "l.slug",
      "t.title",
      "l.summary",
      "t.tags",
      "u.name as coach_name",
      "u.disabled_at",
      "l.price_minor",
      "l.currency",
      "l.level",
      "l.weeks",
      "l.days_per_week",
      "l.listed_at",
      "l.unlisted_at",
      "l.seller_id",
      "t.archived_at",
      "t.visibility",
      "v.id as version_id",
      "v.number as version_number",
      "v.source",
      "v.model",
    ])
    .where("l.slug", "=", slug)
    .executeTakeFirst();
  if (!r) return null;
  const onSale = r.listed_at !== null && r.unlisted_at === null && r.archived_at === null && r.visibility === "listed" && r.disabled_at === null;
  const privileged = viewer !== null && (viewer.role === "admin" || viewer.id === r.seller_id);
  if (!onSale && !privileged) return null;
  return {
    ...toCatalogueItem(r),
    versionId: r.version_id,
    versionNumber: r.version_number,
    programme: readModel(r.model, r.source),
    onSale,
    sellerId: r.seller_id,
  };
}
