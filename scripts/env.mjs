/**
 * Local settings shared by the start and test commands: makes sure .env.local
 * holds a NEXTAUTH_SECRET (generated once) and the database URL of the
 * project's own PostgreSQL, and returns the environment child processes get.
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

/** Ensures .env.local exists with the values the app needs; returns them merged over process.env. */
export function localEnv({ database = "ironquill", port } = {}) {
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
  };
}
