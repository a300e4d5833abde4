import { type Kysely, sql } from "kysely";

// Frozen: never edit a migration that has shipped; add a new one instead.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable("templates")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("owner_id", "uuid", (c) => c.notNull().references("users.id").onDelete("cascade"))
    .addColumn("title", "text", (c) => c.notNull().check(sql`char_length(title) between 1 and 120`))
    .addColumn("description", "text", (c) => c.notNull().defaultTo(""))
    .addColumn("tags", sql`text[]`, (c) => c.notNull().defaultTo(sql`'{}'::text[]`).check(sql`cardinality(tags) <= 12`))
    .addColumn("visibility", "text", (c) =>
      c.notNull().defaultTo("private").check(sql`visibility in ('private', 'link', 'listed')`),
    )
    .addColumn("archived_at", "timestamptz")
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    // The foreign key is added below, once template_versions exists.
    .addColumn("forked_from_version_id", "uuid")
    .execute();
  await db.schema.createIndex("templates_owner_updated").on("templates").columns(["owner_id", "updated_at"]).execute();
  await sql`create index templates_tags on templates using gin (tags)`.execute(db);

  await db.schema
    .createTable("template_versions")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("template_id", "uuid", (c) => c.notNull().references("templates.id").onDelete("cascade"))
    .addColumn("number", "integer", (c) => c.notNull().check(sql`number >= 1`))
    .addColumn("source", "text", (c) => c.notNull())
    .addColumn("model", "jsonb", (c) => c.notNull())
    .addColumn("author_id", "uuid", (c) => c.notNull().references("users.id"))
    .addColumn("note", "text")
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addUniqueConstraint("template_versions_number", ["template_id", "number"])
    .execute();

  await db.schema
    .alterTable("templates")
    .addForeignKeyConstraint("templates_forked_from", ["forked_from_version_id"], "template_versions", ["id"])
    .onDelete("set null")
    .execute();

  // A saved version is a record of what athletes were given: it never changes.
  // The one way a version row goes away is its template being deleted; the
  // cascade runs after the template row is gone, which is what the check sees.
  await sql`
    create function template_versions_immutable() returns trigger language plpgsql as $$
    begin
      if tg_op = 'DELETE' and not exists (select 1 from templates where id = old.template_id) then
        return old;
      end if;
      raise exception 'template versions are immutable: save a new version instead'
        using errcode = 'restrict_violation';
    end
    $$`.execute(db);
  await sql`
    create trigger template_versions_immutable
    before update or delete on template_versions
    for each row execute function template_versions_immutable()`.execute(db);
  await sql`
    create function template_versions_no_truncate() returns trigger language plpgsql as $$
    begin
      raise exception 'template versions are immutable: they cannot be truncated'
        using errcode = 'restrict_violation';
    end
    $$`.execute(db);
  await sql`
    create trigger template_versions_no_truncate
    before truncate on template_versions
    for each statement execute function template_versions_no_truncate()`.execute(db);

  // Work in progress, one row per coach and editor: the template's id, or
  // 'new' for a programme that has no template yet.
  await db.schema
    .createTable("template_drafts")
    .addColumn("owner_id", "uuid", (c) => c.notNull().references("users.id").onDelete("cascade"))
    .addColumn("draft_key", "text", (c) => c.notNull())
    .addColumn("template_id", "uuid", (c) => c.references("templates.id").onDelete("cascade"))
    .addColumn("source", "text", (c) => c.notNull())
    // The version the coach started editing from, to warn when a newer one was saved meanwhile.
    .addColumn("base_version", "integer")
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addPrimaryKeyConstraint("template_drafts_pkey", ["owner_id", "draft_key"])
    .addCheckConstraint(
      "template_drafts_key",
      sql`(draft_key = 'new' and template_id is null) or (template_id is not null and draft_key = template_id::text)`,
    )
    .execute();

  await db.schema
    .createTable("share_links")
    .addColumn("token", "text", (c) => c.primaryKey().check(sql`token ~ '^[A-Za-z0-9_-]{22,}$'`))
    .addColumn("template_id", "uuid", (c) => c.notNull().references("templates.id").onDelete("cascade"))
    .addColumn("version_id", "uuid", (c) => c.notNull().references("template_versions.id").onDelete("cascade"))
    .addColumn("created_by", "uuid", (c) => c.notNull().references("users.id").onDelete("cascade"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("revoked_at", "timestamptz")
    .execute();
  await db.schema.createIndex("share_links_template").on("share_links").column("template_id").execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable("share_links").execute();
  await db.schema.dropTable("template_drafts").execute();
  await db.schema.alterTable("templates").dropConstraint("templates_forked_from").execute();
  await db.schema.dropTable("template_versions").execute();
  await sql`drop function template_versions_immutable()`.execute(db);
  await sql`drop function template_versions_no_truncate()`.execute(db);
  await db.schema.dropTable("templates").execute();
}
