/**
 * `npm start`: PostgreSQL up, schema migrated, demo seeded when the database is
 * empty, a production build made when there is none, then the app served on
 * 127.0.0.1 (PORT overrides 3000). `--dev` serves with hot reload instead;
 * `--rebuild` forces a fresh build. Mail goes to a local fake SMTP server
 * (scripts/fakes.mjs); an admin reads it at /admin/mailbox. Ctrl-C stops
 * everything it started.
 */
import { spawn, spawnSync } from "node:child_process";
import { createHash } from "node:crypto";
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { db, localEnv, root } from "./env.mjs";
import { startFakes } from "./fakes.mjs";

const dev = process.argv.includes("--dev");
const rebuild = process.argv.includes("--rebuild");

function step(label, cmd, args, env) {
  process.stdout.write(`• ${label}\n`);
  const r = spawnSync(cmd, args, { cwd: root, env, stdio: "inherit" });
  if (r.status !== 0) {
    console.error(`\n✗ ${label} failed (exit ${r.status ?? r.signal}). See the messages above.`);
    process.exit(1);
  }
}

process.stdout.write("• starting PostgreSQL on 127.0.0.1\n");
const dbWasRunning = spawnSync("bash", [join(root, "scripts/db.sh"), "status"], { stdio: "ignore" }).status === 0;
try {
  db("start");
} catch {
  console.error("✗ PostgreSQL could not be started (see above).");
  process.exit(1);
}
const env = localEnv();
const bin = (name) => join(root, "node_modules/.bin", name);

step("migrating the database", bin("tsx"), ["scripts/migrate.ts"], env);
step("seeding the demo if the database is empty", bin("tsx"), ["--conditions=react-server", "scripts/seed.ts", "--if-empty"], env);
// A build made from other sources (an older commit, or edits since) is rebuilt, so a pull
// followed by `npm start` never serves yesterday's app.
const stamp = join(root, ".next/IQ_SOURCE");
const source = sourceFingerprint();
const built = existsSync(join(root, ".next/BUILD_ID")) && (source === "" || (existsSync(stamp) && readFileSync(stamp, "utf8") === source));
if (!dev && (rebuild || !built)) {
  step("building the app (first start takes a minute or two)", "npm", ["run", "-s", "build"], { ...env, NODE_ENV: "production" });
  if (source) writeFileSync(stamp, source);
}

/** The commit plus any uncommitted changes, or "" outside a git checkout (then a build is kept). */
function sourceFingerprint() {
  const git = (args) => spawnSync("git", args, { cwd: root, encoding: "utf8" });
  const head = git(["rev-parse", "HEAD"]);
  if (head.status !== 0) return "";
  // Contents, not just names: editing an already-changed file must still trigger a rebuild.
  const changed = git(["diff", "HEAD"]).stdout ?? "";
  const untracked = git(["status", "--porcelain", "--untracked-files=normal"]).stdout ?? "";
  return createHash("sha256").update(head.stdout).update(changed).update(untracked).digest("hex");
}

process.stdout.write(`• starting the local mail catcher on 127.0.0.1:${env.SMTP_PORT}\n`);
let fakes;
try {
  fakes = await startFakes(env);
} catch (err) {
  console.error(`✗ ${err.message}`);
  process.exit(1);
}

const port = env.PORT;
const args = dev ? ["dev", "--turbopack", "-H", "127.0.0.1", "-p", port] : ["start", "-H", "127.0.0.1", "-p", port];
const server = spawn(bin("next"), args, { cwd: root, env, stdio: ["ignore", "pipe", "inherit"] });
let announced = false;
server.stdout.on("data", (chunk) => {
  process.stdout.write(chunk);
  if (!announced && /ready|started|Local:/i.test(String(chunk))) {
    announced = true;
    spawnSync(bin("tsx"), ["--conditions=react-server", "scripts/seed.ts", "--print-only"], { cwd: root, env, stdio: "inherit" });
    console.log(`\nIronquill is running at http://localhost:${port}  (Ctrl-C to stop)\n`);
  }
});

let stopping = false;
function stop(signal) {
  if (stopping) return;
  stopping = true;
  console.log(`\nstopping (${signal})…`);
  server.kill("SIGTERM");
  setTimeout(() => server.kill("SIGKILL"), 5000).unref();
}
process.on("SIGINT", () => stop("SIGINT"));
process.on("SIGTERM", () => stop("SIGTERM"));
server.on("exit", async (code) => {
  await fakes.stop();
  // Leave PostgreSQL as we found it: stop it only if this command started it.
  if (!dbWasRunning) {
    try {
      db("stop");
    } catch {
      console.error("PostgreSQL did not stop cleanly; `npm run db stop` tries again.");
    }
  }
  console.log(stopping ? "stopped." : `the server exited (${code}).`);
  process.exit(stopping ? 0 : (code ?? 1));
});
