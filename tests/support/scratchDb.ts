/**
 * A throw-away database for integration tests that need an empty schema:
 * created on the project's test cluster, dropped afterwards.
 */
import { randomBytes } from "node:crypto";
import pg from "pg";
import { createDb } from "../../db/client";

function adminUrl(): string {
  const url = process.env.IQ_TEST_DB_ADMIN_URL;
  if (!url) throw new Error("IQ_TEST_DB_ADMIN_URL is not set: run integration tests through `npm test`");
  return url;
}

async function admin<T>(fn: (c: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: adminUrl() });
  await client.connect();
  try {
    return await fn(client);
  } finally {
    await client.end();
  }
}

export async function createScratchDb() {
  const name = `iq_scratch_${randomBytes(5).toString("hex")}`;
  await admin((c) => c.query(`create database "${name}"`));
  const url = new URL(adminUrl());
  url.pathname = `/${name}`;
  const db = createDb(url.toString(), 3);
  return {
    db,
    name,
    async drop() {
      await db.destroy();
      await admin(async (c) => {
        // Pools that were just told to end (this one, a queue's) close their sockets a moment later.
        // Forcing the drop before then kills them mid-close, which their owners report as an
        // uncaught error; give them up to two seconds first.
        for (let i = 0; i < 40; i++) {
          const { rows } = await c.query<{ n: string }>("select count(*) as n from pg_stat_activity where datname = $1", [name]);
          if (Number(rows[0].n) === 0) break;
          await new Promise((r) => setTimeout(r, 50));
        }
        await c.query(`drop database if exists "${name}" with (force)`);
      });
    },
  };
}
