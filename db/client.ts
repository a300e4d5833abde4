/**
 * The one connection pool of a process. Query modules take `db` (or a
 * transaction) as their first argument; only entry points call `getDb()`.
 */
import { Kysely, PostgresDialect } from "kysely";
import pg from "pg";
import type { Database } from "./database";

// Calendar dates stay "YYYY-MM-DD" strings: a JS Date would shift them by the server's time zone.
pg.types.setTypeParser(1082, (v: string) => v);

let instance: Kysely<Database> | null = null;

export function databaseUrl(): string {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("DATABASE_URL is not set (npm start and npm test set it from .env.local)");
  return url;
}

export function createDb(url = databaseUrl(), max = 10): Kysely<Database> {
  return new Kysely<Database>({
    dialect: new PostgresDialect({ pool: new pg.Pool({ connectionString: url, max }) }),
  });
}

export function getDb(): Kysely<Database> {
  instance ??= createDb();
  return instance;
}

export async function closeDb(): Promise<void> {
  if (instance) await instance.destroy();
  instance = null;
}
