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

test("an athlete signs in on a phone and sees today's empty state with the caution", async ({ page }) => {
  await signIn(page, "maya@larchmere.test");
  await expect(page).toHaveURL(/\/athlete$/);
  await expect(page.getByRole("heading", { name: "Nothing planned for today" })).toBeVisible();
  await expect(page.getByRole("note")).toContainText("stop on pain");
  await noSidewaysScroll(page);
});
