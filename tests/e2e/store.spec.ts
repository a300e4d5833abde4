import { expect, test } from "@playwright/test";
import { signIn } from "./support";

test("a visitor browses the store, pays on the provider's checkout page, gets their own copy and starts it", async ({ page, browser }) => {
  test.setTimeout(180_000);
  const email = `buyer-${Date.now()}@example.test`;

  await page.goto("/store");
  const card = page.getByTestId("listing-card").first();
  await expect(card).toBeVisible();
  await card.getByRole("link").first().click();
  await expect(page.getByTestId("listing-price")).toBeVisible();
  await expect(page.getByTestId("listing-preview")).toBeVisible();

  // Sign up while buying.
  await page.getByLabel("Your name").fill("Iris Calloway");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill("a-long-enough-secret");
  await page.getByRole("button", { name: /^Create account and buy for / }).click();

  // The provider's hosted page (the local fake); paying sends the signed event to our webhook.
  await page.getByRole("button", { name: /^Pay / }).click();
  // The success page waits for the webhook, then opens the buyer's copy.
  await expect(page).toHaveURL(/\/store\/purchases\/[0-9a-f-]{36}$/, { timeout: 30_000 });

  // Enter a max, then start the programme.
  await page.getByLabel(/back squat/i).fill("80");
  await page.getByRole("button", { name: "Save maxes" }).click();
  await page.getByRole("button", { name: "Start this programme" }).click();
  await expect(page.getByTestId("programme-started")).toContainText("Started");

  await page.goto("/store/purchases");
  await expect(page.getByTestId("purchases")).toContainText(/First steps/i);

  // The seller sees the sale.
  const coach = await browser.newPage();
  await signIn(coach, "coach@larchmere.test");
  await coach.goto("/coach/sales");
  await expect(coach.getByTestId("sales-table")).toContainText(email);
  await expect(coach.getByTestId("sales-totals")).toBeVisible();
  await coach.close();
});

test("the webhook refuses an unsigned event and the checkout API refuses bad input, without a 500", async ({ request }) => {
  const forged = await request.post("/api/webhooks/payments", { data: { id: "evt_forged", type: "checkout.session.completed" } });
  expect(forged.status()).toBe(401);
  const anon = await request.post("/api/store/checkout", { data: { listingId: "nope" } });
  expect([401, 422]).toContain(anon.status());
});
