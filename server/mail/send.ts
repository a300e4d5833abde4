import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { AppError } from "../errors";
import { type MailConfig, MailConfigError, mailConfig } from "./config";

export type Attachment = { filename: string; content: Buffer; contentType: string };
export type MailInput = { to: string; subject: string; text: string; html?: string; attachments?: Attachment[] };

let cached: { key: string; transport: Transporter } | null = null;

// One transport per configuration, rebuilt only if the settings change (tests move the port). Not pooled:
// mail is occasional, and a connection per message never goes stale between sends.
function transportFor(config: MailConfig): Transporter {
  const key = JSON.stringify(config);
  if (cached?.key === key) return cached.transport;
  cached?.transport.close();
  const transport = nodemailer.createTransport({
    host: config.host,
    port: config.port,
    secure: config.secure,
    auth: config.auth ?? undefined,
    // A provider that stops answering must not hold a request for minutes.
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 20_000,
  });
  cached = { key, transport };
  return transport;
}

function unavailable(): AppError {
  return new AppError("unavailable", "We couldn't send the e-mail just now. Nothing was sent or saved; please try again in a minute.");
}

/**
 * Sends one message through the configured SMTP server. Failures become an
 * `unavailable` AppError (the cause is logged, never shown).
 */
export async function sendMail(input: MailInput): Promise<{ messageId: string }> {
  let config: MailConfig;
  try {
    config = mailConfig();
  } catch (err) {
    if (err instanceof MailConfigError) console.error(`[ironquill] mail is not set up: ${err.message}`);
    throw unavailable();
  }
  try {
    const info = await transportFor(config).sendMail({
      from: config.from,
      to: input.to,
      subject: input.subject,
      text: input.text,
      html: input.html,
      attachments: input.attachments?.map((a) => ({ filename: a.filename, content: a.content, contentType: a.contentType })),
    });
    return { messageId: info.messageId };
  } catch (err) {
    console.error("[ironquill] sending mail failed:", err instanceof Error ? err.message : err);
    throw unavailable();
  }
}
