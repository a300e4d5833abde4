import { createHash } from "node:crypto";
import { setTimeout as sleep } from "node:timers/promises";
import bcrypt from "bcryptjs";
import type { Kysely } from "kysely";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { readStoredMessages } from "../../scripts/fakes/smtp.mjs";
import type { Database } from "../../db/database";
import { createUser, viewerForSession } from "../../db/users";
import { type Mailbox, startMailbox } from "../support/mailbox";
import { migratedScratchDb } from "../support/people";
import { form } from "../support/requests";

const h = vi.hoisted(() => ({ db: null as unknown as Kysely<Database> }));
vi.mock("@/server/auth", () => ({ getViewer: async () => null, hashPassword: (p: string) => bcrypt.hash(p, 4) }));
vi.mock("@/db/client", async (importOriginal) => ({ ...(await importOriginal<object>()), getDb: () => h.db }));

const resets = await import("../../db/passwordResets");
const { requestResetAction, setNewPasswordAction } = await import("../../app/(auth)/reset/actions");
const { RESET_SENT_MESSAGE } = await import("../../app/(auth)/reset/schema");

const BASE = "http://ironquill.test:3998";
const OLD = "old-password-123";
const NEW = "new-password-456";

const ask = (email: string) => requestResetAction({ sent: false, message: null, fields: {}, email: "" }, form({ email }));
const setPassword = (token: string, password = NEW, confirm = password) =>
  setNewPasswordAction({ ok: false, message: null, fields: {}, email: null, closed: null }, form({ token, password, confirm }));

