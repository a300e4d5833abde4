/**
 * The store's world for integration tests: a scratch database, a coach with a
 * template on sale, a self-coached buyer, the fake payment API on a free port
 * with the real SDK pointed at it, and the fake SMTP server catching receipts.
 * The fake delivers webhooks by calling our route handler with the exact
 * bytes and headers it would send over HTTP.
 *
 * The calling test file mocks @/server/auth (getViewer → h.viewer) and
 * @/db/client (getDb → h.db) before calling `storeFixture(h)`.
 */
import { type Kysely, sql } from "kysely";
import type { Database } from "../../db/database";
import { saveListing } from "../../db/listings";
import { createTemplate } from "../../db/templates";
import { startPaymentsFake } from "../../scripts/fakes/payments.mjs";
import { startMailbox } from "./mailbox";
import { addPerson, migratedScratchDb, type Person } from "./people";
import { TEST_ORIGIN } from "./requests";

export type Hooks = { db: Kysely<Database>; viewer: Person | null };

export const BASE_URL = TEST_ORIGIN;
export const WEBHOOK_SECRET = "whsec_store_tests_only";
export const SECRET_KEY = "sk_test_store_tests_only";

export const SOURCE = [
  "title: Store test programme",
  "units: kg",
  "block Base 4w deload w4",
  "day Lower mon",
  "  back squat 3x5 @75% ramp 50/70%",
  "day Upper thu",
  "  bench press 3x8 @2rir",
  "",
].join("\n");

export async function storeFixture(h: Hooks) {
  const scratch = await migratedScratchDb();
  h.db = scratch.db;
  const coach = await addPerson(scratch.db, "rowan@store.test", "Rowan", "coach");
  const rival = await addPerson(scratch.db, "sky@store.test", "Sky", "coach");
  const buyer = await addPerson(scratch.db, "ines@store.test", "Ines", "athlete");
  const admin = await addPerson(scratch.db, "pat@store.test", "Pat", "admin");
  const template = await createTemplate(scratch.db, coach, { title: "Store test programme", tags: ["strength", "4 weeks"], source: SOURCE });
  const listing = await saveListing(scratch.db, coach, template.id, { priceMinor: 2999, currency: "eur", summary: "Two days a week.", level: "intermediate", versionNumber: 1, onSale: true });

  const mailbox = await startMailbox("iq-store-mail-", { SMTP_USER: "" });

  const webhook = await import("../../app/api/webhooks/payments/route");
  const fake = await startPaymentsFake({
    port: 0,
    webhookSecret: WEBHOOK_SECRET,
    apiKey: SECRET_KEY,
    deliver: async (payload: string, headers: Record<string, string>) =>
      webhook.POST(new Request(`${BASE_URL}/api/webhooks/payments`, { method: "POST", headers, body: payload })),
  });

  Object.assign(process.env, {
    STRIPE_SECRET_KEY: SECRET_KEY,
    STRIPE_WEBHOOK_SECRET: WEBHOOK_SECRET,
    STRIPE_API_HOST: "127.0.0.1",
    STRIPE_API_PORT: String(fake.port),
    STRIPE_API_PROTOCOL: "http",
    NEXTAUTH_URL: BASE_URL,
  });

  return {
    db: scratch.db,
    fake,
    mailDir: mailbox.dir,
    coach,
    rival,
    buyer,
    admin,
    templateId: template.id,
    listing,
    webhook,
    async close() {
      await fake.idle();
      await fake.close();
      await mailbox.close();
      await scratch.drop();
    },
  };
}

/** Presses "Pay" on the fake's hosted page, as the buyer's browser would; answers where it redirected to. */
export async function payOnFake(fakeUrl: string, checkoutUrl: string): Promise<string> {
  const id = new URL(checkoutUrl).pathname.split("/").pop();
  const res = await fetch(`${fakeUrl}/pay/${id}/confirm`, { method: "POST", redirect: "manual" });
  if (res.status !== 303) throw new Error(`the fake answered ${res.status} to Pay`);
  return res.headers.get("location") ?? "";
}

/** How much the buyer holds: entitlements (all and standing), templates they own, paid purchases. */
export async function counts(db: Kysely<Database>, buyerId: string) {
  const { rows } = await sql<{ entitlements: string; active: string; copies: string; paid: string }>`
    select (select count(*) from entitlements where user_id = ${buyerId}) as entitlements,
           (select count(*) from entitlements where user_id = ${buyerId} and revoked_at is null) as active,
           (select count(*) from templates where owner_id = ${buyerId}) as copies,
           (select count(*) from purchases where buyer_id = ${buyerId} and status = 'paid') as paid`.execute(db);
  const r = rows[0];
  return { entitlements: Number(r.entitlements), activeEntitlements: Number(r.active), copies: Number(r.copies), paid: Number(r.paid) };
}
