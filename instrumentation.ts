/**
 * Runs once when a Next.js server starts. Background jobs (bulk assignment)
 * are worked by a pg-boss worker inside each Node server: only in the Node
 * runtime (pg cannot run on the edge), and only when a database is configured
 * (a build without one has nothing to work on), and never inside `next build`,
 * whose page-generation workers also load this file. A failure is logged, not
 * thrown: pages keep working and queued jobs wait for the next start.
 */
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  if (!process.env.DATABASE_URL) return;
  if (process.env.NEXT_PHASE === "phase-production-build") return;
  try {
    const { startJobWorker } = await import("./server/jobs/worker");
    await startJobWorker();
  } catch (err) {
    console.error("[ironquill] background jobs did not start:", err instanceof Error ? err.message : err);
  }
}
