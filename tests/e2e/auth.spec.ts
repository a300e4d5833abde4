import { expect, test } from "@playwright/test";
import { signIn } from "./support";

test("an anonymous visitor who opens the coach desk is sent to sign in, and back after", async ({ page }) => {
  await page.goto("/coach/athletes");
  await expect(page).toHaveURL(/\/signin\?callbackUrl=%2Fcoach%2Fathletes/);
  await page.getByLabel("E-mail").fill("coach@larchmere.test");
  await page.getByLabel("Password").fill("lift-heavy-2027");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(/\/coach\/athletes$/);
  await expect(page.getByRole("heading", { name: "Athletes" })).toBeVisible();
});

test("a new coach signs up, lands on the coach desk, and the session carries the coach role", async ({ page }) => {
  const email = `coach-${Date.now()}@example.test`;
  await page.goto("/signup");
  await page.getByLabel("Your name").fill("Ada Example");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill("a-long-enough-secret");
  await page.getByRole("button", { name: "Create coach account" }).click();
  await expect(page).toHaveURL(/\/coach$/);
  await expect(page.getByRole("heading", { name: /Good to see you, Ada/ })).toBeVisible();

  const session = await (await page.request.get("/api/auth/session")).json();
  expect(session.user.email).toBe(email);
  expect(session.user.role).toBe("coach");

  // Signing out and in again with the same details works.
  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page).toHaveURL(/\/$/);
  await signIn(page, email, "a-long-enough-secret");
  await expect(page).toHaveURL(/\/coach$/);
});

test("sign-up with a taken e-mail or a short password explains each field", async ({ page }) => {
  await page.goto("/signup");
  await page.getByLabel("Your name").fill("Rowan Again");
  await page.getByLabel("E-mail").fill("coach@larchmere.test");
  await page.getByLabel("Password").fill("short");
  await page.getByRole("button", { name: "Create coach account" }).click();
  await expect(page.getByText("Use at least 10 characters")).toBeVisible();
  await page.getByLabel("Password").fill("long-enough-password");
  await page.getByRole("button", { name: "Create coach account" }).click();
  await expect(page.getByText("Already registered — sign in instead")).toBeVisible();
  await expect(page.getByLabel("Your name")).toHaveValue("Rowan Again");
});

test("a bad sign-in shows a clear message and never an error page", async ({ page }) => {
  const responses: number[] = [];
  page.on("response", (r) => responses.push(r.status()));
  await page.goto("/signin");
  await page.getByLabel("E-mail").fill("coach@larchmere.test");
  await page.getByLabel("Password").fill("not-the-password");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("form-error")).toHaveText(/don't match an account/);
  await expect(page).toHaveURL(/\/signin/);
  expect(responses.filter((s) => s >= 500)).toEqual([]);
});

test("a coach cannot open the admin area", async ({ page }) => {
  await signIn(page, "coach@larchmere.test");
  const res = await page.goto("/admin");
  expect(res?.status()).toBe(403);
  await expect(page.getByTestId("forbidden")).toBeVisible();
  await expect(page.getByRole("table")).toHaveCount(0);
});

test("an athlete cannot open the coach desk, an admin sees every account", async ({ browser }) => {
  const athlete = await browser.newPage();
  await signIn(athlete, "tomas@larchmere.test");
  await expect(athlete).toHaveURL(/\/athlete$/);
  expect((await athlete.goto("/coach"))?.status()).toBe(403);
  await athlete.close();

  const admin = await browser.newPage();
  await signIn(admin, "admin@larchmere.test");
  await expect(admin).toHaveURL(/\/admin$/);
  await expect(admin.getByRole("cell", { name: "coach@larchmere.test" })).toBeVisible();
  await admin.close();
});

