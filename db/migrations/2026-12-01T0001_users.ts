import { type Kysely, sql } from "kysely";

// Frozen: never edit a migration that has shipped; add a new one instead.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable("gyms")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("name", "text", (c) => c.notNull())
    .addColumn("city", "text")
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();

  await db.schema
    .createTable("users")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("email", "text", (c) => c.notNull())
    .addColumn("name", "text", (c) => c.notNull())
    .addColumn("password_hash", "text", (c) => c.notNull())
    .addColumn("role", "text", (c) => c.notNull().check(sql`role in ('admin', 'coach', 'athlete')`))
    .addColumn("coach_id", "uuid", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("gym_id", "uuid", (c) => c.references("gyms.id").onDelete("set null"))
    .addColumn("disabled_at", "timestamptz")
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();

  // E-mail addresses are compared case-insensitively; the unique index enforces it.
  await sql`create unique index users_email_lower on users (lower(email))`.execute(db);
  await db.schema.createIndex("users_coach_id").on("users").column("coach_id").execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable("users").execute();
  await db.schema.dropTable("gyms").execute();
}
