import "server-only";
import { readdir, readFile } from "node:fs/promises";
import { join, resolve, sep } from "node:path";

/**
 * Reads the messages the local fake SMTP server (scripts/fakes/smtp.mjs) keeps
 * in IQ_MAILBOX_DIR, for the admin mailbox page. Without that folder mail goes
 * to a real provider and there is nothing here to read.
 */

export type StoredAttachment = { index: number; filename: string; contentType: string; size: number };
export type StoredMessage = {
  id: string;
  date: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  attachments: StoredAttachment[];
};

// Exactly the ids the fake writes (`m<ms>-<8 hex>`): nothing else can name a file.
const ID_SHAPE = /^m\d{10,16}-[0-9a-f]{8}$/;

export function isMessageId(id: string): boolean {
  return ID_SHAPE.test(id);
}

/** The mailbox folder, or null when mail goes to a real provider. */
export function mailboxDir(env: Record<string, string | undefined> = process.env): string | null {
  const dir = env.IQ_MAILBOX_DIR?.trim();
  return dir ? resolve(dir) : null;
}

// Belt and braces: even a well-formed name must resolve inside the folder.
function inside(dir: string, name: string): string | null {
  const path = resolve(dir, name);
  return path.startsWith(dir + sep) ? path : null;
}

function str(v: unknown): string {
  return typeof v === "string" ? v : "";
}

function parseMessage(id: string, raw: string): StoredMessage | null {
  let data: Record<string, unknown>;
  try {
    data = JSON.parse(raw);
  } catch {
    return null;
  }
  if (typeof data !== "object" || data === null) return null;
  const attachments = Array.isArray(data.attachments) ? data.attachments : [];
  return {
    id,
    date: str(data.date),
    from: str(data.from),
    to: Array.isArray(data.to) ? data.to.filter((t): t is string => typeof t === "string") : [],
    subject: str(data.subject),
    text: str(data.text),
    html: typeof data.html === "string" ? data.html : null,
    attachments: attachments.map((a: Record<string, unknown>, i) => ({
      index: i + 1,
      filename: str(a?.filename) || `attachment-${i + 1}`,
      contentType: str(a?.contentType) || "application/octet-stream",
      size: typeof a?.size === "number" ? a.size : 0,
    })),
  };
}

async function readMessageFile(dir: string, id: string): Promise<StoredMessage | null> {
  if (!isMessageId(id)) return null;
  const path = inside(dir, `${id}.json`);
  if (!path) return null;
  try {
    return parseMessage(id, await readFile(path, "utf8"));
  } catch {
    return null;
  }
}

/** The newest messages first (at most `limit`); null when there is no local mailbox. */
export async function listMessages(limit = 100, dir = mailboxDir()): Promise<StoredMessage[] | null> {
  if (!dir) return null;
  let names: string[];
  try {
    names = await readdir(dir);
  } catch {
    return [];
  }
  const ids = names
    .filter((n) => n.endsWith(".json"))
    .map((n) => n.slice(0, -5))
    .filter(isMessageId)
    // Ids start with the time in milliseconds, all the same width: text order is time order.
    .sort()
    .reverse()
    .slice(0, limit);
  const messages = await Promise.all(ids.map((id) => readMessageFile(dir, id)));
  return messages.filter((m): m is StoredMessage => m !== null);
}

export async function readMessage(id: string, dir = mailboxDir()): Promise<StoredMessage | null> {
  return dir ? readMessageFile(dir, id) : null;
}

/** One attachment's bytes with the name and type the message gave it; null when there is no such thing. */
export async function readAttachment(
  id: string,
  index: number,
  dir = mailboxDir(),
): Promise<{ filename: string; contentType: string; content: Buffer } | null> {
  if (!dir || !Number.isSafeInteger(index) || index < 1) return null;
  const message = await readMessageFile(dir, id);
  const meta = message?.attachments[index - 1];
  if (!meta) return null;
  // The file name is rebuilt from the checked id, never taken from the JSON.
  const path = inside(dir, `${id}.${index}.bin`);
  if (!path) return null;
  try {
    return { filename: meta.filename, contentType: meta.contentType, content: await readFile(path) };
  } catch {
    return null;
  }
}
