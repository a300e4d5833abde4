import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { startFakes } from "../../scripts/fakes.mjs";
import { readStoredMessages, startSmtpFake } from "../../scripts/fakes/smtp.mjs";
import { mailConfig, publicBaseUrl } from "../../server/mail/config";
import { escapeHtml, formatExpiry, invitationMessage, passwordResetMessage } from "../../server/mail/messages";
import { freePort, type Mailbox, setEnv, startMailbox } from "../support/mailbox";

const h = vi.hoisted(() => ({ viewer: null as null | { id: string; name: string; email: string; role: "admin" | "coach" | "athlete" } }));
vi.mock("@/server/auth", () => ({ getViewer: async () => h.viewer }));

const { sendMail } = await import("../../server/mail/send");
const mailbox = await import("../../server/mailbox");
const attachmentRoute = await import("../../app/(admin)/admin/mailbox/[id]/[n]/route");

const BASE = "https://coach.example.test/";
const EXPIRES = new Date("2027-03-12T10:05:00Z");

describe("message builders", () => {
  const invite = invitationMessage({ to: "tomas@larchmere.test", athleteName: "Tomas", coachName: "Rowan Hale", baseUrl: BASE, token: "tok_123-abc", expiresAt: EXPIRES, resend: false, days: 7 });

  it("puts the invitation link under the public address, in both text and HTML", () => {
    expect(invite.text).toContain("https://coach.example.test/invite/tok_123-abc");
    expect(invite.html).toContain('href="https://coach.example.test/invite/tok_123-abc"');
    expect(invite.to).toBe("tomas@larchmere.test");
  });

  it("names the coach, the seven days and the exact moment the link runs out", () => {
    expect(invite.subject).toBe("Rowan Hale invited you to train on Ironquill");
    expect(invite.text).toContain("Hi Tomas,");
    expect(invite.text).toContain("7 days");
    expect(invite.text).toContain("12 March 2027 at 10:05 UTC");
  });

  it("tells a resent invitation apart and says the earlier link is dead", () => {
    const again = invitationMessage({ to: "t@x.test", athleteName: null, coachName: "Rowan Hale", baseUrl: BASE, token: "t2", expiresAt: EXPIRES, resend: true, days: 7 });
    expect(again.subject).toBe("A fresh invitation from Rowan Hale");
    expect(again.text).toContain("Hello,");
    expect(again.text).toContain("no longer works");
  });

  it("keeps a base address with a path (an app served under /app)", () => {
    const m = passwordResetMessage({ to: "a@x.test", name: "A", baseUrl: "https://example.test/app", token: "r1", minutes: 60 });
    expect(m.text).toContain("https://example.test/app/reset/r1");
    expect(m.text).toContain("60 minutes");
    expect(m.subject).toBe("Choose a new Ironquill password");
  });

  it("escapes names in the HTML so a coach's name cannot inject markup", () => {
    const m = invitationMessage({ to: "t@x.test", athleteName: "<b>Tom</b>", coachName: 'Rowan "<script>"', baseUrl: BASE, token: "t", expiresAt: EXPIRES, resend: false, days: 7 });
    expect(m.html).not.toContain("<script>");
    expect(m.html).toContain("&lt;script&gt;");
    expect(m.html).toContain("&lt;b&gt;Tom&lt;/b&gt;");
    // HTML 5 named character references for the five special characters.
    expect(escapeHtml(`&<>"'`)).toBe("&amp;&lt;&gt;&quot;&#39;");
  });

  it("writes expiry times in UTC whatever the server's zone", () => {
    expect(formatExpiry(new Date("2027-12-31T23:59:00Z"))).toBe("31 December 2027 at 23:59 UTC");
  });
});

