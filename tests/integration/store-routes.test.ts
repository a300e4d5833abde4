import { randomUUID } from "node:crypto";
import type { Kysely } from "kysely";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import type { Database } from "../../db/database";
import { getListingPage } from "../../db/catalogue";
import { seedStore } from "../../db/listings";
import { createTemplate, updateTemplateMeta } from "../../db/templates";
import { readStoredMessages } from "../../scripts/fakes/smtp.mjs";
import { idParams, request } from "../support/requests";
import { BASE_URL, counts, type Hooks, payOnFake, storeFixture } from "../support/storeFixture";

const h = vi.hoisted(() => ({ db: null as unknown, viewer: null }) as unknown as Hooks);
vi.mock("@/server/auth", async (importOriginal) => ({ ...(await importOriginal<object>()), getViewer: async () => h.viewer }));
vi.mock("@/db/client", async (importOriginal) => ({ ...(await importOriginal<object>()), getDb: () => h.db }));

const catalogue = await import("../../app/api/store/listings/route");
const listing = await import("../../app/api/store/templates/[id]/listing/route");
const checkout = await import("../../app/api/store/checkout/route");
const account = await import("../../app/api/store/account/route");
const purchases = await import("../../app/api/store/purchases/route");
const purchase = await import("../../app/api/store/purchases/[id]/route");
const start = await import("../../app/api/store/purchases/[id]/start/route");
const sales = await import("../../app/api/store/sales/route");
const adminOne = await import("../../app/api/store/admin/listings/[id]/route");

type World = Awaited<ReturnType<typeof storeFixture>>;


