/**
 * Mail settings read from the environment. Locally the start and test
 * commands point them at the fake SMTP server; in production they name the
 * provider's SMTP relay (see DEVELOPERS.md, "Mail").
 *
 * @example
 * mailConfig({ SMTP_HOST: "127.0.0.1", SMTP_PORT: "2525", MAIL_FROM: "Ironquill <no-reply@ironquill.test>" });
 * // { host: "127.0.0.1", port: 2525, secure: false, auth: null, from: "Ironquill <no-reply@ironquill.test>" }
 */
export type MailConfig = {
  host: string;
  port: number;
  /** TLS from the first byte (port 465). Otherwise the connection upgrades with STARTTLS when the server offers it. */
  secure: boolean;
  auth: { user: string; pass: string } | null;
  from: string;
};

export class MailConfigError extends Error {}

type Env = Record<string, string | undefined>;

export function mailConfig(env: Env = process.env): MailConfig {
  const host = env.SMTP_HOST?.trim();
  if (!host) throw new MailConfigError("SMTP_HOST is not set");
  const secure = /^(1|true|yes)$/i.test(env.SMTP_SECURE?.trim() ?? "");
  const port = env.SMTP_PORT?.trim() ? Number(env.SMTP_PORT) : secure ? 465 : 587;
  if (!Number.isInteger(port) || port < 1 || port > 65535) throw new MailConfigError(`SMTP_PORT is not a port number: ${env.SMTP_PORT}`);
  const user = env.SMTP_USER?.trim() ?? "";
  const from = env.MAIL_FROM?.trim();
  if (!from) throw new MailConfigError("MAIL_FROM is not set");
  return { host, port, secure, auth: user ? { user, pass: env.SMTP_PASS ?? "" } : null, from };
}

/** The public address links in e-mails start with (NEXTAUTH_URL, which sign-in needs anyway). */
export function publicBaseUrl(env: Env = process.env): string {
  const raw = env.NEXTAUTH_URL?.trim();
  if (!raw) throw new MailConfigError("NEXTAUTH_URL is not set, so e-mails cannot carry links");
  try {
    return new URL(raw).toString();
  } catch {
    throw new MailConfigError(`NEXTAUTH_URL is not a URL: ${raw}`);
  }
}
