/**
 * `npm test`: every test, against real services.
 *  1. PostgreSQL up (and Debian's chromium installed when root and missing);
 *  2. a test database recreated from nothing, migrated and seeded; the local fake
 *     SMTP server started on its own port with an emptied mailbox (scripts/fakes.mjs);
 *  3. a type check of the whole tree, then Vitest: unit tests and integration tests against that database;
 *  4. a production build (in .next-test) and Playwright in /usr/bin/chromium.
 * Ends with one line `N passed, N failed` summing both runners; exits 1 on any failure.
 */
import { spawnSync } from "node:child_process";
import { existsSync, mkdirSync, readFileSync, rmSync } from "node:fs";
import { join } from "node:path";
import { db, localEnv, root } from "./env.mjs";
import { startFakes } from "./fakes.mjs";

const TEST_DB = "ironquill_test";
const bin = (name) => join(root, "node_modules/.bin", name);
const isRoot = process.getuid?.() === 0;
const skipE2E = process.argv.includes("--unit-only");

function run(label, cmd, args, env) {
  console.log(`\n▶ ${label}`);
  return spawnSync(cmd, args, { cwd: root, env, stdio: "inherit" }).status ?? 1;
}

function readJson(path) {
  try {
    return JSON.parse(readFileSync(path, "utf8"));
  } catch {
    return null;
  }
}

function ensureChromium() {
  const path = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
  if (existsSync(path)) return true;
  if (!isRoot) {
    console.error(`Chromium not found at ${path}. Install it with: sudo apt-get install -y chromium`);
    return false;
  }
  console.log("▶ installing Debian's chromium for the browser tests");
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  spawnSync("apt-get", ["update", "-qq"], { stdio: "inherit", env });
  return spawnSync("apt-get", ["install", "-y", "-qq", "chromium"], { stdio: "inherit", env }).status === 0 && existsSync(path);
}

let passed = 0;
let failed = 0;
const results = join(root, "test-results");
mkdirSync(results, { recursive: true });

try {
  db("start");
  db("recreatedb", TEST_DB);
} catch {
  console.error("PostgreSQL could not be prepared; see above.");
  console.log("\n0 passed, 1 failed");
  process.exit(1);
}
const env = {
  ...localEnv({ database: TEST_DB, port: process.env.E2E_PORT ?? 3100, mode: "test" }),
  NODE_ENV: "test",
  IQ_TEST_DB_ADMIN_URL: db("url", "postgres"),
  E2E_PORT: process.env.E2E_PORT ?? "3100",
};
env.NEXTAUTH_URL = `http://127.0.0.1:${env.E2E_PORT}`;

let setupFailed = 0;
if (run("migrating the test database", bin("tsx"), ["scripts/migrate.ts"], env) !== 0) setupFailed++;
if (run("seeding the test database", bin("tsx"), ["--conditions=react-server", "scripts/seed.ts"], env) !== 0) setupFailed++;

// Mail sent by the app (and read back by the browser tests) lands in a fresh folder.
console.log(`\n▶ starting the local mail catcher on 127.0.0.1:${env.SMTP_PORT}`);
rmSync(env.IQ_MAILBOX_DIR, { recursive: true, force: true });
let fakes = null;
try {
  fakes = await startFakes(env);
} catch (err) {
  console.error(`✗ ${err.message}`);
  setupFailed++;
}

// The whole tree type-checks (the build below only checks what the app imports).
if (run("type check (tsc)", bin("tsc"), ["--noEmit", "-p", "."], env) === 0) passed += 1;
else failed += 1;

// Vitest
rmSync(join(results, "vitest.json"), { force: true });
const vitestCode = run("unit and integration tests (Vitest)", bin("vitest"), ["run", "--reporter=default", "--reporter=json", `--outputFile.json=${join(results, "vitest.json")}`], env);
const vitest = readJson(join(results, "vitest.json"));
if (vitest) {
  passed += vitest.numPassedTests ?? 0;
  failed += vitest.numFailedTests ?? 0;
  // A file that fails to load has no tests to count, yet is a failure.
  failed += (vitest.testResults ?? []).filter((f) => f.status === "failed" && (f.assertionResults ?? []).length === 0).length;
  // Every test passed yet Vitest failed the run: an error outside any test (an unhandled rejection, say).
  if (vitestCode !== 0 && (vitest.numFailedTests ?? 0) === 0 && !(vitest.testResults ?? []).some((f) => f.status === "failed")) {
    console.error("✗ Vitest reported errors outside the tests (see above); counted as one failure.");
    failed += 1;
  }
} else if (vitestCode !== 0) {
  failed += 1;
}

// Playwright against a production build
if (!skipE2E) {
  const e2eEnv = { ...env, NODE_ENV: "production", NEXT_DIST_DIR: ".next-test" };
  if (!ensureChromium()) {
    failed += 1;
  } else if (run("production build for the browser tests", "npm", ["run", "-s", "build"], e2eEnv) !== 0) {
    failed += 1;
  } else {
    rmSync(join(results, "playwright.json"), { force: true });
    const code = run("browser tests (Playwright, Chromium)", bin("playwright"), ["test"], e2eEnv);
    const pw = readJson(join(results, "playwright.json"));
    if (pw?.stats) {
      passed += (pw.stats.expected ?? 0) + (pw.stats.flaky ?? 0);
      failed += pw.stats.unexpected ?? 0;
      if (code !== 0 && !pw.stats.unexpected) failed += 1;
    } else if (code !== 0) {
      failed += 1;
    }
  }
}

await fakes?.stop();
failed += setupFailed;
console.log(`\n${passed} passed, ${failed} failed`);
process.exit(failed > 0 || vitestCode !== 0 ? 1 : 0);
