import { expect, test } from "@playwright/test";
import { signIn } from "./support";

const WEEKDAYS = ["Sun", "Mon", "Tue", "Wed", "Thu", "Fri", "Sat"];

test("a coach invites an athlete by e-mail, the athlete joins, and today's session shows loads from the max the coach entered", async ({ browser }) => {
  test.setTimeout(150_000);
  const email = `nadia.${Date.now()}@larchmere.test`;
  const today = new Date().toISOString().slice(0, 10);
  const todayLabel = WEEKDAYS[new Date(`${today}T12:00:00Z`).getUTCDay()];

  // The coach sends the invitation.
  const coach = await (await browser.newContext()).newPage();
  await signIn(coach, "coach@larchmere.test");
  await coach.goto("/coach/athletes");
  await coach.getByLabel("Athlete's e-mail").fill(email);
  await coach.getByLabel(/^Name/).fill("Nadia Ferreira");
  await coach.getByRole("button", { name: "Send invitation" }).click();
  await expect(coach.getByTestId("invite-status")).toContainText(email);
  await expect(coach.getByTestId("invitation-row").filter({ hasText: email })).toHaveAttribute("data-state", "pending");

  // The message lands in the fake mailbox, which an admin can read.
  const admin = await (await browser.newContext()).newPage();
  await signIn(admin, "admin@larchmere.test");
  await admin.goto("/admin/mailbox");
  const mail = admin.getByTestId("mail-message").filter({ hasText: email }).first();
  await expect(mail.getByTestId("mail-subject")).toHaveText("Rowan Hale invited you to train on Ironquill");
  const link = await mail.getByTestId("mail-link").getAttribute("href");
  expect(link).toMatch(/\/invite\/[A-Za-z0-9_-]{40,}$/);

  // The athlete opens the link and chooses a password.
  const athleteContext = await browser.newContext();
  const athlete = await athleteContext.newPage();
  await athlete.goto(link as string);
  await expect(athlete.getByRole("heading", { name: "Join Rowan Hale on Ironquill" })).toBeVisible();
  await athlete.getByLabel("Your name").fill("Nadia Ferreira");
  await athlete.getByLabel("New password").fill("squat-depth-2027");
  await athlete.getByLabel("Repeat the password").fill("squat-depth-2027");
  await athlete.getByRole("button", { name: "Create my account" }).click();
  await expect(athlete).toHaveURL(/\/athlete$/);

  // The link works once.
  const again = await (await browser.newContext()).newPage();
  await again.goto(link as string);
  await expect(again.getByTestId("invite-closed")).toHaveAttribute("data-state", "used");

  // A template with one day and no weekday, so the coach can put it on today.
  const created = await coach.request.post("/api/templates", {
    data: { title: "Heavy single day", source: "title: Heavy single day\nunits: kg\nday Heavy\n  back squat 3x5 @75%\n" },
  });
  expect(created.ok()).toBe(true);

  // The coach enters her squat max and assigns the template from today.
  await coach.goto("/coach/athletes");
  await coach.getByTestId("athlete-list").getByRole("link", { name: /Nadia Ferreira/ }).click();
  await expect(coach.getByRole("heading", { level: 1, name: "Nadia Ferreira" })).toBeVisible();
  const addMax = coach.getByRole("form", { name: "Add a max" });
  await addMax.getByLabel("Exercise", { exact: true }).fill("back squat");
  await addMax.getByLabel("Max", { exact: true }).fill("100");
  await addMax.getByLabel("Date measured").fill(today);
  await addMax.getByRole("button", { name: "Add max" }).click();
  await expect(coach.getByTestId("current-maxes")).toContainText("100");

  const assign = coach.getByTestId("assign-panel");
  await assign.getByLabel("Template", { exact: true }).selectOption({ label: "Heavy single day" });
  await expect(assign.getByLabel("Version", { exact: true })).toContainText("Version 1");
  await assign.getByLabel("First day of week 1").fill(today);
  for (const day of ["Mon", "Tue", "Wed", "Thu", "Fri", "Sat", "Sun"]) {
    const box = assign.getByLabel(day, { exact: true });
    if ((await box.isChecked()) !== (day === todayLabel)) await box.click();
  }
  await assign.getByRole("button", { name: "Assign" }).click();
  await expect(assign).toContainText("Nadia Ferreira assigned");

  // Today: 75 % of 100 kg = 75 kg (arithmetic from the profile); on a 20 kg bar (IWF men's bar)
  // each side takes (75 − 20) / 2 = 27.5 kg = 25 + 2.5 (fewest plates, heaviest first — common practice, no source).
  await athlete.goto("/athlete");
  const session = athlete.getByTestId("today-session").first();
  await expect(session).toContainText("back squat", { ignoreCase: true });
  await expect(session.getByTestId("session-load").first()).toContainText("75");
  await expect(session.getByTestId("session-plates").first()).toContainText("25");
  await expect(session.getByTestId("session-plates").first()).toContainText("2.5");
  await expect(athlete.getByText(/estimate/i).first()).toBeVisible();
});

test("another coach cannot open someone else's athlete, through the pages or the API", async ({ page, browser }) => {
  await signIn(page, "coach@larchmere.test");
  await page.goto("/coach/athletes");
  const href = (await page.getByTestId("athlete-list").getByRole("link").first().getAttribute("href")) as string;
  const id = href.split("/").pop() as string;
  expect((await page.request.get(`/api/athletes/${id}`)).status()).toBe(200);

  const other = await browser.newPage();
  await other.goto("/signup");
  await other.getByLabel("Your name").fill("Other Coach");
  await other.getByLabel("E-mail").fill(`other-${Date.now()}@example.test`);
  await other.getByLabel("Password").fill("another-long-secret");
  await other.getByRole("button", { name: "Create coach account" }).click();
  await expect(other).toHaveURL(/\/coach$/);
  expect((await other.goto(href))?.status()).toBe(404);
  expect((await other.goto(`${href}/calendar`))?.status()).toBe(404);
  expect((await other.request.get(`/api/athletes/${id}`)).status()).toBe(404);
  expect((await other.request.get(`/api/athletes/${id}/maxes`)).status()).toBe(404);
  const write = await other.request.post(`/api/athletes/${id}/maxes`, { data: { exercise: "back squat", value: 200, unit: "kg", date: "2026-01-05", kind: "1rm", source: "tested" } });
  expect(write.status()).toBe(404);
  await other.close();
});
