import { expect, type Page, test } from "@playwright/test";
import { signIn } from "./support";

async function replaceText(page: Page, text: string) {
  await page.locator(".cm-content").click();
  await page.keyboard.press("ControlOrMeta+a");
  // insertText types the whole block at once, so completion pop-ups never swallow a newline.
  await page.keyboard.insertText(text);
}

async function appendLine(page: Page, line: string) {
  await page.locator(".cm-content").click();
  await page.keyboard.press("ControlOrMeta+End");
  await page.keyboard.insertText(`\n${line}`);
}

test("a coach writes a template, sees loads follow the text and the maxes, fixes an error, saves twice, compares and shares it", async ({ page, browser }) => {
  test.setTimeout(120_000);
  await signIn(page, "coach@larchmere.test");
  await page.goto("/coach/templates/new");
  await replaceText(page, "title: Test block\nunits: kg\nblock Build 2w\nday Heavy mon\n  bench press 3x5 @80%");

  // Sample athlete: bench press 1RM 100 kg → 80 % = 80 kg; 20 kg bar → 25 + 5 per side (common practice: plates per side = (load − bar) / 2).
  const load = page.getByTestId("preview-load").first();
  await expect(load).toHaveText("80 kg");
  await expect(page.getByTestId("week-preview")).toContainText("25 · 5");

  // Typing a new percentage reworks the load at once: 85 % of 100 = 85 kg.
  await page.locator(".cm-line", { hasText: "bench press" }).click();
  await page.keyboard.press("End");
  await page.keyboard.press("Backspace");
  await page.keyboard.press("Backspace");
  await page.keyboard.insertText("5%");
  await expect(load).toHaveText("85 kg");

  // Changing the preview athlete's max reworks it too: 85 % of 110 = 93.5 → 92.5 kg (nearest loadable, 2.5 kg steps).
  await page.getByRole("button", { name: "Edit maxes" }).click();
  await page.getByLabel("1RM for bench press").fill("110");
  await expect(load).toHaveText("92.5 kg");

  // A broken line is underlined and explained.
  await appendLine(page, "  squat 3x8-6 @2rir");
  await expect(page.locator(".cm-lintRange-error").first()).toBeVisible();
  await expect(page.getByTestId("problems")).toContainText("runs backwards");

  // Fix it and save: the template gets version 1.
  await page.locator(".cm-line", { hasText: "squat 3x8-6" }).click();
  await page.keyboard.press("End");
  await page.keyboard.press("Home");
  await page.keyboard.press("Shift+End");
  await page.keyboard.insertText("  back squat 3x6-8 @2rir");
  await expect(page.getByTestId("problems-none")).toBeVisible();
  await page.getByRole("button", { name: "Save template" }).click();
  await expect(page).toHaveURL(/\/coach\/templates\/[0-9a-f-]{36}$/);
  await expect(page.getByRole("heading", { name: "Test block" })).toBeVisible();
  const templateUrl = page.url();

  // Edit and save again: version 2.
  await appendLine(page, "  barbell row 3x8 @2rir");
  await page.getByLabel("What changed in this version").fill("rows added");
  await page.getByRole("button", { name: "Save version" }).click();
  await expect(page.getByTestId("save-status")).toHaveText("Saved as version 2.");
  await expect(page.getByTestId("version-list")).toContainText("rows added");

  // The diff shows the added line.
  await page.getByRole("link", { name: "Compare v1 with v2" }).click();
  const added = page.getByTestId("line-diff").locator('[data-kind="add"]');
  await expect(added).toHaveCount(1);
  await expect(added).toContainText("barbell row 3x8 @2rir");

  // Share version 2; an anonymous visitor opens it read-only.
  await page.goto(templateUrl);
  await page.getByRole("button", { name: "Share version 2 by link" }).click();
  const link = page.getByLabel("Share link for version 2");
  await expect(link).toBeVisible();
  const shareUrl = await link.inputValue();
  const visitor = await browser.newPage();
  await visitor.goto(shareUrl);
  await expect(visitor.getByRole("heading", { name: "Test block" })).toBeVisible();
  await expect(visitor.getByTestId("shared-source")).toContainText("barbell row 3x8 @2rir");
  await expect(visitor.locator(".cm-content")).toHaveCount(0);

  // Revoking the link closes it.
  await page.getByRole("button", { name: "Revoke" }).click();
  await expect(page.getByTestId("share-links")).not.toContainText("v2");
  await visitor.reload();
  await expect(visitor.getByTestId("share-gone")).toBeVisible();
  await visitor.close();

  // Another coach can neither open it in the app nor read it through the API.
  const other = await browser.newPage();
  await other.goto("/signup");
  await other.getByLabel("Your name").fill("Other Coach");
  await other.getByLabel("E-mail").fill(`other-${Date.now()}@example.test`);
  await other.getByLabel("Password").fill("another-long-secret");
  await other.getByRole("button", { name: "Create coach account" }).click();
  await expect(other).toHaveURL(/\/coach$/);
  const id = templateUrl.split("/").pop();
  expect((await other.goto(`/coach/templates/${id}`))?.status()).toBe(404);
  expect((await other.request.get(`/api/templates/${id}`)).status()).toBe(404);
  expect((await other.request.post(`/api/templates/${id}/versions`, { data: { source: "day X\n  squat 3x5" } })).status()).toBe(404);
  await other.close();
});

