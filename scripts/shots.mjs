/**
 * Screenshots for looking at what we built: `node scripts/shots.mjs [BASE_URL] [OUT_DIR]`.
 * Signs in as each demo role and captures the pages at a 390 px phone width and
 * a desktop width. A developer tool; the test suite does not depend on it.
 */
import { mkdirSync } from "node:fs";
import { chromium } from "@playwright/test";

const base = process.argv[2] ?? "http://127.0.0.1:3000";
const out = process.argv[3] ?? "test-results/shots";
const only = process.env.SHOTS_ONLY?.split(",");
mkdirSync(out, { recursive: true });

const PASSWORD = "lift-heavy-2027";
const plan = [
  { as: null, pages: ["/", "/signin", "/signup", "/store"] },
  { as: "coach@larchmere.test", pages: ["/coach", "/coach/dashboard", "/coach/templates", "/coach/athletes", "/coach/recipes", "/coach/sales", "/admin"] },
  { as: "tomas@larchmere.test", pages: ["/athlete", "/athlete/calendar", "/athlete/history", "/athlete/profile", "/athlete/recipes"] },
  { as: "admin@larchmere.test", pages: ["/admin", "/admin/mailbox", "/admin/listings"] },
];
const widths = [
  { name: "phone", viewport: { width: 390, height: 844 }, isMobile: true },
  { name: "desktop", viewport: { width: 1280, height: 860 }, isMobile: false },
];

const browser = await chromium.launch({
  executablePath: "/usr/bin/chromium",
  args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
});
for (const w of widths) {
  for (const step of plan) {
    const ctx = await browser.newContext({ viewport: w.viewport, isMobile: w.isMobile, deviceScaleFactor: 1 });
    const page = await ctx.newPage();
    if (step.as) {
      await page.goto(`${base}/signin`);
      await page.fill("#email", step.as);
      await page.fill("#password", PASSWORD);
      await page.click("button[type=submit]");
      await page.waitForURL((u) => !u.pathname.startsWith("/signin"), { timeout: 15000 });
    }
    for (const path of step.pages) {
      if (only && !only.some((o) => path.includes(o))) continue;
      await page.goto(`${base}${path}`);
      await page.waitForLoadState("networkidle");
      const who = step.as ? step.as.split("@")[0] : "anon";
      const file = `${out}/${w.name}-${who}${path.replaceAll("/", "_") || "_home"}.png`;
      await page.screenshot({ path: file, fullPage: true });
      console.log(file);
    }
    await ctx.close();
  }
}
await browser.close();
