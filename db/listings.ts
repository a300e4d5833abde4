import "server-only";
import { randomBytes } from "node:crypto";
import { sql } from "kysely";
import { z } from "zod";
import { checkMinor, CURRENCIES, type Currency } from "../lib/money";
import type { Programme } from "../lib/notation/model";
import { slugify } from "../lib/slug";
import type { ListingLevel, Role } from "./database";
import { DomainError } from "./domainError";
import { type Actor, type Db, inTransaction, requireOwnTemplate } from "./templateAccess";
import { isUuid } from "./templateRules";
import { readModel } from "./templateVersions";

/**
 * A coach's listing of one of their templates: price in integer minor units,
 * currency, public description, level, and the pinned version buyers get.
 * Public reads live in db/catalogue.ts; purchases in db/purchases.ts.
 *
 * @example
 * await saveListing(db, coach, templateId, { priceMinor: 2900, currency: "eur", summary: "…", level: "beginner", versionNumber: 2, onSale: true });
 */

export const LEVELS = ["beginner", "intermediate", "advanced"] as const satisfies readonly ListingLevel[];
export const SUMMARY_MAX = 2000;
export const REASON_MAX = 500;

export const listingInputSchema = z.object({
  priceMinor: z
    .number({ error: "Give the price as a whole number of cents (minor units)" })
    .int("Give the price as a whole number of cents (minor units)"),
  currency: z.enum(CURRENCIES, { error: `Currency is one of ${CURRENCIES.join(", ")}` }),
  summary: z.string({ error: "The public description must be text" }).trim().max(SUMMARY_MAX, `Keep the public description to ${SUMMARY_MAX} characters`),
  level: z.enum(LEVELS, { error: "Level is beginner, intermediate or advanced" }),
  versionNumber: z.number({ error: "Pick the version to sell" }).int("Pick the version to sell").min(1, "Pick the version to sell"),
  onSale: z.boolean({ error: "onSale is true or false" }),
});
export type ListingInput = z.output<typeof listingInputSchema>;

export type ListingState = "on_sale" | "withdrawn" | "unlisted_by_admin";

export type CoachListing = {
  id: string;
  slug: string;
  priceMinor: number;
  currency: Currency;
  summary: string;
  level: ListingLevel;
  versionNumber: number;
  weeks: number;
  daysPerWeek: number;
  state: ListingState;
  unlistedReason: string | null;
  updatedAt: Date;
};

/** Weeks and training days per week of a programme, as the catalogue filters them. */
export function programmeFacts(programme: Programme): { weeks: number; daysPerWeek: number } {
  const weeks = programme.blocks.reduce((sum, b) => sum + b.weeks, 0);
  const daysPerWeek = programme.blocks.reduce((most, b) => Math.max(most, b.days.length), 0);
  return { weeks, daysPerWeek };
}

/**
 * On sale means the coach offers it, no admin took it out, and the template is
 * still "listed" and not archived (the template's own details form can change those).
 */
function stateOf(r: { listed_at: Date | null; unlisted_at: Date | null; visibility: string; archived_at: Date | null }): ListingState {
  if (r.unlisted_at) return "unlisted_by_admin";
  return r.listed_at && r.visibility === "listed" && r.archived_at === null ? "on_sale" : "withdrawn";
}

function invalid(field: string, message: string): DomainError {
  return new DomainError("invalid_input", message, { [field]: message });
}

/** Checks a listing's fields whoever calls; every problem names its field. */
export function checkListingInput(raw: unknown): ListingInput {
  const parsed = listingInputSchema.safeParse(raw);
  if (!parsed.success) {
    const fields: Record<string, string> = {};
    for (const issue of parsed.error.issues) fields[issue.path.join(".") || "_"] ??= issue.message;
    const [field, message] = Object.entries(fields)[0];
    throw new DomainError("invalid_input", field === "_" ? message : `${field}: ${message}`, fields);
  }
  const price = checkMinor(parsed.data.priceMinor, parsed.data.currency);
  if (!price.ok) throw invalid("priceMinor", price.message);
  return parsed.data;
}

