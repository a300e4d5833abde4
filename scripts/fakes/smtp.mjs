/**
 * A local stand-in for a mail provider: an SMTP server on 127.0.0.1 that
 * accepts any sign-in (or none) and keeps every message as one JSON file in a
 * folder, attachments saved beside it. The admin mailbox page and the tests
 * read that folder; nothing ever leaves the machine.
 *
 * Run on its own:  SMTP_PORT=2525 IQ_MAILBOX_DIR=.data/mailbox node scripts/fakes/smtp.mjs
 * Or in-process:   const fake = await startSmtpFake({ port: 0, dir }); … await fake.close();
 *
 * Message file `<id>.json`:
 *   { id, date, from, to: [addresses], subject, text, html,
 *     attachments: [{ filename, contentType, size, file }] }
 * where `file` is the name of the saved content in the same folder.
 */
import { randomBytes } from "node:crypto";
import { existsSync, mkdirSync, readdirSync, readFileSync, renameSync, writeFileSync } from "node:fs";
import { join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";

const MAX_BYTES = 25 * 1024 * 1024;

/** Ids sort by time and carry no path characters: `m<ms since epoch>-<8 hex>`. */
function newId() {
  return `m${Date.now()}-${randomBytes(4).toString("hex")}`;
}

// Readers list the folder at any moment; write beside and rename so they never see half a file.
function writeAtomic(path, data) {
  const tmp = `${path}.partial`;
  writeFileSync(tmp, data);
  renameSync(tmp, path);
}

function addressList(field) {
  if (!field) return [];
  const groups = Array.isArray(field) ? field : [field];
  return groups.flatMap((g) => g.value ?? []).flatMap((a) => (a.group ? a.group : [a])).map((a) => a.address).filter(Boolean);
}

/** Parses one raw message and stores it; returns the stored record. */
export async function storeMessage(dir, raw, envelope = {}) {
  const mail = await simpleParser(raw);
  const id = newId();
  const attachments = (mail.attachments ?? []).map((a, i) => {
    const file = `${id}.${i + 1}.bin`;
    writeAtomic(join(dir, file), a.content);
    return { filename: a.filename ?? `attachment-${i + 1}`, contentType: a.contentType ?? "application/octet-stream", size: a.size ?? a.content.length, file };
  });
  const rcpt = (envelope.rcptTo ?? []).map((r) => r.address);
  const record = {
    id,
    date: new Date().toISOString(),
    from: mail.from?.text ?? envelope.mailFrom?.address ?? "",
    // The envelope recipients include Bcc, which headers do not show.
    to: rcpt.length > 0 ? rcpt : addressList(mail.to),
    subject: mail.subject ?? "",
    text: mail.text ?? "",
    html: typeof mail.html === "string" ? mail.html : null,
    attachments,
  };
  writeAtomic(join(dir, `${id}.json`), JSON.stringify(record, null, 2));
  return record;
}

/** Every stored message in a folder, oldest first (ids begin with the time). */
export function readStoredMessages(dir) {
  if (!existsSync(dir)) return [];
  return readdirSync(dir)
    .filter((n) => /^m\d+-[0-9a-f]{8}\.json$/.test(n))
    .sort()
    .map((n) => JSON.parse(readFileSync(join(dir, n), "utf8")));
}

/**
 * Starts the fake on 127.0.0.1. `port: 0` picks a free port (see `port` on the result).
 * @param {{ port?: number, dir: string, log?: (line: string) => void }} options
 * @returns {Promise<{ port: number, dir: string, close: () => Promise<void> }>}
 */
export async function startSmtpFake({ port = 2525, dir, log = () => {} }) {
  if (!dir) throw new Error("startSmtpFake: a mailbox folder (dir) is required");
  const folder = resolve(dir);
  mkdirSync(folder, { recursive: true });
  const server = new SMTPServer({
    name: "ironquill-fake-smtp",
    banner: "Ironquill local mail catcher; nothing is delivered",
    authOptional: true,
    allowInsecureAuth: true,
    // No TLS upgrade: the client would refuse a self-signed certificate, and the traffic never leaves 127.0.0.1.
    disabledCommands: ["STARTTLS"],
    size: MAX_BYTES,
    logger: false,
    // Stopping should not wait long for a client that keeps its connection open.
    closeTimeout: 2000,
    onAuth(_auth, _session, callback) {
      callback(null, { user: "local" });
    },
    onData(stream, session, callback) {
      const chunks = [];
      let size = 0;
      stream.on("data", (c) => {
        size += c.length;
        if (size <= MAX_BYTES) chunks.push(c);
      });
      stream.on("error", callback);
      stream.on("end", () => {
        if (stream.sizeExceeded) return callback(Object.assign(new Error("Message too large"), { responseCode: 552 }));
        // Answer only once the file is on disk, so a sender that got "250" can read it straight away.
        storeMessage(folder, Buffer.concat(chunks), session.envelope).then(
          (m) => {
            log(`✉ ${m.to.join(", ")} — ${m.subject}`);
            callback(null, `stored as ${m.id}`);
          },
          (err) => callback(Object.assign(new Error(`Could not store the message: ${err.message}`), { responseCode: 451 })),
        );
      });
    },
  });
  await new Promise((ok, fail) => {
    server.once("error", fail);
    server.listen(port, "127.0.0.1", () => {
      server.off("error", fail);
      ok();
    });
  });
  server.on("error", (err) => log(`fake SMTP error: ${err.message}`));
  return {
    port: server.server.address().port,
    dir: folder,
    close: () => new Promise((ok) => server.close(() => ok())),
  };
}

// Run as a child of scripts/fakes.mjs (or by hand).
if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const port = Number(process.env.SMTP_PORT ?? 2525);
  const dir = process.env.IQ_MAILBOX_DIR;
  if (!dir) {
    console.error("fake SMTP: IQ_MAILBOX_DIR is not set");
    process.exit(2);
  }
  try {
    const fake = await startSmtpFake({ port, dir, log: (line) => console.log(`[mail] ${line}`) });
    console.log(`[mail] fake SMTP on 127.0.0.1:${fake.port}, messages kept in ${fake.dir}`);
    process.send?.({ ready: true, port: fake.port });
    const stop = () => fake.close().then(() => process.exit(0));
    process.on("SIGINT", stop);
    process.on("SIGTERM", stop);
    // The parent went away without stopping us (crash, process.exit): do not linger as an orphan.
    process.on("disconnect", stop);
  } catch (err) {
    console.error(`fake SMTP could not listen on 127.0.0.1:${port}: ${err.code ?? err.message}. Set IQ_SMTP_PORT to another port.`);
    process.exit(1);
  }
}
