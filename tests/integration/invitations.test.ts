import { createHash } from "node:crypto";
import bcrypt from "bcryptjs";
import type { Kysely } from "kysely";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { readStoredMessages } from "../../scripts/fakes/smtp.mjs";
import type { Database } from "../../db/database";
import { createUser } from "../../db/users";
import { freePort, type Mailbox, startMailbox } from "../support/mailbox";
import { addPerson, migratedScratchDb, type Person } from "../support/people";
import { form, idParams, request } from "../support/requests";

const h = vi.hoisted(() => ({ db: null as unknown as Kysely<Database>, viewer: null as null | Person }));
vi.mock("@/server/auth", () => ({
  getViewer: async () => h.viewer,
  // Fewer rounds than the app's 10 keep the test quick; the hash is still real bcrypt.
  hashPassword: (p: string) => bcrypt.hash(p, 4),
}));
vi.mock("@/db/client", async (importOriginal) => ({ ...(await importOriginal<object>()), getDb: () => h.db }));

const inv = await import("../../db/invitations");
const list = await import("../../app/api/invitations/route");
const one = await import("../../app/api/invitations/[id]/route");
const resend = await import("../../app/api/invitations/[id]/resend/route");
const { acceptInvitationAction } = await import("../../app/(auth)/invite/[token]/actions");

const BASE = "http://ironquill.test:3999";
const PASSWORD = "chalk-and-iron-42";

const req = (method: string, url: string, body?: unknown) => request(method, url, body, BASE);
const blank = { ok: false, message: null, fields: {}, values: { name: "" }, email: null, closed: null };
const acceptNew = (token: string, over: Record<string, string> = {}) =>
  acceptInvitationAction(blank, form({ token, mode: "new", name: "Ada Stone", password: PASSWORD, confirm: PASSWORD, ...over }));
const acceptExisting = (token: string, password: string) => acceptInvitationAction(blank, form({ token, mode: "existing", password }));