/** The listing of one of the coach's own templates, or null when it has none (or the template is not theirs). */
export async function getListingForTemplate(db: Db, actor: Actor, templateId: string): Promise<CoachListing | null> {
  if (!isUuid(templateId)) return null;
  const r = await db
    .selectFrom("listings as l")
    .innerJoin("template_versions as v", "v.id", "l.version_id")
    .innerJoin("templates as t", "t.id", "l.template_id")
    .selectAll("l")
    .select(["v.number as version_number", "t.visibility", "t.archived_at"])
    .where("l.template_id", "=", templateId)
    .where("l.seller_id", "=", actor.id)
    .executeTakeFirst();
  if (!r) return null;
  return {
    id: r.id,
    slug: r.slug,
    priceMinor: r.price_minor,
    currency: r.currency as Currency,
    summary: r.summary,
    level: r.level,
    versionNumber: r.version_number,
    weeks: r.weeks,
    daysPerWeek: r.days_per_week,
    state: stateOf(r),
    unlistedReason: r.unlisted_reason,
    updatedAt: r.updated_at,
  };
}

// Pages of the store that sit beside /store/[slug]; a listing named like one would be hidden by it.
const RESERVED_SLUGS = new Set(["checkout", "purchases"]);

async function freeSlug(db: Db, title: string): Promise<string> {
  const stem = slugify(title, "programme");
  const base = RESERVED_SLUGS.has(stem) ? `${stem}-programme` : stem;
  const taken = new Set(
    (await db.selectFrom("listings").select("slug").where((eb) => eb.or([eb("slug", "=", base), eb("slug", "like", `${base}-%`)])).execute()).map((r) => r.slug),
  );
  if (!taken.has(base)) return base;
  for (let n = 2; n < 50; n++) if (!taken.has(`${base}-${n}`)) return `${base}-${n}`;
  return `${base}-${randomBytes(3).toString("hex")}`;
}

/**
 * Creates or changes the listing of an own template. The slug is set once, so
 * links keep working. Putting it on sale also marks the template "listed";
 * withdrawing sets a "listed" template back to private. An admin's unlisting
 * stays until an admin lifts it, whatever the coach saves.
 */
export async function saveListing(db: Db, actor: Actor, templateId: string, raw: unknown): Promise<CoachListing> {
  if (actor.role !== "coach") throw new DomainError("forbidden", "Only coaches sell templates.");
  const input = checkListingInput(raw);
  await inTransaction(db, async (trx) => {
    const template = await requireOwnTemplate(trx, actor, templateId, true);
    const meta = await trx.selectFrom("templates").select("archived_at").where("id", "=", templateId).executeTakeFirstOrThrow();
    if (input.onSale && meta.archived_at) throw new DomainError("conflict", "This template is archived; bring it back before putting it on sale.", { onSale: "The template is archived" });
    const version = await trx
      .selectFrom("template_versions")
      .select(["id", "source", "model"])
      .where("template_id", "=", templateId)
      .where("number", "=", input.versionNumber)
      .executeTakeFirst();
    if (!version) throw invalid("versionNumber", `This template has no version ${input.versionNumber}.`);
    const facts = programmeFacts(readModel(version.model, version.source));
    if (facts.weeks < 1 || facts.daysPerWeek < 1) throw invalid("versionNumber", "That version has no training days to sell; pick a version with at least one day.");
    const now = new Date();
    const values = {
      version_id: version.id,
      price_minor: input.priceMinor,
      currency: input.currency,
      summary: input.summary,
      level: input.level,
      weeks: facts.weeks,
      days_per_week: facts.daysPerWeek,
      updated_at: now,
    };
    const existing = await trx.selectFrom("listings").select(["id", "listed_at"]).where("template_id", "=", templateId).executeTakeFirst();
    const listedAt = input.onSale ? (existing?.listed_at ?? now) : null;
    if (existing) {
      await trx.updateTable("listings").set({ ...values, listed_at: listedAt }).where("id", "=", existing.id).execute();
    } else {
      await trx
        .insertInto("listings")
        .values({ ...values, template_id: templateId, seller_id: actor.id, slug: await freeSlug(trx, template.title), listed_at: listedAt, unlisted_at: null, unlisted_by: null, unlisted_reason: null })
        .execute();
    }
    if (input.onSale) await trx.updateTable("templates").set({ visibility: "listed" }).where("id", "=", templateId).execute();
    else await trx.updateTable("templates").set({ visibility: "private" }).where("id", "=", templateId).where("visibility", "=", "listed").execute();
  }).catch((err: unknown) => {
    // Two first saves racing for one slug: the loser is told to try again, never shown a 500.
    if ((err as { code?: string }).code === "23505") throw new DomainError("conflict", "Someone saved at the same moment; please save again.");
    throw err;
  });
  return (await getListingForTemplate(db, actor, templateId))!;
}

