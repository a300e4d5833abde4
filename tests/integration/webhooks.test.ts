import { randomUUID } from "node:crypto";
import type { Kysely } from "kysely";
import Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import type { Database } from "../../db/database";
import { post } from "../support/requests";
import { BASE_URL, counts, type Hooks, payOnFake, SECRET_KEY, storeFixture, WEBHOOK_SECRET } from "../support/storeFixture";

// The handlers ask for the session and the pool themselves; both are swapped here.
const h = vi.hoisted(() => ({ db: null as unknown, viewer: null }) as unknown as Hooks);
vi.mock("@/server/auth", () => ({ getViewer: async () => h.viewer }));
vi.mock("@/db/client", async (importOriginal) => ({ ...(await importOriginal<object>()), getDb: () => h.db }));

const checkout = await import("../../app/api/store/checkout/route");
const status = await import("../../app/api/store/checkout/status/route");
const refund = await import("../../app/api/store/sales/[id]/refund/route");

type World = Awaited<ReturnType<typeof storeFixture>>;

function webhookRequest(payload: string, signature: string): Request {
  return new Request(`${BASE_URL}/api/webhooks/payments`, { method: "POST", headers: { "content-type": "application/json", "stripe-signature": signature }, body: payload });
}

/** An event shaped as the provider sends it, for a checkout session of ours. */
function completedEvent(session: { id: string; amount_total: number; currency: string; metadata: Record<string, string>; payment_intent: string }) {
  return JSON.stringify({
    id: `evt_${randomUUID().replace(/-/g, "")}`,
    object: "event",
    type: "checkout.session.completed",
    created: Math.floor(Date.now() / 1000),
    livemode: false,
    data: { object: { object: "checkout.session", payment_status: "paid", status: "complete", client_reference_id: session.metadata.purchase_id, ...session } },
  });
}