describe("store route handlers", () => {
  let w: World;
  let db: Kysely<Database>;
  const good = { priceMinor: 2999, currency: "eur", summary: "Two days a week.", level: "intermediate", versionNumber: 1, onSale: true };

  beforeAll(async () => {
    w = await storeFixture(h);
    db = w.db;
  });
  afterAll(async () => {
    await w?.close();
  });

  it("keeps prices whole minor units within the cap and currencies from the list, naming the field", async () => {
    h.viewer = w.coach;
    for (const [patch, field] of [
      [{ priceMinor: 29.99 }, "priceMinor"],
      [{ priceMinor: 0 }, "priceMinor"],
      [{ priceMinor: 100_001 }, "priceMinor"],
      [{ priceMinor: "2999" }, "priceMinor"],
      [{ currency: "jpy" }, "currency"],
      [{ level: "elite" }, "level"],
      [{ versionNumber: 9 }, "versionNumber"],
    ] as const) {
      const res = await listing.PUT(request("PUT", "", { ...good, ...patch }), idParams(w.templateId));
      expect(res.status).toBe(422);
      expect(Object.keys((await res.json()).error.fields)).toContain(field);
    }
    const bad = await listing.PUT(new Request(BASE_URL, { method: "PUT", body: "{" }), idParams(w.templateId));
    expect(bad.status).toBe(422);
    const saved = await listing.PUT(request("PUT", "", good), idParams(w.templateId));
    expect(saved.status).toBe(200);
    expect((await saved.json()).listing).toMatchObject({ priceMinor: 2999, currency: "eur", weeks: 4, daysPerWeek: 2, state: "on_sale", slug: "store-test-programme" });
    // Someone else's template answers like a missing one.
    h.viewer = w.rival;
    expect((await listing.PUT(request("PUT", "", good), idParams(w.templateId))).status).toBe(404);
    expect((await listing.GET(request("GET", ""), idParams(w.templateId))).status).toBe(404);
  });

  it("shows listings on sale to anyone, with search and filters", async () => {
    h.viewer = null;
    const all = await (await catalogue.GET(request("GET", "/api/store/listings"))).json();
    expect(all.items.map((i: { slug: string }) => i.slug)).toEqual(["store-test-programme"]);
    expect(all.items[0]).toMatchObject({ priceMinor: 2999, currency: "eur", coachName: "Rowan", weeks: 4, daysPerWeek: 2, level: "intermediate" });
    expect(all.tags).toEqual(["4 weeks", "strength"]);
    const hits = async (qs: string) => (await (await catalogue.GET(request("GET", `/api/store/listings?${qs}`))).json()).total;
    expect(await hits("q=STORE")).toBe(1);
    expect(await hits("q=two%20days")).toBe(1);
    expect(await hits("q=zzz")).toBe(0);
    expect(await hits("tag=strength")).toBe(1);
    expect(await hits("tag=cardio")).toBe(0);
    expect(await hits("weeks=1-4")).toBe(1);
    expect(await hits("weeks=5-8")).toBe(0);
    expect(await hits("days=2")).toBe(1);
    expect(await hits("days=3")).toBe(0);
    expect(await hits("level=intermediate")).toBe(1);
    expect(await hits("level=beginner")).toBe(0);
    const wrong = await catalogue.GET(request("GET", "/api/store/listings?days=9"));
    expect(wrong.status).toBe(422);
    expect((await wrong.json()).error.fields.days).toMatch(/1 to 7/);
  });

  it("hides a withdrawn or admin-unlisted listing from visitors but not from its coach", async () => {
    h.viewer = w.coach;
    await listing.PUT(request("PUT", "", { ...good, onSale: false }), idParams(w.templateId));
    expect(await getListingPage(db, "store-test-programme", null)).toBeNull();
    expect((await getListingPage(db, "store-test-programme", w.coach))?.onSale).toBe(false);
    await listing.PUT(request("PUT", "", good), idParams(w.templateId));
    expect((await getListingPage(db, "store-test-programme", null))?.onSale).toBe(true);

    h.viewer = w.coach;
    expect((await adminOne.PATCH(request("PATCH", "", { unlisted: true }), idParams(w.listing.id))).status).toBe(403);
    h.viewer = w.admin;
    const off = await adminOne.PATCH(request("PATCH", "", { unlisted: true, reason: "Description promises results" }), idParams(w.listing.id));
    expect((await off.json()).listing).toMatchObject({ state: "unlisted_by_admin", unlistedReason: "Description promises results" });
    h.viewer = null;
    expect((await (await catalogue.GET(request("GET", "/api/store/listings"))).json()).total).toBe(0);
    // The coach saving again does not undo an admin's decision.
    h.viewer = w.coach;
    expect((await (await listing.PUT(request("PUT", "", good), idParams(w.templateId))).json()).listing.state).toBe("unlisted_by_admin");
    h.viewer = w.admin;
    await adminOne.PATCH(request("PATCH", "", { unlisted: false }), idParams(w.listing.id));
    h.viewer = null;
    expect((await (await catalogue.GET(request("GET", "/api/store/listings"))).json()).total).toBe(1);

    // The template's own "who can see it" setting also takes it out, and the listing says so.
    await updateTemplateMeta(db, w.coach, w.templateId, { visibility: "private" });
    expect((await (await catalogue.GET(request("GET", "/api/store/listings"))).json()).total).toBe(0);
    h.viewer = w.coach;
    expect((await (await listing.GET(request("GET", ""), idParams(w.templateId))).json()).listing.state).toBe("withdrawn");
    await listing.PUT(request("PUT", "", good), idParams(w.templateId));
    h.viewer = null;
    expect((await (await catalogue.GET(request("GET", "/api/store/listings"))).json()).total).toBe(1);
  });

  it("lets a visitor make a self-coached athlete account, once per e-mail", async () => {
    h.viewer = null;
    const res = await account.POST(request("POST", "/api/store/account", { name: "Noor Adeyemi", email: "noor@store.test", password: "long-enough-1" }));
    expect(res.status).toBe(201);
    const user = await db.selectFrom("users").select(["role", "coach_id"]).where("email", "=", "noor@store.test").executeTakeFirstOrThrow();
    expect(user).toEqual({ role: "athlete", coach_id: null });
    const again = await account.POST(request("POST", "/api/store/account", { name: "Noor", email: "NOOR@store.test", password: "long-enough-1" }));
    expect(again.status).toBe(409);
    expect((await again.json()).error.fields.email).toMatch(/Already registered/);
    const short = await account.POST(request("POST", "/api/store/account", { name: "N", email: "x", password: "short" }));
    expect(Object.keys((await short.json()).error.fields).sort()).toEqual(["email", "name", "password"]);
  });

  it("asks who is buying: visitors sign in, coaches cannot buy", async () => {
    h.viewer = null;
    expect((await checkout.POST(request("POST", "", { listingId: w.listing.id, attemptId: randomUUID() }))).status).toBe(401);
    h.viewer = w.coach;
    expect((await checkout.POST(request("POST", "", { listingId: w.listing.id, attemptId: randomUUID() }))).status).toBe(403);
    h.viewer = w.buyer;
    const bad = await checkout.POST(request("POST", "", { listingId: "nope", attemptId: randomUUID() }));
    expect((await bad.json()).error.fields.listingId).toBeDefined();
  });

  it("answers the same checkout page to a repeated attempt, and a new one to a new attempt", async () => {
    h.viewer = w.buyer;
    const attemptId = randomUUID();
    const a = await (await checkout.POST(request("POST", "", { listingId: w.listing.id, attemptId }))).json();
    const b = await (await checkout.POST(request("POST", "", { listingId: w.listing.id, attemptId }))).json();
    expect(b).toEqual(a);
    expect(a.url.startsWith(`${w.fake.url}/pay/cs_test_`)).toBe(true);
    const c = await (await checkout.POST(request("POST", "", { listingId: w.listing.id, attemptId: randomUUID() }))).json();
    expect(c.url).not.toBe(a.url);
    expect(Object.keys(w.fake.state.sessions)).toHaveLength(2);
    // What the provider was asked to charge is the listing's integer price.
    const session = w.fake.state.sessions[new URL(a.url).pathname.split("/").pop()!];
    expect(session).toMatchObject({ amount_total: 2999, currency: "eur", customer_email: "ines@store.test" });
    expect(session.metadata).toMatchObject({ purchase_id: a.purchaseId, buyer_id: w.buyer.id });
  });

  it("after paying: receipt mailed and listed, copy held, assigned to themself, shown to the coach, gone after a refund", async () => {
    h.viewer = w.buyer;
    const { url, purchaseId } = await (await checkout.POST(request("POST", "", { listingId: w.listing.id, attemptId: randomUUID() }))).json();
    await payOnFake(w.fake.url, url);
    await w.fake.idle();
    expect(await counts(db, w.buyer.id)).toMatchObject({ activeEntitlements: 1, copies: 1, paid: 1 });

    const mail = readStoredMessages(w.mailDir).filter((m: { to: string[] }) => m.to.includes("ines@store.test"));
    expect(mail).toHaveLength(1);
    expect(mail[0].subject).toMatch(/^Your receipt: Store test programme \(no\. \d+\)$/);
    expect(mail[0].text).toContain("€29.99");
    expect(mail[0].text).toContain(`${BASE_URL}/store/purchases/${purchaseId}`);

    const mine = (await (await purchases.GET()).json()).purchases;
    expect(mine).toHaveLength(1);
    expect(mine[0]).toMatchObject({ purchaseId, amountMinor: 2999, currency: "eur", status: "paid", sellerName: "Rowan" });
    const one = await (await purchase.GET(request("GET", ""), idParams(purchaseId))).json();
    expect(one.copy.programme.blocks[0].weeks).toBe(4);

    // Buying the same programme again while owning it is refused.
    const twice = await checkout.POST(request("POST", "", { listingId: w.listing.id, attemptId: randomUUID() }));
    expect(twice.status).toBe(409);

    // The buyer enters a max for the copy's lift through the athlete maxes API, as the copy page does.
    const maxes = await import("../../app/api/athletes/[id]/maxes/route");
    const max = await maxes.POST(request("POST", "", { exercise: "back squat", value: 100, unit: "kg", date: new Date().toISOString().slice(0, 10), kind: "1rm" }), idParams(w.buyer.id));
    expect(max.status).toBe(201);

    const started = await start.POST(request("POST", "", { startDate: "2027-01-04", weekdays: [] }), idParams(purchaseId));
    expect(started.status).toBe(201);
    // 4 weeks × 2 days (mon, thu as written).
    expect((await started.json()).sessions).toBe(8);
    const first = await db.selectFrom("training_sessions").select(["date", "plan"]).where("athlete_id", "=", w.buyer.id).orderBy("ordinal").executeTakeFirstOrThrow();
    expect(first.date).toBe("2027-01-04");
    const squat = first.plan.exercises.find((e) => e.name === "back squat")!;
    // @75% of a 100 kg 1RM is 75 kg (percent of 1RM by definition), loadable on a 20 kg bar as 27.5 kg a side.
    expect(squat.sets.filter((x) => x.kind === "work").map((x) => x.load)).toEqual([75, 75, 75]);
    const badDate = await start.POST(request("POST", "", { startDate: "2027-02-30" }), idParams(purchaseId));
    expect((await badDate.json()).error.fields.startDate).toBeDefined();
    h.viewer = w.rival;
    expect((await purchase.GET(request("GET", ""), idParams(purchaseId))).status).toBe(403);

    h.viewer = w.coach;
    const s = await (await sales.GET()).json();
    const row = s.rows.find((r: { id: string }) => r.id === purchaseId);
    expect(row).toMatchObject({ title: "Store test programme", buyerName: "Ines", amountMinor: 2999, currency: "eur", status: "paid" });
    const month = new Date().toISOString().slice(0, 7);
    expect(s.months).toEqual([{ month, currency: "eur", sold: 1, grossMinor: 2999, refundedMinor: 0, netMinor: 2999 }]);
    h.viewer = w.rival;
    expect((await (await sales.GET()).json()).rows).toEqual([]);
    h.viewer = w.buyer;
    expect((await sales.GET()).status).toBe(403);

    h.viewer = w.coach;
    const refund = await import("../../app/api/store/sales/[id]/refund/route");
    expect((await refund.POST(request("POST", ""), idParams(purchaseId))).status).toBe(200);
    await w.fake.idle();
    const totals = (await (await sales.GET()).json()).months;
    expect(totals).toEqual([{ month, currency: "eur", sold: 1, grossMinor: 2999, refundedMinor: 2999, netMinor: 0 }]);
    const assignment = await db.selectFrom("template_assignments").select("status").where("athlete_id", "=", w.buyer.id).executeTakeFirstOrThrow();
    expect(assignment.status).toBe("ended");
    h.viewer = w.buyer;
    const gone = await start.POST(request("POST", "", { startDate: "2027-03-01" }), idParams(purchaseId));
    expect(gone.status).toBe(409);
    expect((await (await purchase.GET(request("GET", ""), idParams(purchaseId))).json()).copy).toBeNull();
  });

  it("seeds one demo listing for a coach, the beginner template when there is one, once", async () => {
    const source = "title: Demo basics\nunits: kg\nday A mon\n  back squat 3x5 @70%\nday B thu\n  deadlift 3x5 @70%\n";
    await createTemplate(db, w.rival, { title: "Demo heavy", tags: ["strength"], source });
    await createTemplate(db, w.rival, { title: "Demo basics", tags: ["beginner"], source });
    const slug = await seedStore(db, w.rival.id);
    expect(slug).toBe("demo-basics");
    expect(await seedStore(db, w.rival.id)).toBe(slug);
    const page = await getListingPage(db, slug!, null);
    expect(page).toMatchObject({ title: "Demo basics", level: "beginner", priceMinor: 2400, currency: "eur", onSale: true, daysPerWeek: 2, weeks: 1 });
  });
});
