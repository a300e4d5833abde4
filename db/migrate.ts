/**
 * Applies db/migrations in name order. Used by scripts/migrate.ts and by the
 * integration tests (which migrate a fresh database).
 */
import { type Kysely, Migrator } from "kysely";
import { migrations } from "./migrations";

export function migrator(db: Kysely<any>): Migrator {
  return new Migrator({ db, provider: { getMigrations: async () => migrations } });
}

/** Runs pending migrations; returns the names applied, throws with the failing name on error. */
export async function migrateToLatest(db: Kysely<any>): Promise<string[]> {
  const { error, results } = await migrator(db).migrateToLatest();
  const failed = results?.find((r) => r.status === "Error");
  if (error || failed) {
    const reason = error instanceof Error ? error.message : String(error ?? "unknown error");
    throw new Error(`migration ${failed?.migrationName ?? "(before any ran)"} failed: ${reason}`);
  }
  return (results ?? []).filter((r) => r.status === "Success").map((r) => r.migrationName);
}
