/**
 * Keystroke → repaint in the workbench at 300 lines, measured in real Chromium
 * with the page's own performance marks (`iq:change` → `iq:repaint`, taken once
 * the preview shows the change). Needs a production build: it starts its own
 * server on a spare port with `npm start`'s script. Target: median ≤ 16 ms.
 */
import { spawn } from "node:child_process";
import { chromium } from "@playwright/test";

const PORT = Number(process.env.IQ_BENCH_PORT ?? 3200);
const BASE = `http://127.0.0.1:${PORT}`;

function programme(lines: number): string {
  const out = ["title: Benchmark block", "units: kg", "block Build 4w deload w4"];
  const lifts = ["back squat 4x5 @75% +2.5kg/wk ramp 50/70/85% rest 3m", "bench press 4x5-7 @2rir pause 1s", "A1 barbell row 3x8-10 @2rir", "A2 {pull-up | chin-up} 3x6-10 bw rotate 2w", "romanian deadlift 3x8 @rpe8 tempo 3110", "cable row 3x12 @1rir or machine row, dumbbell row"];
  let day = 0;
  while (out.length < lines) {
    if ((out.length - 3) % 8 === 0) out.push(`day Day ${++day}`);
    else out.push(`  ${lifts[out.length % lifts.length]}`);
  }
  return out.join("\n") + "\n";
}

async function waitFor(url: string, ms: number) {
  const until = Date.now() + ms;
  while (Date.now() < until) {
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      /* not up yet */
    }
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`server at ${url} did not come up`);
}

export default async function bench() {
  const server = spawn("node", ["scripts/start.mjs"], { env: { ...process.env, PORT: String(PORT) }, stdio: "ignore", detached: true });
  try {
    await waitFor(`${BASE}/api/health`, 240_000);
    const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--no-sandbox", "--disable-gpu", "--disable-background-networking"] });
    const page = await browser.newPage({ viewport: { width: 1400, height: 900 } });
    await page.goto(`${BASE}/signin`);
    await page.fill("#email", "coach@larchmere.test");
    await page.fill("#password", "lift-heavy-2027");
    await page.click("button[type=submit]");
    await page.waitForURL(/\/coach/);
    await page.goto(`${BASE}/coach/templates/new`);
    await page.locator(".cm-content").click();
    await page.keyboard.press("ControlOrMeta+a");
    await page.keyboard.insertText(programme(300));
    await page.keyboard.press("ControlOrMeta+End");
    await page.waitForTimeout(500);
    await page.evaluate(() => performance.clearMeasures("iq:repaint"));
    for (const ch of "  front squat 3x5 @70%") {
      await page.keyboard.type(ch);
      await page.waitForTimeout(60);
    }
    const samples = await page.evaluate(() => performance.getEntriesByName("iq:repaint").map((e) => e.duration));
    await browser.close();
    samples.sort((a, b) => a - b);
    const median = samples[Math.floor(samples.length / 2)] ?? NaN;
    const p95 = samples[Math.floor(samples.length * 0.95)] ?? NaN;
    console.log("| measure | keystrokes | median ms | p95 ms | target | result |");
    console.log("|---|---|---|---|---|---|");
    console.log(`| keystroke → repaint, 300 lines | ${samples.length} | ${median.toFixed(2)} | ${p95.toFixed(2)} | ≤ 16 ms median | ${median <= 16 ? "met" : "MISSED"} |`);
  } finally {
    try {
      process.kill(-server.pid!, "SIGINT");
    } catch {
      /* already gone */
    }
  }
}
