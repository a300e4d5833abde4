/**
 * Applies db/migrations/* in name order. Used by scripts/migrate.ts and by the
 * integration tests (which migrate a fresh database).
 */
import { promises as fs } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { FileMigrationProvider, type Kysely, Migrator } from "kysely";

const folder = path.join(path.dirname(fileURLToPath(import.meta.url)), "migrations");

export function migrator(db: Kysely<any>): Migrator {
  return new Migrator({ db, provider: new FileMigrationProvider({ fs, path, migrationFolder: folder }) });
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
