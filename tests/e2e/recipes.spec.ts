import { expect, type Page, test } from "@playwright/test";
import { signIn } from "./support";

type Row = { name: string; amount: string; kind: "g" | "ml" | "piece"; density?: string; pieceGrams?: string; energyKcal: string; protein: string; carbohydrate: string; fat: string; fibre?: string };

// Label values per 100 g (invented, typical of such foods).
const ROWS: Row[] = [
  { name: "Rolled oats", amount: "120", kind: "g", energyKcal: "375", protein: "13", carbohydrate: "60", fat: "7", fibre: "9" },
  { name: "Whole milk", amount: "400", kind: "ml", density: "1.03", energyKcal: "64", protein: "3.4", carbohydrate: "4.8", fat: "3.6" },
  { name: "Banana", amount: "2", kind: "piece", pieceGrams: "118", energyKcal: "89", protein: "1.1", carbohydrate: "20", fat: "0.3", fibre: "2.6" },
  { name: "Peanut butter", amount: "30", kind: "g", energyKcal: "600", protein: "25", carbohydrate: "12", fat: "50", fibre: "6" },
  { name: "Honey", amount: "20", kind: "ml", density: "1.4", energyKcal: "304", protein: "0.3", carbohydrate: "82", fat: "0" },
];

// Energy per serving (2 servings) as each row is filled, worked by hand from the labels:
// oats 120 g × 3.75 = 450 → 225; milk 412 g × 0.64 = 263.68 → +131.84 = 356.84;
// banana 236 g × 0.89 = 210.04 → +105.02 = 461.86; peanut butter 30 g × 6 = 180 → +90 = 551.86;
// honey 28 g × 3.04 = 85.12 → +42.56 = 594.42. Shown to the nearest kcal.
const ENERGY_AFTER = ["225", "357", "462", "552", "594"];

async function fillRow(page: Page, i: number, r: Row) {
  const f = (key: string) => page.getByTestId(`ingredient-${i}-${key}`);
  await f("name").fill(r.name);
  await f("kind").selectOption(r.kind);
  await f("amount").fill(r.amount);
  if (r.density) await f("density").fill(r.density);
  if (r.pieceGrams) await f("pieceGrams").fill(r.pieceGrams);
  await f("energyKcal").fill(r.energyKcal);
  await f("protein").fill(r.protein);
  await f("carbohydrate").fill(r.carbohydrate);
  await f("fat").fill(r.fat);
  if (r.fibre) await f("fibre").fill(r.fibre);
}

test("a coach writes a five-ingredient recipe, watches the per-serving values follow the typing, attaches it, and the athlete sees it", async ({ page, browser }) => {
  test.setTimeout(120_000);
  const title = `Oat bowl ${Date.now()}`;
  await signIn(page, "coach@larchmere.test");
  await page.goto("/coach/recipes/new");
  await page.getByLabel("Title").fill(title);
  await page.getByLabel("Servings").fill("2");

  for (const [i, row] of ROWS.entries()) {
    if (i > 0) await page.getByRole("button", { name: "Add ingredient" }).click();
    await fillRow(page, i, row);
    await expect(page.getByTestId("per-serving").getByTestId("per-serving-energy")).toContainText(ENERGY_AFTER[i]);
  }
  await page.locator("#step-0").fill("Soak the oats in the milk overnight; top with banana, peanut butter and honey.");
  await page.getByRole("button", { name: "Save recipe" }).click();
  await expect(page).toHaveURL(/\/coach\/recipes\/[0-9a-f-]{36}$/);

  // Tomas trains on the upper/lower template: attach the recipe to it.
  await page.getByLabel("Attach to a template").selectOption({ label: "Upper/lower, four days" });
  await page.getByRole("button", { name: "Attach to template" }).click();
  await expect(page.getByTestId("recipe-attachments")).toContainText("Upper/lower");

  const athlete = await browser.newPage();
  await signIn(athlete, "tomas@larchmere.test");
  await athlete.goto("/athlete/recipes");
  await expect(athlete.getByTestId("athlete-recipes")).toContainText(title);
  await athlete.close();
});
