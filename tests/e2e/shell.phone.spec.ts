import { expect, test } from "@playwright/test";
import { signIn } from "./support";

async function noSidewaysScroll(page: import("@playwright/test").Page) {
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
  expect(overflow).toBeLessThanOrEqual(0);
}

test("the landing page says what Ironquill does and fits a phone", async ({ page }) => {
  await page.goto("/");
  await expect(page.getByRole("heading", { level: 1 })).toContainText("Every athlete lifts their own numbers");
  await expect(page.getByRole("note")).toContainText("Loads are estimates");
  await noSidewaysScroll(page);
});

test("an athlete with no programme yet signs in on a phone and sees today's empty state with the caution", async ({ page }) => {
  // Lena has maxes and a gym in the demo but no programme assigned.
  await signIn(page, "lena@larchmere.test");
  await expect(page).toHaveURL(/\/athlete$/);
  await expect(page.getByRole("heading", { name: "Nothing planned for today" })).toBeVisible();
  await expect(page.getByRole("note")).toContainText("stop on pain");
  await noSidewaysScroll(page);
});

test("an athlete's today, calendar, progress and gym pages fit a 390 px phone without sideways scrolling", async ({ page }) => {
  await signIn(page, "tomas@larchmere.test");
  for (const path of ["/athlete", "/athlete/calendar", "/athlete/history", "/athlete/profile", "/athlete/recipes"]) {
    await page.goto(path);
    await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
    await noSidewaysScroll(page);
  }
  // The demo programme started this week's Monday, so today is a session or a rest day before the next one.
  await page.goto("/athlete");
  await expect(page.getByTestId("today-session").or(page.getByTestId("rest-day")).first()).toBeVisible();
});
