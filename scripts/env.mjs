/**
 * Local settings shared by the start and test commands: makes sure .env.local
 * holds a NEXTAUTH_SECRET (generated once) and the database URL of the
 * project's own PostgreSQL, and returns the environment child processes get,
 * with mail pointed at the local fake SMTP server (scripts/fakes/smtp.mjs).
 */
import { execFileSync } from "node:child_process";
import { randomBytes } from "node:crypto";
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { join } from "node:path";

export const root = fileURLToPath(new URL("..", import.meta.url));
const envFile = join(root, ".env.local");

function readEnvFile() {
  const out = {};
  if (!existsSync(envFile)) return out;
  for (const line of readFileSync(envFile, "utf8").split("\n")) {
    const m = /^\s*([A-Z0-9_]+)\s*=\s*(.*)\s*$/.exec(line);
    if (m) out[m[1]] = m[2].replace(/^"(.*)"$/, "$1");
  }
  return out;
}

export function db(...args) {
  return execFileSync("bash", [join(root, "scripts/db.sh"), ...args], { encoding: "utf8", stdio: ["ignore", "pipe", "inherit"] }).trim();
}

/**
 * Ensures .env.local exists with the values the app needs; returns them merged over process.env.
 * `mode: "test"` gives mail its own port (2526) and mailbox folder so a test run never mixes with `npm start`.
 */
export function localEnv({ database = "ironquill", port, mode = "start" } = {}) {
  const file = readEnvFile();
  let changed = false;
  if (!file.NEXTAUTH_SECRET) {
    file.NEXTAUTH_SECRET = randomBytes(32).toString("base64url");
    changed = true;
  }
  const url = db("url", "ironquill");
  if (file.DATABASE_URL !== url) {
    file.DATABASE_URL = url;
    changed = true;
  }
  if (changed) {
    const body = Object.entries(file).map(([k, v]) => `${k}=${v}`).join("\n");
    writeFileSync(envFile, `# Written by npm start / npm test; local only, never committed.\n${body}\n`, { mode: 0o600 });
  }
  const appPort = String(port ?? process.env.PORT ?? 3000);
  return {
    ...process.env,
    ...file,
    DATABASE_URL: database === "ironquill" ? (process.env.DATABASE_URL ?? url) : db("url", database),
    NEXTAUTH_URL: process.env.NEXTAUTH_URL ?? `http://localhost:${appPort}`,
    PORT: appPort,
    ...localMail(mode),
    ...localPayments(mode, appPort, file),
  };
}

/**
 * The payment SDK talks to the fake on 127.0.0.1 (IQ_PAYMENTS_PORT moves it), whose signed
 * events come back to this app's webhook. Real keys set in .env.local win: then the SDK uses
 * the provider itself and no fake is started (see DEVELOPERS.md, Payments).
 */
function localPayments(mode, appPort, file) {
  if (file.STRIPE_SECRET_KEY && !file.STRIPE_API_HOST) return {};
  const port = String(process.env.IQ_PAYMENTS_PORT ?? (mode === "test" ? 12112 : 12111));
  return {
    STRIPE_SECRET_KEY: "sk_test_ironquill_local",
    STRIPE_WEBHOOK_SECRET: "whsec_ironquill_local",
    STRIPE_API_HOST: "127.0.0.1",
    STRIPE_API_PORT: port,
    STRIPE_API_PROTOCOL: "http",
    FAKE_PAYMENTS_PORT: port,
    FAKE_PAYMENTS_WEBHOOK_URL: `http://127.0.0.1:${appPort}/api/webhooks/payments`,
  };
}

/** Mail goes to the fake on 127.0.0.1 that the start and test commands run (IQ_SMTP_PORT moves it). */
function localMail(mode) {
  const test = mode === "test";
  return {
    SMTP_HOST: "127.0.0.1",
    SMTP_PORT: String(process.env.IQ_SMTP_PORT ?? (test ? 2526 : 2525)),
    SMTP_SECURE: "false",
    SMTP_USER: "",
    SMTP_PASS: "",
    MAIL_FROM: "Ironquill <no-reply@ironquill.test>",
    IQ_MAILBOX_DIR: join(root, ".data", test ? "mailbox-test" : "mailbox"),
  };
}
