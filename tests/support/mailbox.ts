/**
 * Mail for integration tests: the fake SMTP server on a free port keeping
 * messages in a fresh folder, and the app's SMTP settings pointed at it.
 */
import { mkdtempSync, rmSync } from "node:fs";
import { createServer } from "node:net";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { startSmtpFake } from "../../scripts/fakes/smtp.mjs";

/** Sets environment variables; the returned function puts the earlier values back. */
export function setEnv(values: Record<string, string>): () => void {
  const before = Object.fromEntries(Object.keys(values).map((k) => [k, process.env[k]]));
  Object.assign(process.env, values);
  return () => {
    for (const [k, v] of Object.entries(before)) {
      if (v === undefined) delete process.env[k];
      else process.env[k] = v;
    }
  };
}

/** A port nothing listens on: taken from the OS, then given back. */
export function freePort(): Promise<number> {
  return new Promise((ok) => {
    const s = createServer().listen(0, "127.0.0.1", () => {
      const port = (s.address() as { port: number }).port;
      s.close(() => ok(port));
    });
  });
}

export type Mailbox = { dir: string; port: number; close(): Promise<void> };

/**
 * Starts the fake and sets SMTP_HOST, SMTP_PORT, SMTP_SECURE and MAIL_FROM for
 * it, plus `env` (given the folder when it is a function). `close()` stops the
 * fake, puts the variables back and removes the folder.
 *
 * @example
 * const mailbox = await startMailbox("iq-invite-mail-", { NEXTAUTH_URL: BASE });
 * readStoredMessages(mailbox.dir);
 */
export async function startMailbox(prefix: string, env: Record<string, string> | ((dir: string) => Record<string, string>) = {}): Promise<Mailbox> {
  const dir = mkdtempSync(join(tmpdir(), prefix));
  const fake = await startSmtpFake({ port: 0, dir });
  const restore = setEnv({
    SMTP_HOST: "127.0.0.1",
    SMTP_PORT: String(fake.port),
    SMTP_SECURE: "false",
    MAIL_FROM: "Ironquill <no-reply@ironquill.test>",
    ...(typeof env === "function" ? env(dir) : env),
  });
  return {
    dir,
    port: fake.port,
    async close() {
      await fake.close();
      restore();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}
