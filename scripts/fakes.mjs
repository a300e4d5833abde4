/**
 * Local stand-ins for outside services, run as child processes by the start
 * and test commands. Each fake is one entry in FAKES: the script to run, and
 * the host and port (read from the environment the app gets) it must answer on.
 * A fake's script reads its settings from that environment, calls
 * `process.send({ ready: true })` once it listens, stops on SIGTERM, and exits
 * when the IPC channel closes (see scripts/fakes/smtp.mjs).
 *
 *   const fakes = await startFakes(env);   // throws with a readable message if one cannot start
 *   …
 *   await fakes.stop();
 */
import { spawn } from "node:child_process";
import { connect } from "node:net";
import { join } from "node:path";
import { root } from "./env.mjs";

export const FAKES = [
  { name: "mail (SMTP)", script: "scripts/fakes/smtp.mjs", host: (env) => env.SMTP_HOST, port: (env) => Number(env.SMTP_PORT) },
  // Only when the SDK is pointed at a local host: with real keys there is nothing to fake.
  { name: "payments", script: "scripts/fakes/payments.mjs", host: (env) => env.STRIPE_API_HOST, port: (env) => Number(env.STRIPE_API_PORT), when: (env) => Boolean(env.STRIPE_API_HOST) },
];

const READY_WITHIN_MS = 15_000;

function portAnswers(host, port) {
  return new Promise((ok) => {
    const socket = connect({ host, port });
    socket.once("connect", () => {
      socket.destroy();
      ok(true);
    });
    socket.once("error", () => ok(false));
  });
}

/** Resolves once the child says it listens and its port accepts a connection; rejects if it exits first. */
function whenReady(child, fake, env) {
  return new Promise((ok, fail) => {
    const timer = setTimeout(() => fail(new Error(`${fake.name} did not start within ${READY_WITHIN_MS / 1000} s`)), READY_WITHIN_MS);
    child.once("exit", (code, signal) => {
      clearTimeout(timer);
      fail(new Error(`${fake.name} stopped while starting (exit ${code ?? signal}); see the message above`));
    });
    child.on("message", async (msg) => {
      if (!msg?.ready) return;
      // The child's word is checked against the socket: the app will connect the same way.
      if (await portAnswers(fake.host(env), fake.port(env))) {
        clearTimeout(timer);
        ok();
      }
    });
  });
}

function stopChild(child) {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((ok) => {
    const force = setTimeout(() => child.kill("SIGKILL"), 5000);
    child.once("exit", () => {
      clearTimeout(force);
      ok();
    });
    child.kill("SIGTERM");
  });
}

/** Starts every fake with `env`; returns `stop()`. If one fails, those already started are stopped. */
export async function startFakes(env) {
  const children = [];
  const stop = () => Promise.all(children.map(stopChild)).then(() => undefined);
  for (const fake of FAKES) {
    if (fake.when && !fake.when(env)) continue;
    const child = spawn(process.execPath, [join(root, fake.script)], {
      cwd: root,
      env,
      // The IPC channel carries "ready", and lets the child notice if we die without stopping it.
      stdio: ["ignore", "inherit", "inherit", "ipc"],
    });
    children.push(child);
    try {
      await whenReady(child, fake, env);
    } catch (err) {
      await stop();
      throw err;
    }
    // Nothing more to hear; do not keep the parent's event loop alive for the channel.
    child.channel?.unref();
  }
  return { stop };
}
