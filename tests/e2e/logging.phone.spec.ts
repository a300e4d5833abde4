import { expect, test } from "@playwright/test";
import { signIn } from "./support";

test("an athlete logs a whole session on a phone, swapping in a substitute, and sees it in history; the coach's roster shows it", async ({ page, browser }) => {
  test.setTimeout(180_000);
  await signIn(page, "tomas@larchmere.test");

  // The seeded programme starts on this week's Monday; its first session is "Upper heavy".
  const day = (offset: number) => new Date(Date.now() + offset * 86_400_000).toISOString().slice(0, 10);
  const list = await page.request.get(`/api/sessions?from=${day(-14)}&to=${day(14)}`);
  expect(list.status()).toBe(200);
  const { sessions } = (await list.json()) as { sessions: { id: string; date: string; day: string; logged: boolean }[] };
  const upper = sessions.find((s) => s.day === "Upper heavy" && !s.logged);
  expect(upper).toBeTruthy();

  await page.goto(`/athlete/sessions/${upper!.id}/log`);
  // The caution shows wherever loads do.
  await expect(page.getByText(/estimate/i).first()).toBeVisible();

  // Swap the cable row for its listed substitute: it is logged under that name.
  const row = page.getByTestId("log-exercise").filter({ has: page.getByRole("heading", { name: "cable row" }) });
  await row.getByTestId("swap-button").click();
  await page.getByRole("button", { name: "Do machine row instead" }).click();
  await expect(page.getByTestId("log-exercise-name").filter({ hasText: "machine row" })).toBeVisible();

  // Tick every work set (warm-ups are optional).
  const tick = page.getByRole("button", { name: /^Tick set \d+ of / });
  for (let guard = 0; guard < 40 && (await tick.count()) > 0; guard++) {
    await tick.first().click();
    const skip = page.getByTestId("rest-timer").getByRole("button", { name: "Skip" });
    if (await skip.isVisible().catch(() => false)) await skip.click();
  }
  expect(await tick.count()).toBe(0);
  await expect(page.getByTestId("sync-status")).toHaveAttribute("data-state", "saved");
  await page.getByTestId("finish-session").click();
  const summary = page.getByTestId("session-summary");
  await expect(summary).toContainText("machine row");
  await expect(summary).toContainText("instead of cable row");

  // Logging is saved on the server, not just on the phone.
  await page.goto("/athlete/history");
  const logged = page.getByTestId("logged-sessions").getByTestId("logged-session").first();
  await expect(logged).toContainText("machine row");
  await expect(logged).toContainText("(for cable row)");
  await expect(page.getByTestId("e1rm-chart")).toBeVisible();

  // The coach sees Tomas trained.
  const coach = await browser.newPage({ viewport: { width: 1280, height: 800 } });
  await signIn(coach, "coach@larchmere.test");
  await coach.goto("/coach/dashboard");
  const tomas = coach.getByTestId("dashboard-row").filter({ hasText: "Tomas Brenner" });
  await expect(tomas).toContainText(/[1-9]\d*\/\d+/);
  await expect(tomas.getByTestId("dashboard-last-session")).not.toBeEmpty();
  // Lena has no programme: the row says so and leads to her page, rather than calling her on track.
  const lena = coach.getByTestId("dashboard-row").filter({ hasText: "Lena Fisk" });
  await expect(lena.getByTestId("dashboard-unplanned")).toHaveText("nothing planned");
  await expect(lena).not.toContainText("on track");
  await coach.close();
});