test("the template API answers bad input with a clear message, never a 500", async ({ page }) => {
  await signIn(page, "coach@larchmere.test");
  const res = await page.request.post("/api/templates", { headers: { "content-type": "application/json" }, data: "{not json" });
  expect(res.status()).toBe(422);
  const body = await res.json();
  expect(body.error.code).toBe("invalid_input");
  expect(body.error.message.length).toBeGreaterThan(5);

  const broken = await page.request.post("/api/templates", { data: { title: "Broken", source: "day A\n  squat 0x5" } });
  expect(broken.status()).toBe(422);
  const b = await broken.json();
  expect(b.error.diagnostics[0]).toMatchObject({ line: 2 });
});

test("the preview works loads for one of the coach's athletes, from their own gym and maxes", async ({ page }) => {
  await signIn(page, "coach@larchmere.test");
  await page.goto("/coach/templates/new");
  await replaceText(page, "title: Athlete check\nunits: kg\nblock Base 1w\nday Heavy mon\n  back squat 1x5 @80%\n  overhead press 1x5 @80%");
  const squat = page.getByTestId("preview-load").first();
  // Sample athlete: back squat 1RM 140 kg → 80 % = 112 kg → 112.5 kg, the nearest load in 2.5 kg steps (common practice, no source).
  await expect(squat).toHaveText("112.5 kg");

  // The demo's Maya trains in pounds in a garage gym, back squat 1RM 225 lb: 80 % = 180 lb, loads in her unit.
  const picker = page.getByLabel("Preview for");
  await picker.selectOption({ label: "Maya Okonjo" });
  await expect(squat).toHaveText("180 lb");
  await expect(page.getByTestId("preview-gym")).toHaveText("lb · 45 lb bar");
  // She has no overhead press max on file, so that load stays empty and the panel says so.
  await expect(page.getByTestId("preview-missing")).toContainText("overhead press");
  await page.getByRole("button", { name: "Show maxes" }).click();
  await expect(page.getByText("225 lb")).toBeVisible();
  await expect(page.getByRole("link", { name: "Change Maya’s maxes" })).toHaveAttribute("href", /\/coach\/athletes\/[0-9a-f-]{36}$/);

  // Lena, back squat 1RM 85 kg at a home rack with 1.25 kg change plates: 80 % = 68 kg → 67.5 kg.
  await picker.selectOption({ label: "Lena Fisk" });
  await expect(squat).toHaveText("67.5 kg");

  // The choice is kept on this device; going back to the sample restores its maxes.
  await page.reload();
  await page.getByRole("button", { name: "Bring it back" }).click();
  await expect(page.getByLabel("Preview for").locator("option:checked")).toHaveText("Lena Fisk");
  await expect(page.getByTestId("preview-load").first()).toHaveText("67.5 kg");
  await page.getByLabel("Preview for").selectOption({ label: "Sample athlete" });
  await expect(page.getByTestId("preview-load").first()).toHaveText("112.5 kg");
});
