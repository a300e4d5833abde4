import type { Kysely } from "kysely";

// Frozen: never edit a migration that has shipped; add a new one instead.
// When the purchase's receipt e-mail went out: a receipt that could not be
// sent at once is retried from the job queue until this is set.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable("purchases").addColumn("receipt_mailed_at", "timestamptz").execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable("purchases").dropColumn("receipt_mailed_at").execute();
}
