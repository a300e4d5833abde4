import { sql } from "kysely";
import { NextResponse } from "next/server";
import { getDb } from "@/db/client";

export const dynamic = "force-dynamic";

/** Liveness for load balancers and the test suite: the app answers, and whether the database does. */
export async function GET() {
  const started = performance.now();
  let database: { ok: boolean; latencyMs: number | null; error: string | null };
  try {
    await sql`select 1`.execute(getDb());
    database = { ok: true, latencyMs: Math.round((performance.now() - started) * 10) / 10, error: null };
  } catch {
    database = { ok: false, latencyMs: null, error: "database unreachable" };
  }
  return NextResponse.json(
    { app: { ok: true, name: "ironquill", version: process.env.npm_package_version ?? "0.1.0" }, database, time: new Date().toISOString() },
    { status: database.ok ? 200 : 503, headers: { "cache-control": "no-store" } },
  );
}