describe("payment webhooks", () => {
  let w: World;
  let db: Kysely<Database>;

  beforeAll(async () => {
    w = await storeFixture(h);
    db = w.db;
  });
  afterAll(async () => {
    await w?.close();
  });

  /** A pending purchase with a checkout session at the fake, not yet paid. */
  async function startBuying() {
    h.viewer = w.buyer;
    const res = await checkout.POST(post("/api/store/checkout", { listingId: w.listing.id, attemptId: randomUUID() }));
    expect(res.status).toBe(201);
    const { url, purchaseId } = await res.json();
    const sessionId = new URL(url).pathname.split("/").pop()!;
    return { url, purchaseId, sessionId };
  }

  it("grants nothing for a forged signature, a tampered body or a stale timestamp", async () => {
    const { purchaseId, sessionId } = await startBuying();
    const session = { id: sessionId, amount_total: 2999, currency: "eur", metadata: { purchase_id: purchaseId }, payment_intent: "pi_forged" };
    const payload = completedEvent(session);

    // Signed with another secret: what anyone without our secret can produce.
    const forged = Stripe.webhooks.generateTestHeaderString({ payload, secret: "whsec_someone_else" });
    // Signed correctly, then the body changed on the way (the amount lowered to 1 cent).
    const good = Stripe.webhooks.generateTestHeaderString({ payload, secret: WEBHOOK_SECRET });
    const tampered = payload.replace('"amount_total":2999', '"amount_total":1');
    expect(tampered).not.toBe(payload);
    // Signed correctly, but 301 s old: past the five-minute tolerance the provider documents for its SDK's default.
    const stale = Stripe.webhooks.generateTestHeaderString({ payload, secret: WEBHOOK_SECRET, timestamp: Math.floor(Date.now() / 1000) - 301 });

    for (const [body, signature] of [
      [payload, forged],
      [tampered, good],
      [payload, stale],
      [payload, "t=1,v1=nonsense"],
    ] as const) {
      const res = await w.webhook.POST(webhookRequest(body, signature));
      expect(res.status).toBe(401);
      expect((await res.json()).error.code).toBe("unauthenticated");
    }
    const missing = await w.webhook.POST(new Request(`${BASE_URL}/api/webhooks/payments`, { method: "POST", body: payload }));
    expect(missing.status).toBe(401);

    expect(await counts(db, w.buyer.id)).toEqual({ entitlements: 0, activeEntitlements: 0, copies: 0, paid: 0 });
    expect(await db.selectFrom("webhook_events").selectAll().execute()).toEqual([]);
    const p = await db.selectFrom("purchases").select("status").where("id", "=", purchaseId).executeTakeFirstOrThrow();
    expect(p.status).toBe("pending");
  });

  it("refuses a correctly signed event whose amount differs from the price", async () => {
    const { purchaseId, sessionId } = await startBuying();
    const payload = completedEvent({ id: sessionId, amount_total: 1, currency: "eur", metadata: { purchase_id: purchaseId }, payment_intent: "pi_short" });
    const res = await w.webhook.POST(webhookRequest(payload, Stripe.webhooks.generateTestHeaderString({ payload, secret: WEBHOOK_SECRET })));
    expect(res.status).toBe(200);
    expect((await res.json()).outcome).toBe("ignored");
    expect((await counts(db, w.buyer.id)).entitlements).toBe(0);
  });

  it("grants exactly one entitlement and one copy for a payment made on the fake's page, and the success page only reads", async () => {
    const { url, purchaseId, sessionId } = await startBuying();
    // Before paying, the page the buyer comes back to says "pending" and grants nothing by being asked.
    h.viewer = w.buyer;
    const before = await status.GET(new Request(`${BASE_URL}/api/store/checkout/status?session_id=${sessionId}`));
    expect((await before.json()).status).toBe("pending");
    expect((await counts(db, w.buyer.id)).entitlements).toBe(0);

    const back = await payOnFake(w.fake.url, url);
    expect(back).toBe(`${BASE_URL}/store/checkout/success?session_id=${sessionId}`);
    await w.fake.idle();

    expect(await counts(db, w.buyer.id)).toEqual({ entitlements: 1, activeEntitlements: 1, copies: 1, paid: 1 });
    const p = await db.selectFrom("purchases").selectAll().where("id", "=", purchaseId).executeTakeFirstOrThrow();
    expect(p).toMatchObject({ status: "paid", amount_minor: 2999, currency: "eur", checkout_session_id: sessionId });
    expect(Number.isInteger(p.amount_minor)).toBe(true);
    expect(p.payment_intent_id).toMatch(/^pi_/);
    const copy = await db.selectFrom("templates").selectAll().where("id", "=", p.copy_template_id!).executeTakeFirstOrThrow();
    expect(copy).toMatchObject({ owner_id: w.buyer.id, visibility: "private", archived_at: null, title: "Store test programme" });
    const copyVersion = await db.selectFrom("template_versions").select(["source", "number"]).where("template_id", "=", copy.id).execute();
    const pinned = await db.selectFrom("template_versions").select("source").where("id", "=", p.version_id!).executeTakeFirstOrThrow();
    expect(copyVersion).toEqual([{ source: pinned.source, number: 1 }]);

    const after = await status.GET(new Request(`${BASE_URL}/api/store/checkout/status?session_id=${sessionId}`));
    expect(await after.json()).toMatchObject({ status: "paid", purchaseId, copyTemplateId: copy.id });
    // What the provider charged, read back through the SDK, is the listed price in minor units.
    const stripe = new Stripe(SECRET_KEY, { host: "127.0.0.1", port: w.fake.port, protocol: "http" });
    const pi = await stripe.paymentIntents.retrieve(p.payment_intent_id!);
    expect(pi.amount_received).toBe(2999);
  });

  it("changes nothing when the same event is delivered again, at once or later", async () => {
    const before = await counts(db, w.buyer.id);
    const [event] = (await (await fetch(`${w.fake.url}/_fake/events`)).json()).data.filter((e: { type: string }) => e.type === "checkout.session.completed");
    // Re-sent later by the provider (a fresh signature over the same event).
    const resent = await (await fetch(`${w.fake.url}/_fake/events/${event.id}/resend`, { method: "POST" })).json();
    expect(resent.delivered).toBe(true);
    // Two copies of the same signed request racing each other.
    const { event: full } = { event: (await (await fetch(`${w.fake.url}/_fake/events`)).json()).data.find((e: { id: string }) => e.id === event.id) };
    expect(full.deliveries.length).toBe(2);
    const payload = JSON.stringify((await new Stripe(SECRET_KEY, { host: "127.0.0.1", port: w.fake.port, protocol: "http" }).events.retrieve(event.id)), null, 2);
    const signature = Stripe.webhooks.generateTestHeaderString({ payload, secret: WEBHOOK_SECRET });
    const answers = await Promise.all([w.webhook.POST(webhookRequest(payload, signature)), w.webhook.POST(webhookRequest(payload, signature))]);
    for (const a of answers) {
      expect(a.status).toBe(200);
      expect((await a.json()).outcome).toBe("duplicate");
    }
    expect(await counts(db, w.buyer.id)).toEqual(before);
    const rows = await db.selectFrom("webhook_events").select(["id", "outcome"]).where("id", "=", event.id).execute();
    expect(rows).toEqual([{ id: event.id, outcome: "granted" }]);
  });

  it("grants nothing more for a second, different event about a session already paid", async () => {
    const before = await counts(db, w.buyer.id);
    const paid = await db.selectFrom("purchases").selectAll().where("buyer_id", "=", w.buyer.id).where("status", "=", "paid").executeTakeFirstOrThrow();
    const payload = completedEvent({ id: paid.checkout_session_id!, amount_total: 2999, currency: "eur", metadata: { purchase_id: paid.id }, payment_intent: paid.payment_intent_id! });
    const res = await w.webhook.POST(webhookRequest(payload, Stripe.webhooks.generateTestHeaderString({ payload, secret: WEBHOOK_SECRET })));
    expect((await res.json()).outcome).toBe("ignored");
    expect(await counts(db, w.buyer.id)).toEqual(before);
  });

  it("revokes the entitlement and archives the copy when the coach refunds, once", async () => {
    const paid = await db.selectFrom("purchases").selectAll().where("buyer_id", "=", w.buyer.id).where("status", "=", "paid").executeTakeFirstOrThrow();
    h.viewer = w.rival;
    expect((await refund.POST(post("", {}), { params: Promise.resolve({ id: paid.id }) })).status).toBe(404);
    h.viewer = w.coach;
    const res = await refund.POST(post("", {}), { params: Promise.resolve({ id: paid.id }) });
    expect(res.status).toBe(200);
    expect((await res.json()).refundId).toMatch(/^re_/);
    await w.fake.idle();

    const p = await db.selectFrom("purchases").selectAll().where("id", "=", paid.id).executeTakeFirstOrThrow();
    expect(p.status).toBe("refunded");
    expect(p.refund_id).toMatch(/^re_/);
    expect((await counts(db, w.buyer.id)).activeEntitlements).toBe(0);
    const copy = await db.selectFrom("templates").select("archived_at").where("id", "=", paid.copy_template_id!).executeTakeFirstOrThrow();
    expect(copy.archived_at).not.toBeNull();
    // The provider's own refund event arrives as well, before or after our call returns; only one of the two revokes.
    const refundEvents = await db.selectFrom("webhook_events").select("outcome").where("type", "=", "charge.refunded").execute();
    expect(refundEvents).toHaveLength(1);
    expect(["refunded", "ignored: no paid purchase for that payment"]).toContain(refundEvents[0].outcome);
    expect(await counts(db, w.buyer.id)).toMatchObject({ entitlements: 1, activeEntitlements: 0, paid: 0 });

    const again = await refund.POST(post("", {}), { params: Promise.resolve({ id: paid.id }) });
    expect(again.status).toBe(409);
  });

  it("revokes access when the refund is made at the provider and only its event tells us", async () => {
    const { url, purchaseId } = await startBuying();
    await payOnFake(w.fake.url, url);
    await w.fake.idle();
    const p = await db.selectFrom("purchases").selectAll().where("id", "=", purchaseId).executeTakeFirstOrThrow();
    expect(p.status).toBe("paid");
    const stripe = new Stripe(SECRET_KEY, { host: "127.0.0.1", port: w.fake.port, protocol: "http" });
    await stripe.refunds.create({ payment_intent: p.payment_intent_id! });
    await w.fake.idle();
    const after = await db.selectFrom("purchases").select("status").where("id", "=", purchaseId).executeTakeFirstOrThrow();
    expect(after.status).toBe("refunded");
    const ent = await db.selectFrom("entitlements").select("revoked_at").where("purchase_id", "=", purchaseId).executeTakeFirstOrThrow();
    expect(ent.revoked_at).not.toBeNull();
  });
});