test("an admin disables an account: its open session ends and sign-in is refused until it is enabled again", async ({ browser }) => {
  const email = `disable-${Date.now()}@example.test`;
  const coach = await (await browser.newContext()).newPage();
  await coach.goto("/signup");
  await coach.getByLabel("Your name").fill("Dara Example");
  await coach.getByLabel("E-mail").fill(email);
  await coach.getByLabel("Password").fill("a-long-enough-secret");
  await coach.getByRole("button", { name: "Create coach account" }).click();
  await expect(coach).toHaveURL(/\/coach$/);

  const admin = await (await browser.newContext()).newPage();
  await signIn(admin, "admin@larchmere.test");
  const row = admin.getByTestId("account-row").filter({ hasText: email });
  await row.getByRole("button", { name: "Disable Dara Example" }).click();
  await row.getByRole("button", { name: "Disable", exact: true }).click();
  await expect(row).toHaveAttribute("data-state", "disabled");

  await coach.goto("/coach");
  await expect(coach).toHaveURL(/\/signin/);
  await coach.getByLabel("E-mail").fill(email);
  await coach.getByLabel("Password").fill("a-long-enough-secret");
  await coach.getByRole("button", { name: "Sign in" }).click();
  await expect(coach.getByTestId("form-error")).toBeVisible();

  // The admin's own row cannot be changed, so an admin never locks themself out.
  await expect(admin.getByTestId("account-row").filter({ hasText: "admin@larchmere.test" }).getByLabel(/^Role of/)).toBeDisabled();
  await row.getByRole("button", { name: "Enable Dara Example" }).click();
  await expect(row).toHaveAttribute("data-state", "active");
  await signIn(coach, email, "a-long-enough-secret");
  await expect(coach).toHaveURL(/\/coach$/);
});

test("/api/health reports the app and the database", async ({ request }) => {
  const res = await request.get("/api/health");
  expect(res.status()).toBe(200);
  const body = await res.json();
  expect(body.app.ok).toBe(true);
  expect(body.database.ok).toBe(true);
  expect(typeof body.database.latencyMs).toBe("number");
});

test("a password reset signs out the session already open on another device, and the new password signs in", async ({ browser }) => {
  const email = `reset-${Date.now()}@example.test`;
  const laptop = await (await browser.newContext()).newPage();
  await laptop.goto("/signup");
  await laptop.getByLabel("Your name").fill("Bea Example");
  await laptop.getByLabel("E-mail").fill(email);
  await laptop.getByLabel("Password").fill("first-long-secret");
  await laptop.getByRole("button", { name: "Create coach account" }).click();
  await expect(laptop).toHaveURL(/\/coach$/);

  // From another device, ask for a link and choose a new password.
  const phone = await (await browser.newContext()).newPage();
  await phone.goto("/reset");
  await phone.getByLabel("E-mail").fill(email);
  await phone.getByRole("button", { name: "Send me a link" }).click();
  const admin = await (await browser.newContext()).newPage();
  await signIn(admin, "admin@larchmere.test");
  await expect(async () => {
    await admin.goto("/admin/mailbox");
    await expect(admin.getByTestId("mail-message").filter({ hasText: email })).toHaveCount(1, { timeout: 1_000 });
  }).toPass();
  const link = await admin.getByTestId("mail-message").filter({ hasText: email }).getByTestId("mail-link").first().getAttribute("href");
  await phone.goto(link as string);
  await phone.getByLabel("New password").fill("second-long-secret");
  await phone.getByLabel("Repeat the password").fill("second-long-secret");
  await phone.getByRole("button", { name: /password/i }).click();
  await expect(phone).toHaveURL(/\/signin\?/);

  // The laptop's open session ends: pages send it to sign in, the API answers 401.
  await laptop.goto("/coach");
  await expect(laptop).toHaveURL(/\/signin/);
  expect((await laptop.request.get("/api/templates")).status()).toBe(401);
  await signIn(phone, email, "second-long-secret");
  await expect(phone).toHaveURL(/\/coach$/);
});
