/**
 * A real pg-boss queue on a test's scratch database. pg-boss opens its own
 * pool, so it takes the database's address rather than the Kysely instance.
 */
import type PgBoss from "pg-boss";
import { startBoss } from "../../server/jobs/boss";

/** The address of a scratch database (by name) on the test cluster. */
export function scratchUrl(name: string): string {
  const url = new URL(process.env.IQ_TEST_DB_ADMIN_URL!);
  url.pathname = `/${name}`;
  return url.toString();
}

/**
 * Starts the app's queue (its schema and queues created) on the scratch
 * database, with no workers; a test registers them when it wants them.
 *
 * @example
 * h.boss = await startScratchBoss(scratch);
 * await stopBoss(h.boss);
 */
export function startScratchBoss(scratch: { name: string }): Promise<PgBoss> {
  return startBoss(scratchUrl(scratch.name));
}

/** Stops at once, without waiting for running jobs to finish, and closes its pool. */
export async function stopBoss(boss: PgBoss | null | undefined): Promise<void> {
  await boss?.stop({ graceful: false, wait: true });
}

export const pause = (ms: number) => new Promise((r) => setTimeout(r, ms));
