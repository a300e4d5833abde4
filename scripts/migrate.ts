/** `npm run migrate`: brings the database at DATABASE_URL to the latest schema; exits 1 on failure. */
import { createDb } from "../db/client";
import { migrateToLatest } from "../db/migrate";

const db = createDb(undefined, 1);
try {
  const applied = await migrateToLatest(db);
  console.log(applied.length ? `migrate: applied ${applied.join(", ")}` : "migrate: up to date");
} catch (err) {
  console.error(`migrate: ${err instanceof Error ? err.message : String(err)}`);
  process.exitCode = 1;
} finally {
  await db.destroy();
}