describe("mail settings", () => {
  it("reads host, port, TLS, login and sender from the environment", () => {
    expect(mailConfig({ SMTP_HOST: "smtp.example.test", SMTP_PORT: "2525", SMTP_USER: "u", SMTP_PASS: "p", MAIL_FROM: "Ironquill <n@x.test>" })).toEqual({
      host: "smtp.example.test",
      port: 2525,
      secure: false,
      auth: { user: "u", pass: "p" },
      from: "Ironquill <n@x.test>",
    });
  });

  it("defaults the port to 465 with implicit TLS and 587 otherwise", () => {
    // RFC 8314 §3.3 (port 465, implicit TLS for submission); RFC 6409 §3.1 (port 587, submission).
    expect(mailConfig({ SMTP_HOST: "h", SMTP_SECURE: "true", MAIL_FROM: "f@x.test" }).port).toBe(465);
    expect(mailConfig({ SMTP_HOST: "h", MAIL_FROM: "f@x.test" }).port).toBe(587);
  });

  it("refuses a missing host, a bad port and a missing sender or base address", () => {
    expect(() => mailConfig({ MAIL_FROM: "f@x.test" })).toThrow(/SMTP_HOST/);
    expect(() => mailConfig({ SMTP_HOST: "h", SMTP_PORT: "70000", MAIL_FROM: "f@x.test" })).toThrow(/SMTP_PORT/);
    expect(() => mailConfig({ SMTP_HOST: "h" })).toThrow(/MAIL_FROM/);
    expect(() => publicBaseUrl({})).toThrow(/NEXTAUTH_URL/);
    expect(() => publicBaseUrl({ NEXTAUTH_URL: "not a url" })).toThrow(/NEXTAUTH_URL/);
  });
});

describe("sending through the local fake SMTP server", () => {
  let dir: string;
  let smtp: Mailbox;

  beforeAll(async () => {
    smtp = await startMailbox("iq-mail-", (folder) => ({ SMTP_USER: "anyone", SMTP_PASS: "anything", IQ_MAILBOX_DIR: folder }));
    dir = smtp.dir;
  });
  afterAll(async () => {
    await smtp?.close();
  });

  const pdf = Buffer.from("%PDF-1.4\n1 0 obj <<>> endobj\n%%EOF\n");

  it("stores a message with its text, HTML, recipient and attachment bytes", async () => {
    await sendMail({ to: "maya@larchmere.test", subject: "Your card", text: "See the card.", html: "<p>See the card.</p>", attachments: [{ filename: "card.pdf", content: pdf, contentType: "application/pdf" }] });
    const [m] = readStoredMessages(dir).filter((x: { subject: string }) => x.subject === "Your card");
    expect(m.to).toEqual(["maya@larchmere.test"]);
    expect(m.from).toContain("no-reply@ironquill.test");
    expect(m.text.trim()).toBe("See the card.");
    expect(m.html).toContain("<p>See the card.</p>");
    expect(m.attachments).toEqual([{ filename: "card.pdf", contentType: "application/pdf", size: pdf.length, file: `${m.id}.1.bin` }]);

    const listed = await mailbox.listMessages();
    expect(listed?.[0]?.id).toBe(m.id);
    const file = await mailbox.readAttachment(m.id, 1);
    expect(file?.content.equals(pdf)).toBe(true);
    expect(file?.filename).toBe("card.pdf");
  });

  it("lists the newest message first", async () => {
    await sendMail({ to: "a@x.test", subject: "first", text: "1" });
    await sendMail({ to: "a@x.test", subject: "second", text: "2" });
    const listed = (await mailbox.listMessages())!.map((m) => m.subject);
    expect(listed.indexOf("second")).toBeLessThan(listed.indexOf("first"));
  });

  it("keeps a non-ASCII subject and body intact through encoding and parsing", async () => {
    // nodemailer encodes the subject as RFC 2047 words and the body as quoted-printable; the fake decodes both.
    await sendMail({ to: "lena@larchmere.test", subject: "Größe ✓ — plates", text: "Ünïcode body" });
    const m = readStoredMessages(dir).find((x: { to: string[] }) => x.to.includes("lena@larchmere.test"));
    expect(m.subject).toBe("Größe ✓ — plates");
    expect(m.text.trim()).toBe("Ünïcode body");
  });

  it("never reads outside the mailbox folder, whatever id it is given", async () => {
    for (const id of ["../../etc/passwd", "m1-../../x", "..", "", "m1796167038571-96c1c8b4/../x"]) {
      expect(await mailbox.readMessage(id)).toBeNull();
      expect(await mailbox.readAttachment(id, 1)).toBeNull();
    }
    const [m] = readStoredMessages(dir);
    expect(await mailbox.readAttachment(m.id, 0)).toBeNull();
    expect(await mailbox.readAttachment(m.id, 99)).toBeNull();
  });

  it("answers unavailable, not a crash, when nothing listens on the SMTP port", async () => {
    const port = await freePort();
    process.env.SMTP_PORT = String(port);
    try {
      await expect(sendMail({ to: "a@x.test", subject: "lost", text: "x" })).rejects.toMatchObject({ code: "unavailable" });
    } finally {
      process.env.SMTP_PORT = String(smtp.port);
    }
  });

  it("serves an attachment to an admin only, always as a download", async () => {
    const [m] = readStoredMessages(dir).filter((x: { subject: string }) => x.subject === "Your card");
    const ctx = (id: string, n: string) => ({ params: Promise.resolve({ id, n }) });
    h.viewer = { id: "a", name: "Pat", email: "admin@x.test", role: "admin" };
    const res = await attachmentRoute.GET(new Request("http://x/"), ctx(m.id, "1"));
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    expect(res.headers.get("content-disposition")).toMatch(/^attachment; filename="card.pdf"/);
    expect(Buffer.from(await res.arrayBuffer()).equals(pdf)).toBe(true);

    const missing = await attachmentRoute.GET(new Request("http://x/"), ctx(m.id, "7"));
    expect(missing.status).toBe(404);
    const bad = await attachmentRoute.GET(new Request("http://x/"), ctx("../secret", "1"));
    expect(bad.status).toBe(422);
    expect((await bad.json()).error.fields).toHaveProperty("id");

    h.viewer = { id: "c", name: "Rowan", email: "coach@x.test", role: "coach" };
    expect((await attachmentRoute.GET(new Request("http://x/"), ctx(m.id, "1"))).status).toBe(403);
    h.viewer = null;
    expect((await attachmentRoute.GET(new Request("http://x/"), ctx(m.id, "1"))).status).toBe(401);
  });

  it("has no local mailbox when IQ_MAILBOX_DIR is unset (mail goes to the real provider)", async () => {
    expect(mailbox.mailboxDir({})).toBeNull();
    expect(await mailbox.listMessages(10, null)).toBeNull();
  });
});