describe("invitations", () => {
  let scratch: Awaited<ReturnType<typeof migratedScratchDb>>;
  let mailbox: Mailbox;
  let dir: string;
  let coach: Person;
  let other: Person;
  let veteran: { id: string; email: string };

  /** The token in the newest e-mail to `to`, read from the link in its text. */
  function tokenMailedTo(to: string): { token: string; text: string; subject: string; count: number } {
    const mails = readStoredMessages(dir).filter((m: { to: string[] }) => m.to.includes(to));
    const last = mails.at(-1);
    if (!last) throw new Error(`no mail to ${to}`);
    const match = /(http:\/\/ironquill\.test:3999\/invite\/([A-Za-z0-9_-]+))/.exec(last.text);
    if (!match) throw new Error(`no invitation link in: ${last.text}`);
    return { token: match[2], text: last.text, subject: last.subject, count: mails.length };
  }

  async function invite(email: string, name?: string, as: Person = coach) {
    h.viewer = as;
    const res = await list.POST(req("POST", "/api/invitations", { email, name }));
    return { status: res.status, body: await res.json() };
  }

  beforeAll(async () => {
    mailbox = await startMailbox("iq-invite-mail-", { SMTP_USER: "", NEXTAUTH_URL: BASE });
    dir = mailbox.dir;
    scratch = await migratedScratchDb();
    h.db = scratch.db;
    coach = await addPerson(scratch.db, "rowan@larchmere.test", "Rowan Hale", "coach");
    other = await addPerson(scratch.db, "sky@other.test", "Sky Marr", "coach");
    const v = await createUser(scratch.db, { email: "Lena@Larchmere.test", name: "Lena Fisk", passwordHash: await bcrypt.hash(PASSWORD, 4), role: "athlete" });
    veteran = { id: v!.id, email: "Lena@Larchmere.test" };
  });
  afterAll(async () => {
    await mailbox?.close();
    await scratch?.drop();
  });

  it("hashes tokens with SHA-256", () => {
    // FIPS 180-2, Appendix B.1: SHA-256("abc").
    expect(inv.hashSecretToken("abc")).toBe("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
    // 32 random bytes in base64url (RFC 4648 §5) are 43 characters without padding.
    expect(inv.newSecretToken()).toMatch(/^[A-Za-z0-9_-]{43}$/);
  });

  it("answers 401 without a session and 403 for an athlete", async () => {
    h.viewer = null;
    expect((await list.GET()).status).toBe(401);
    h.viewer = { id: veteran.id, name: "Lena", email: veteran.email, role: "athlete" };
    const res = await list.POST(req("POST", "/api/invitations", { email: "x@y.test" }));
    expect(res.status).toBe(403);
    expect((await res.json()).error.code).toBe("forbidden");
  });

  it("refuses a bad e-mail, a long name and malformed JSON with invalid_input naming the field", async () => {
    for (const email of ["not-an-email", "", "a@", 42]) {
      const { status, body } = await invite(email as string);
      expect(status).toBe(422);
      expect(body.error.code).toBe("invalid_input");
      expect(body.error.fields).toHaveProperty("email");
    }
    const long = await invite("ok@x.test", "n".repeat(121));
    expect(long.status).toBe(422);
    expect(long.body.error.fields).toHaveProperty("name");
    h.viewer = coach;
    const bad = await list.POST(req("POST", "/api/invitations", "{ not json"));
    expect(bad.status).toBe(422);
    expect((await bad.json()).error.code).toBe("invalid_input");
    expect(readStoredMessages(dir)).toHaveLength(0);
  });

  it("runs the whole life of an invitation: mail with the link, accept once, athlete on the roster", async () => {
    const created = await invite("ada@larchmere.test", "Ada");
    expect(created.status).toBe(201);
    expect(created.body.invitation).toMatchObject({ email: "ada@larchmere.test", name: "Ada", state: "pending" });

    const mail = tokenMailedTo("ada@larchmere.test");
    expect(mail.subject).toBe("Rowan Hale invited you to train on Ironquill");
    expect(mail.text).toContain("7 days");
    // Only the hash is stored, never the token itself.
    const row = await scratch.db.selectFrom("invitations").selectAll().where("id", "=", created.body.invitation.id).executeTakeFirstOrThrow();
    expect(row.token_hash).toBe(createHash("sha256").update(mail.token).digest("hex"));
    expect(JSON.stringify(row)).not.toContain(mail.token);
    const days = (row.expires_at.getTime() - row.created_at.getTime()) / 86_400_000;
    expect(days).toBeGreaterThan(6.99);
    expect(days).toBeLessThan(7.01);

    const page = await inv.findInvitationByToken(scratch.db, mail.token);
    expect(page).toMatchObject({ status: "pending", coachName: "Rowan Hale", email: "ada@larchmere.test", account: "none" });

    // Form problems come back per field and use nothing up.
    expect((await acceptNew(mail.token, { password: "short", confirm: "short" })).fields).toHaveProperty("password");
    expect((await acceptNew(mail.token, { confirm: "something-else-entirely" })).fields).toHaveProperty("confirm");
    expect((await acceptNew(mail.token, { name: " " })).fields).toHaveProperty("name");

    const accepted = await acceptNew(mail.token);
    expect(accepted).toMatchObject({ ok: true, email: "ada@larchmere.test" });
    const user = await scratch.db.selectFrom("users").selectAll().where("email", "=", "ada@larchmere.test").executeTakeFirstOrThrow();
    expect(user).toMatchObject({ role: "athlete", coach_id: coach.id, name: "Ada Stone" });
    expect(await bcrypt.compare(PASSWORD, user.password_hash)).toBe(true);

    const again = await acceptNew(mail.token, { name: "Someone Else" });
    expect(again).toMatchObject({ ok: false, closed: "accepted" });
    expect(again.message).toMatch(/already been used/);
    expect(await inv.findInvitationByToken(scratch.db, mail.token)).toEqual({ status: "accepted", coachName: "Rowan Hale" });

    h.viewer = coach;
    const listed = await (await list.GET()).json();
    expect(listed.invitations.find((i: { email: string }) => i.email === "ada@larchmere.test").state).toBe("accepted");
    // Accepted: nothing left to resend or revoke.
    expect((await resend.POST(req("POST", "/x"), idParams(created.body.invitation.id))).status).toBe(409);
    expect((await one.DELETE(req("DELETE", "/x"), idParams(created.body.invitation.id))).status).toBe(409);
    // And inviting them again is refused: they are on the roster.
    const dup = await invite("ADA@larchmere.test");
    expect(dup.status).toBe(409);
    expect(dup.body.error.fields).toHaveProperty("email");
  });

  it("lets only one of two simultaneous acceptances through", async () => {
    await invite("twice@larchmere.test");
    const { token } = tokenMailedTo("twice@larchmere.test");
    const results = await Promise.allSettled([
      inv.acceptInvitation(scratch.db, token, { kind: "new", name: "One", passwordHash: "h1" }),
      inv.acceptInvitation(scratch.db, token, { kind: "new", name: "Two", passwordHash: "h2" }),
    ]);
    expect(results.filter((r) => r.status === "fulfilled")).toHaveLength(1);
    const refused = results.find((r) => r.status === "rejected") as PromiseRejectedResult;
    expect(refused.reason).toBeInstanceOf(inv.LinkClosedError);
    const users = await scratch.db.selectFrom("users").select("id").where("email", "=", "twice@larchmere.test").execute();
    expect(users).toHaveLength(1);
  });

  it("refuses an expired link, and a resend brings it back with a new token and a new week", async () => {
    const created = await invite("late@larchmere.test");
    const first = tokenMailedTo("late@larchmere.test");
    await scratch.db.updateTable("invitations").set({ expires_at: new Date(Date.now() - 60_000) }).where("id", "=", created.body.invitation.id).execute();
    expect((await inv.findInvitationByToken(scratch.db, first.token)).status).toBe("expired");
    expect(await acceptNew(first.token)).toMatchObject({ ok: false, closed: "expired" });
    h.viewer = coach;
    expect((await (await list.GET()).json()).invitations.find((i: { email: string }) => i.email === "late@larchmere.test").state).toBe("expired");

    const res = await resend.POST(req("POST", "/x"), idParams(created.body.invitation.id));
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.invitation.state).toBe("pending");
    expect(new Date(body.invitation.expiresAt).getTime()).toBeGreaterThan(Date.now() + 6.99 * 86_400_000);

    const second = tokenMailedTo("late@larchmere.test");
    expect(second.count).toBe(2);
    expect(second.token).not.toBe(first.token);
    expect(second.subject).toBe("A fresh invitation from Rowan Hale");
    // The old link is dead for good: its hash is gone.
    expect(await inv.findInvitationByToken(scratch.db, first.token)).toEqual({ status: "unknown" });
    expect(await acceptNew(first.token)).toMatchObject({ ok: false, closed: "unknown" });
    expect(await acceptNew(second.token)).toMatchObject({ ok: true });
  });

  it("kills the old token when a pending invitation is resent", async () => {
    const created = await invite("resend@larchmere.test");
    const first = tokenMailedTo("resend@larchmere.test");
    h.viewer = coach;
    expect((await resend.POST(req("POST", "/x"), idParams(created.body.invitation.id))).status).toBe(200);
    const second = tokenMailedTo("resend@larchmere.test");
    expect(await acceptNew(first.token)).toMatchObject({ ok: false, closed: "unknown" });
    expect((await inv.findInvitationByToken(scratch.db, second.token)).status).toBe("pending");
  });

  it("refuses a revoked link, and revoked invitations cannot be resent", async () => {
    const created = await invite("gone@larchmere.test");
    const { token } = tokenMailedTo("gone@larchmere.test");
    h.viewer = coach;
    const res = await one.DELETE(req("DELETE", "/x"), idParams(created.body.invitation.id));
    expect(res.status).toBe(200);
    expect((await res.json()).invitation.state).toBe("revoked");
    expect(await inv.findInvitationByToken(scratch.db, token)).toEqual({ status: "revoked", coachName: "Rowan Hale" });
    expect(await acceptNew(token)).toMatchObject({ ok: false, closed: "revoked" });
    expect((await resend.POST(req("POST", "/x"), idParams(created.body.invitation.id))).status).toBe(409);
    // Revoking twice is harmless.
    expect((await one.DELETE(req("DELETE", "/x"), idParams(created.body.invitation.id))).status).toBe(200);
    // A revoked invitation does not block a new one to the same address.
    expect((await invite("gone@larchmere.test")).status).toBe(201);
  });

  it("refuses a second open invitation to the same address", async () => {
    expect((await invite("dup@larchmere.test")).status).toBe(201);
    const dup = await invite("Dup@Larchmere.test ");
    expect(dup.status).toBe(409);
    expect(dup.body.error.code).toBe("conflict");
    expect(dup.body.error.fields).toHaveProperty("email");
  });

  it("does not let another coach see, resend or revoke an invitation", async () => {
    const created = await invite("mine@larchmere.test");
    h.viewer = other;
    const r1 = await resend.POST(req("POST", "/x"), idParams(created.body.invitation.id));
    expect(r1.status).toBe(404);
    expect((await r1.json()).error.code).toBe("not_found");
    const r2 = await one.DELETE(req("DELETE", "/x"), idParams(created.body.invitation.id));
    expect(r2.status).toBe(404);
    expect((await r2.json()).error.code).toBe("not_found");
    expect((await (await list.GET()).json()).invitations).toEqual([]);
    // Not an id at all: also simply not found.
    expect((await one.DELETE(req("DELETE", "/x"), idParams("../../etc"))).status).toBe(404);
    expect((await inv.findInvitationByToken(scratch.db, tokenMailedTo("mine@larchmere.test").token)).status).toBe("pending");
  });

  it("links an existing athlete account after checking its password", async () => {
    await invite("lena@larchmere.test", "Lena");
    const { token } = tokenMailedTo("lena@larchmere.test");
    expect(await inv.findInvitationByToken(scratch.db, token)).toMatchObject({ status: "pending", account: "athlete" });

    const wrong = await acceptExisting(token, "not-her-password");
    expect(wrong.ok).toBe(false);
    expect(wrong.fields).toHaveProperty("password");
    expect((await inv.findInvitationByToken(scratch.db, token)).status).toBe("pending");
    // Creating a second account for the same address is refused too.
    expect((await acceptNew(token)).ok).toBe(false);

    const linked = await acceptExisting(token, PASSWORD);
    expect(linked).toMatchObject({ ok: true, email: veteran.email });
    const user = await scratch.db.selectFrom("users").select(["coach_id", "role"]).where("id", "=", veteran.id).executeTakeFirstOrThrow();
    expect(user).toEqual({ coach_id: coach.id, role: "athlete" });
    const accounts = await scratch.db.selectFrom("users").select("id").where((eb) => eb(eb.fn("lower", ["email"]), "=", "lena@larchmere.test")).execute();
    expect(accounts).toHaveLength(1);
  });

  it("refuses to turn a coach's address into an athlete", async () => {
    await invite("sky@other.test");
    const { token } = tokenMailedTo("sky@other.test");
    expect(await inv.findInvitationByToken(scratch.db, token)).toMatchObject({ status: "pending", account: "staff" });
    const res = await acceptNew(token);
    expect(res.ok).toBe(false);
    expect(res.message).toMatch(/coach or admin account/);
    const sky = await scratch.db.selectFrom("users").select(["role", "coach_id"]).where("id", "=", other.id).executeTakeFirstOrThrow();
    expect(sky).toEqual({ role: "coach", coach_id: null });
    expect((await inv.findInvitationByToken(scratch.db, token)).status).toBe("pending");
  });

  it("answers unknown for a made-up or malformed link", async () => {
    expect(await inv.findInvitationByToken(scratch.db, inv.newSecretToken())).toEqual({ status: "unknown" });
    expect(await inv.findInvitationByToken(scratch.db, "../../etc/passwd")).toEqual({ status: "unknown" });
    expect(await acceptNew("x")).toMatchObject({ ok: false, closed: "unknown" });
  });

  it("stores nothing when the invitation e-mail cannot be sent", async () => {
    process.env.SMTP_PORT = String(await freePort());
    try {
      const { status, body } = await invite("unsent@larchmere.test");
      expect(status).toBe(503);
      expect(body.error.code).toBe("unavailable");
    } finally {
      process.env.SMTP_PORT = String(mailbox.port);
    }
    const rows = await scratch.db.selectFrom("invitations").select("id").where("email", "=", "unsent@larchmere.test").execute();
    expect(rows).toEqual([]);
  });
});
