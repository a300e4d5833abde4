import { randomUUID } from "node:crypto";
import type PgBoss from "pg-boss";
import { sql } from "kysely";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { readStoredMessages } from "../../scripts/fakes/smtp.mjs";
import { startScratchBoss, stopBoss } from "../support/boss";
import { freePort } from "../support/mailbox";
import { request } from "../support/requests";
import { type Hooks, payOnFake, storeFixture } from "../support/storeFixture";

// Session, pool and queue are the test's own; everything else is the app's code.
const h = vi.hoisted(() => ({ db: null as unknown, viewer: null, boss: null as unknown }) as unknown as Hooks & { boss: PgBoss });
vi.mock("@/server/auth", async (importOriginal) => ({ ...(await importOriginal<object>()), getViewer: async () => h.viewer }));
vi.mock("@/db/client", async (importOriginal) => ({ ...(await importOriginal<object>()), getDb: () => h.db }));
vi.mock("@/server/jobs/boss", async (importOriginal) => ({ ...(await importOriginal<object>()), getBoss: async () => h.boss }));

const checkout = await import("../../app/api/store/checkout/route");
const { receiptMailWorker } = await import("../../server/jobs/receiptMail");

type World = Awaited<ReturnType<typeof storeFixture>>;

describe("receipt e-mail", () => {
  let w: World;

  beforeAll(async () => {
    w = await storeFixture(h);
    h.boss = await startScratchBoss({ name: (await sql<{ n: string }>`select current_database() as n`.execute(w.db)).rows[0].n });
  });
  afterAll(async () => {
    await stopBoss(h.boss);
    await w?.close();
  });

  const receiptsTo = (email: string) => readStoredMessages(w.mailDir).filter((m: { to: string[]; subject: string }) => m.to.includes(email) && m.subject.startsWith("Your receipt"));
  const mailedAt = async (purchaseId: string) =>
    (await w.db.selectFrom("purchases").select("receipt_mailed_at").where("id", "=", purchaseId).executeTakeFirstOrThrow()).receipt_mailed_at;

  async function buy(): Promise<string> {
    h.viewer = w.buyer;
    const { url, purchaseId } = await (await checkout.POST(request("POST", "", { listingId: w.listing.id, attemptId: randomUUID() }))).json();
    await payOnFake(w.fake.url, url);
    await w.fake.idle();
    return purchaseId;
  }

  it("is sent at once and recorded when the mail server takes it", async () => {
    const id = await buy();
    expect(receiptsTo("ines@store.test")).toHaveLength(1);
    expect(await mailedAt(id)).not.toBeNull();
  });

  it("is queued when mail is down, sent once by the worker when mail is back, and never twice", async () => {
    // Refund the first purchase so the buyer may buy again.
    await w.db.updateTable("purchases").set({ status: "refunded", refunded_at: new Date() }).where("buyer_id", "=", w.buyer.id).execute();
    await w.db.updateTable("entitlements").set({ revoked_at: new Date() }).where("user_id", "=", w.buyer.id).execute();

    const port = process.env.SMTP_PORT;
    process.env.SMTP_PORT = String(await freePort());
    let id: string;
    try {
      id = await buy();
    } finally {
      process.env.SMTP_PORT = port;
    }
    // Paid and granted all the same; the receipt waits in the queue.
    expect((await w.db.selectFrom("purchases").select("status").where("id", "=", id).executeTakeFirstOrThrow()).status).toBe("paid");
    expect(await mailedAt(id)).toBeNull();
    expect(receiptsTo("ines@store.test")).toHaveLength(1);
    const { rows } = await sql<{ id: string; data: { purchaseId: string; baseUrl: string }; start_after: Date; retry_limit: number }>`
      select id, data, start_after, retry_limit from pgboss.job where name = 'receipt-mail'`.execute(w.db);
    expect(rows).toHaveLength(1);
    expect(rows[0].data.purchaseId).toBe(id);
    expect(rows[0].retry_limit).toBe(6);
    // Retried after a pause, not straight into the same outage.
    expect(rows[0].start_after.getTime()).toBeGreaterThan(Date.now() + 30_000);

    // Mail is back: the queued job runs (handed to the worker as pg-boss would hand it).
    const work = receiptMailWorker(w.db);
    const job = { id: rows[0].id, name: "receipt-mail", data: rows[0].data, retryCount: 1, retryLimit: 6 } as unknown as PgBoss.JobWithMetadata<{ purchaseId: string; baseUrl: string }>;
    await work([job]);
    const mails = receiptsTo("ines@store.test");
    expect(mails).toHaveLength(2);
    expect(mails[1].text).toContain(`/store/purchases/${id}`);
    expect(await mailedAt(id)).not.toBeNull();
    // A second delivery of the same job sends nothing more.
    await work([job]);
    expect(receiptsTo("ines@store.test")).toHaveLength(2);
  });

  it("throws while mail is still down, so the queue tries again later", async () => {
    const { rows } = await sql<{ data: { purchaseId: string; baseUrl: string } }>`select data from pgboss.job where name = 'receipt-mail'`.execute(w.db);
    await w.db.updateTable("purchases").set({ receipt_mailed_at: null }).where("id", "=", rows[0].data.purchaseId).execute();
    const port = process.env.SMTP_PORT;
    process.env.SMTP_PORT = String(await freePort());
    try {
      const job = { id: "j", name: "receipt-mail", data: rows[0].data, retryCount: 2, retryLimit: 6 } as unknown as PgBoss.JobWithMetadata<{ purchaseId: string; baseUrl: string }>;
      await expect(receiptMailWorker(w.db)([job])).rejects.toThrow();
    } finally {
      process.env.SMTP_PORT = port;
    }
    expect(await mailedAt(rows[0].data.purchaseId)).toBeNull();
  });
});