describe("the fakes runner", () => {
  it("starts the fake SMTP server as a child process, waits for its port, and stops it", async () => {
    const dir = mkdtempSync(join(tmpdir(), "iq-fakes-"));
    const port = await freePort();
    const mail = { SMTP_HOST: "127.0.0.1", SMTP_PORT: String(port), SMTP_SECURE: "false", SMTP_USER: "", MAIL_FROM: "Ironquill <no-reply@ironquill.test>", IQ_MAILBOX_DIR: dir };
    // Only the mail fake here: the test run's own payment fake already holds its port.
    const env = { ...process.env, ...mail, STRIPE_API_HOST: "" };
    const fakes = await startFakes(env);
    let restore = setEnv(mail);
    try {
      await sendMail({ to: "child@x.test", subject: "through the child", text: "ok" });
      expect(readStoredMessages(dir).map((m: { subject: string }) => m.subject)).toEqual(["through the child"]);
    } finally {
      restore();
      await fakes.stop();
      rmSync(dir, { recursive: true, force: true });
    }
    // Once stopped, the port no longer takes mail.
    restore = setEnv({ SMTP_HOST: "127.0.0.1", SMTP_PORT: String(port), MAIL_FROM: "x@x.test" });
    try {
      await expect(sendMail({ to: "a@x.test", subject: "after stop", text: "x" })).rejects.toMatchObject({ code: "unavailable" });
    } finally {
      restore();
    }
  });

  it("reports a port already in use instead of hanging", async () => {
    const dir = mkdtempSync(join(tmpdir(), "iq-fakes-"));
    const blocker = await startSmtpFake({ port: 0, dir });
    try {
      await expect(startFakes({ ...process.env, SMTP_HOST: "127.0.0.1", SMTP_PORT: String(blocker.port), IQ_MAILBOX_DIR: dir, STRIPE_API_HOST: "" })).rejects.toThrow(/stopped while starting/);
    } finally {
      await blocker.close();
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