describe("password reset", () => {
  let scratch: Awaited<ReturnType<typeof migratedScratchDb>>;
  let mailbox: Mailbox;
  let dir: string;
  let mayaId: string;

  const mailsTo = (to: string) => readStoredMessages(dir).filter((m: { to: string[] }) => m.to.includes(to));

  /** The reset mail is sent after the answer (so timing tells nothing): wait for the n-th one to land. */
  async function waitForMail(to: string, n: number): Promise<{ token: string; text: string; subject: string }> {
    for (let i = 0; i < 200 && mailsTo(to).length < n; i++) await sleep(50);
    const mail = mailsTo(to)[n - 1];
    if (!mail) throw new Error(`mail ${n} to ${to} never arrived`);
    const match = /http:\/\/ironquill\.test:3998\/reset\/([A-Za-z0-9_-]+)/.exec(mail.text);
    if (!match) throw new Error(`no reset link in: ${mail.text}`);
    return { token: match[1], text: mail.text, subject: mail.subject };
  }

  async function passwordOf(id: string): Promise<string> {
    return (await scratch.db.selectFrom("users").select("password_hash").where("id", "=", id).executeTakeFirstOrThrow()).password_hash;
  }

  beforeAll(async () => {
    mailbox = await startMailbox("iq-reset-mail-", { SMTP_USER: "", NEXTAUTH_URL: BASE });
    dir = mailbox.dir;
    scratch = await migratedScratchDb();
    h.db = scratch.db;
    mayaId = (await createUser(scratch.db, { email: "maya@larchmere.test", name: "Maya Okonjo", passwordHash: await bcrypt.hash(OLD, 4), role: "athlete" }))!.id;
    await createUser(scratch.db, { email: "many@larchmere.test", name: "Many", passwordHash: "x", role: "coach" });
    const off = await createUser(scratch.db, { email: "off@larchmere.test", name: "Off", passwordHash: "x", role: "athlete" });
    await scratch.db.updateTable("users").set({ disabled_at: new Date() }).where("id", "=", off!.id).execute();
  });
  afterAll(async () => {
    await mailbox?.close();
    await scratch?.drop();
  });

  it("answers the same for an unknown address as for a real one, and mails only the real one", async () => {
    const unknown = await ask("nobody@larchmere.test");
    const disabled = await ask("off@larchmere.test");
    const known = await ask("MAYA@larchmere.test");
    for (const state of [unknown, disabled, known]) {
      expect(state.sent).toBe(true);
      expect(state.message).toBe(RESET_SENT_MESSAGE);
      expect(state.fields).toEqual({});
    }
    const mail = await waitForMail("maya@larchmere.test", 1);
    expect(mail.subject).toBe("Choose a new Ironquill password");
    expect(mail.text).toContain("60 minutes");
    // The real address's mail has arrived; the earlier requests produced nothing at all.
    expect(readStoredMessages(dir)).toHaveLength(1);
    const rows = await scratch.db.selectFrom("password_resets").selectAll().execute();
    expect(rows).toHaveLength(1);
    expect(rows[0].token_hash).toBe(createHash("sha256").update(mail.token).digest("hex"));
    const minutes = (rows[0].expires_at.getTime() - rows[0].created_at.getTime()) / 60_000;
    expect(minutes).toBeGreaterThan(59.9);
    expect(minutes).toBeLessThan(60.1);
  });

  it("refuses a malformed address with a message on the email field", async () => {
    for (const email of ["", "not-an-email", "a@"]) {
      const state = await ask(email);
      expect(state.sent).toBe(false);
      expect(state.fields).toHaveProperty("email");
    }
  });

  it("sets the new password once through the link, then the link is used", async () => {
    const { token } = await waitForMail("maya@larchmere.test", 1);
    expect(await resets.findPasswordReset(scratch.db, token)).toEqual({ status: "valid", email: "maya@larchmere.test" });

    expect((await setPassword(token, "short")).fields).toHaveProperty("password");
    expect((await setPassword(token, NEW, "different-password")).fields).toHaveProperty("confirm");
    expect(await bcrypt.compare(OLD, await passwordOf(mayaId))).toBe(true);

    const done = await setPassword(token);
    expect(done).toMatchObject({ ok: true, email: "maya@larchmere.test" });
    const hash = await passwordOf(mayaId);
    expect(await bcrypt.compare(NEW, hash)).toBe(true);
    expect(await bcrypt.compare(OLD, hash)).toBe(false);

    const again = await setPassword(token, "another-password-789");
    expect(again).toMatchObject({ ok: false, closed: "used" });
    expect(await bcrypt.compare(NEW, await passwordOf(mayaId))).toBe(true);
    expect(await resets.findPasswordReset(scratch.db, token)).toEqual({ status: "used" });
  });

  it("ends sessions signed in before the reset, keeps later ones, and refuses disabled accounts", async () => {
    const changed = (await scratch.db.selectFrom("users").select("credentials_changed_at").where("id", "=", mayaId).executeTakeFirstOrThrow()).credentials_changed_at;
    if (!changed) throw new Error("the reset did not record the change");
    // Signed in just before the new password was set (the previous test): no longer a viewer.
    expect(await viewerForSession(scratch.db, { id: mayaId, signedInAt: changed.getTime() - 1 })).toBeNull();
    expect(await viewerForSession(scratch.db, { id: mayaId, signedInAt: null })).toBeNull();
    // Signed in with the new password afterwards: still fine, with the account's own role and name.
    expect(await viewerForSession(scratch.db, { id: mayaId, signedInAt: Date.now() })).toMatchObject({ id: mayaId, email: "maya@larchmere.test", role: "athlete" });

    const other = await createUser(scratch.db, { email: "theo@larchmere.test", name: "Theo Vance", role: "coach", passwordHash: "x" });
    if (!other) throw new Error("user not created");
    // Never reset: a session from before this was tracked still counts.
    expect(await viewerForSession(scratch.db, { id: other.id, signedInAt: null })).toMatchObject({ role: "coach" });
    await scratch.db.updateTable("users").set({ disabled_at: new Date() }).where("id", "=", other.id).execute();
    expect(await viewerForSession(scratch.db, { id: other.id, signedInAt: Date.now() })).toBeNull();
    expect(await viewerForSession(scratch.db, { id: "not-a-uuid", signedInAt: Date.now() })).toBeNull();
  });

  it("refuses an expired link", async () => {
    await ask("maya@larchmere.test");
    const { token } = await waitForMail("maya@larchmere.test", 2);
    await scratch.db.updateTable("password_resets").set({ expires_at: new Date(Date.now() - 1000) }).where("token_hash", "=", createHash("sha256").update(token).digest("hex")).execute();
    expect(await resets.findPasswordReset(scratch.db, token)).toEqual({ status: "expired" });
    expect(await setPassword(token)).toMatchObject({ ok: false, closed: "expired" });
  });

  it("retires an earlier link when a newer one is asked for", async () => {
    await ask("maya@larchmere.test");
    const older = await waitForMail("maya@larchmere.test", 3);
    await ask("maya@larchmere.test");
    const newer = await waitForMail("maya@larchmere.test", 4);
    expect((await resets.findPasswordReset(scratch.db, older.token)).status).toBe("expired");
    expect((await resets.findPasswordReset(scratch.db, newer.token)).status).toBe("valid");
    expect(await setPassword(older.token)).toMatchObject({ ok: false, closed: "expired" });
    expect(await setPassword(newer.token, "third-password-000")).toMatchObject({ ok: true });
  });

  it("answers unknown for a made-up or malformed link", async () => {
    expect(await resets.findPasswordReset(scratch.db, "A".repeat(43))).toEqual({ status: "unknown" });
    expect(await resets.findPasswordReset(scratch.db, "../../x")).toEqual({ status: "unknown" });
    expect(await setPassword("A".repeat(43))).toMatchObject({ ok: false, closed: "unknown" });
  });

  it("stops issuing links after five in an hour, still answering the same", async () => {
    for (let i = 0; i < 7; i++) expect((await ask("many@larchmere.test")).message).toBe(RESET_SENT_MESSAGE);
    await waitForMail("many@larchmere.test", 5);
    const rows = await scratch.db
      .selectFrom("password_resets as r")
      .innerJoin("users as u", "u.id", "r.user_id")
      .select("r.token_hash")
      .where("u.email", "=", "many@larchmere.test")
      .execute();
    expect(rows).toHaveLength(5);
  });
});
