import { type Kysely, sql } from "kysely";

// Frozen: never edit a migration that has shipped; add a new one instead.
// The template store: a coach's listing of one template (price in integer
// minor units, a pinned version), purchases with their provider references,
// the buyer's entitlement to their own copy, and every provider event seen
// once (its id is the key, so a replay changes nothing).
export async function up(db: Kysely<any>): Promise<void> {
  const id = (c: any) => c.primaryKey().defaultTo(sql`gen_random_uuid()`);
  const now = (c: any) => c.notNull().defaultTo(sql`now()`);

  await db.schema
    .createTable("listings")
    .addColumn("id", "uuid", id)
    .addColumn("template_id", "uuid", (c) => c.notNull().unique().references("templates.id").onDelete("cascade"))
    .addColumn("seller_id", "uuid", (c) => c.notNull().references("users.id").onDelete("cascade"))
    // The version buyers get and the preview shows; a coach moves it on by choice, never silently.
    .addColumn("version_id", "uuid", (c) => c.notNull().references("template_versions.id").onDelete("cascade"))
    .addColumn("slug", "text", (c) => c.notNull().unique().check(sql`slug ~ '^[a-z0-9]+(-[a-z0-9]+)*$' and char_length(slug) <= 80`))
    .addColumn("price_minor", "integer", (c) => c.notNull().check(sql`price_minor between 100 and 100000`))
    .addColumn("currency", "text", (c) => c.notNull().check(sql`currency in ('eur', 'gbp', 'usd', 'cad', 'aud', 'chf')`))
    .addColumn("summary", "text", (c) => c.notNull().defaultTo("").check(sql`char_length(summary) <= 2000`))
    .addColumn("level", "text", (c) => c.notNull().check(sql`level in ('beginner', 'intermediate', 'advanced')`))
    // Worked out from the pinned version when it is pinned, so the catalogue filters in SQL.
    .addColumn("weeks", "integer", (c) => c.notNull().check(sql`weeks between 1 and 520`))
    .addColumn("days_per_week", "integer", (c) => c.notNull().check(sql`days_per_week between 1 and 14`))
    .addColumn("listed_at", "timestamptz")
    .addColumn("unlisted_at", "timestamptz")
    .addColumn("unlisted_by", "uuid", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("unlisted_reason", "text", (c) => c.check(sql`char_length(unlisted_reason) <= 500`))
    .addColumn("created_at", "timestamptz", now)
    .addColumn("updated_at", "timestamptz", now)
    .execute();
  await db.schema.createIndex("listings_seller").on("listings").column("seller_id").execute();

  await db.schema
    .createTable("purchases")
    .addColumn("id", "uuid", id)
    // A plain running number for receipts.
    .addColumn("number", "bigint", (c) => c.notNull().unique().generatedAlwaysAsIdentity())
    .addColumn("listing_id", "uuid", (c) => c.references("listings.id").onDelete("set null"))
    .addColumn("version_id", "uuid", (c) => c.references("template_versions.id").onDelete("set null"))
    .addColumn("buyer_id", "uuid", (c) => c.notNull().references("users.id"))
    .addColumn("seller_id", "uuid", (c) => c.notNull().references("users.id"))
    // What was bought, as it was named then: a record of money outlives renames and deletions.
    .addColumn("title", "text", (c) => c.notNull())
    .addColumn("amount_minor", "integer", (c) => c.notNull().check(sql`amount_minor > 0`))
    .addColumn("currency", "text", (c) => c.notNull().check(sql`currency ~ '^[a-z]{3}$'`))
    .addColumn("status", "text", (c) => c.notNull().defaultTo("pending").check(sql`status in ('pending', 'paid', 'refunded')`))
    .addColumn("attempt_id", "uuid", (c) => c.notNull())
    .addColumn("checkout_session_id", "text", (c) => c.unique())
    .addColumn("payment_intent_id", "text", (c) => c.unique())
    .addColumn("refund_id", "text")
    .addColumn("copy_template_id", "uuid", (c) => c.references("templates.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", now)
    .addColumn("paid_at", "timestamptz")
    .addColumn("refunded_at", "timestamptz")
    .addUniqueConstraint("purchases_attempt", ["buyer_id", "attempt_id"])
    .addCheckConstraint("purchases_paid_dated", sql`status = 'pending' or paid_at is not null`)
    .addCheckConstraint("purchases_refund_dated", sql`status <> 'refunded' or refunded_at is not null`)
    .execute();
  await db.schema.createIndex("purchases_seller_paid").on("purchases").columns(["seller_id", "paid_at"]).execute();
  await db.schema.createIndex("purchases_buyer").on("purchases").columns(["buyer_id", "created_at"]).execute();

  // One per paid purchase; revoking keeps the row (and the date) rather than deleting it.
  await db.schema
    .createTable("entitlements")
    .addColumn("id", "uuid", id)
    .addColumn("purchase_id", "uuid", (c) => c.notNull().unique().references("purchases.id").onDelete("cascade"))
    .addColumn("user_id", "uuid", (c) => c.notNull().references("users.id").onDelete("cascade"))
    .addColumn("template_id", "uuid", (c) => c.notNull().unique().references("templates.id").onDelete("cascade"))
    .addColumn("source_version_id", "uuid", (c) => c.references("template_versions.id").onDelete("set null"))
    .addColumn("granted_at", "timestamptz", now)
    .addColumn("revoked_at", "timestamptz")
    .execute();
  await db.schema.createIndex("entitlements_user").on("entitlements").column("user_id").execute();

  await db.schema
    .createTable("webhook_events")
    .addColumn("id", "text", (c) => c.primaryKey().check(sql`char_length(id) between 1 and 255`))
    .addColumn("type", "text", (c) => c.notNull())
    .addColumn("outcome", "text", (c) => c.notNull())
    .addColumn("purchase_id", "uuid", (c) => c.references("purchases.id").onDelete("set null"))
    .addColumn("received_at", "timestamptz", now)
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable("webhook_events").execute();
  await db.schema.dropTable("entitlements").execute();
  await db.schema.dropTable("purchases").execute();
  await db.schema.dropTable("listings").execute();
}