export type AdminListing = {
  id: string;
  slug: string;
  title: string;
  sellerName: string;
  sellerEmail: string;
  priceMinor: number;
  currency: string;
  state: ListingState;
  unlistedReason: string | null;
  sales: number;
  updatedAt: Date;
};

function requireAdmin(actor: { role: Role }): void {
  if (actor.role !== "admin") throw new DomainError("forbidden", "Only an admin can do this.");
}

/** Every listing with its seller and count of paid sales, newest change first. Admins only. */
export async function adminListListings(db: Db, actor: Actor): Promise<AdminListing[]> {
  requireAdmin(actor);
  const rows = await db
    .selectFrom("listings as l")
    .innerJoin("templates as t", "t.id", "l.template_id")
    .innerJoin("users as u", "u.id", "l.seller_id")
    .select((eb) => [
      "l.id",
      "l.slug",
      "t.title",
      "u.name as seller_name",
      "u.email as seller_email",
      "l.price_minor",
      "l.currency",
      "l.listed_at",
      "l.unlisted_at",
      "l.unlisted_reason",
      "l.updated_at",
      "t.visibility",
      "t.archived_at",
      eb
        .selectFrom("purchases as p")
        .select((e) => e.fn.countAll<string>().as("n"))
        .whereRef("p.listing_id", "=", "l.id")
        .where("p.status", "=", "paid")
        .as("sales"),
    ])
    .orderBy("l.updated_at", "desc")
    .execute();
  return rows.map((r) => ({
    id: r.id,
    slug: r.slug,
    title: r.title,
    sellerName: r.seller_name,
    sellerEmail: r.seller_email,
    priceMinor: r.price_minor,
    currency: r.currency,
    state: stateOf(r),
    unlistedReason: r.unlisted_reason,
    sales: Number(r.sales ?? 0),
    updatedAt: r.updated_at,
  }));
}

/**
 * An admin takes a listing out of the store (with a reason the coach sees) or
 * lets it back. Purchases already made keep their copies.
 */
export async function setAdminUnlisted(db: Db, actor: Actor, listingId: string, input: { unlisted: boolean; reason?: string | null }): Promise<AdminListing> {
  requireAdmin(actor);
  if (!isUuid(listingId)) throw new DomainError("not_found", "That listing does not exist.");
  const reason = input.reason?.trim() || null;
  if (reason && reason.length > REASON_MAX) throw invalid("reason", `Keep the reason to ${REASON_MAX} characters`);
  const result = await db
    .updateTable("listings")
    .set(input.unlisted ? { unlisted_at: sql<Date>`coalesce(unlisted_at, now())`, unlisted_by: actor.id, unlisted_reason: reason } : { unlisted_at: null, unlisted_by: null, unlisted_reason: null })
    .where("id", "=", listingId)
    .executeTakeFirst();
  if (Number(result.numUpdatedRows) === 0) throw new DomainError("not_found", "That listing does not exist.");
  const found = (await adminListListings(db, actor)).find((l) => l.id === listingId);
  return found!;
}

/**
 * Demo data: puts one of the coach's templates (the beginner one when there
 * is one, else the first) on sale at 24.00 EUR, once. Returns the slug.
 */
export async function seedStore(db: Db, coachId: string): Promise<string | null> {
  const coach = { id: coachId, role: "coach" as const };
  const already = await db.selectFrom("listings").select("slug").where("seller_id", "=", coachId).executeTakeFirst();
  if (already) return already.slug;
  const templates = await db
    .selectFrom("templates as t")
    .select(["t.id", "t.title", "t.tags", "t.description"])
    .where("t.owner_id", "=", coachId)
    .where("t.archived_at", "is", null)
    .orderBy("t.created_at")
    .execute();
  const pick = templates.find((t) => t.tags.includes("beginner")) ?? templates[0];
  if (!pick) return null;
  const latest = await db.selectFrom("template_versions").select("number").where("template_id", "=", pick.id).orderBy("number", "desc").executeTakeFirst();
  if (!latest) return null;
  const listing = await saveListing(db, coach, pick.id, {
    priceMinor: 2400,
    currency: "eur",
    summary:
      pick.description ||
      "Three short full-body sessions a week for people new to the barbell: squat, press and pull every session, loads worked from your own maxes and rounded to your plates.",
    level: pick.tags.includes("beginner") ? "beginner" : "intermediate",
    versionNumber: latest.number,
    onSale: true,
  });
  return listing.slug;
}
