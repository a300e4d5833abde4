import { expect, test } from "@playwright/test";
import { signIn } from "./support";

test("a coach searches the exercise library, adds an exercise of their own, and a file that is not a picture is refused with a clear message", async ({ page }) => {
  test.setTimeout(90_000);
  const name = `Tempo box squat ${Date.now() % 100000}`;
  await signIn(page, "coach@larchmere.test");
  await page.goto("/coach/library");

  // The built-in catalogue is searchable.
  await page.getByLabel("Search exercises").fill("squat");
  await expect(page.getByTestId("library-table")).toContainText("back squat");

  await page.getByRole("button", { name: "Add exercise" }).click();
  await page.locator("#ex-name").fill(name);
  await page.locator("#ex-aliases").fill("box squat 3s");
  await page.locator("#ex-equipment").selectOption("barbell");
  await page.locator("#ex-primaryMuscles").fill("quads, glutes");
  await page.getByRole("button", { name: "Add to library" }).click();

  await page.getByLabel("Search exercises").fill("box squat 3s");
  const table = page.getByTestId("library-table");
  await expect(table).toContainText(name);

  // Media: the type is read from the bytes, so text named .png is refused and nothing is lost.
  await page.getByRole("button", { name: `Edit ${name}` }).click();
  await page.locator('input[type="file"]').setInputFiles({ name: "cue.png", mimeType: "image/png", buffer: Buffer.from("not a picture at all") });
  await expect(page.getByRole("status").filter({ hasText: /JPEG, PNG or WebP/ })).toBeVisible();
  await expect(page.getByText("No picture or clip yet.")).toBeVisible();
});
