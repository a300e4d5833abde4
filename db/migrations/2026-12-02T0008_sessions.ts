import type { Kysely } from "kysely";

// Frozen: never edit a migration that has shipped; add a new one instead.
// When an account's password last changed: sessions signed in before it are
// refused (server/auth.ts), so a reset also signs out every other device.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable("users").addColumn("credentials_changed_at", "timestamptz").execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable("users").dropColumn("credentials_changed_at").execute();
}
