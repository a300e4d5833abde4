import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import type { Kysely } from "kysely";
import { PDFParse } from "pdf-parse";
import type { Database } from "../../db/database";
import { createTemplate } from "../../db/templates";
import { OAT_BOWL } from "../../lib/nutrition/fixtures";
import { addPerson, migratedScratchDb, type Person } from "../support/people";
import { params, request } from "../support/requests";
import { insertAssignment } from "../support/training";

// The handlers ask for the session and the pool themselves; both are swapped here.
const h = vi.hoisted(() => ({
  db: null as unknown as Kysely<Database>,
  viewer: null as null | Person,
}));
vi.mock("@/server/auth", () => ({ getViewer: async () => h.viewer }));
vi.mock("@/db/client", async (importOriginal) => ({ ...(await importOriginal<object>()), getDb: () => h.db }));

const recipes = await import("../../app/api/recipes/route");
const one = await import("../../app/api/recipes/[id]/route");
const attachments = await import("../../app/api/recipes/[id]/attachments/route");
const attachment = await import("../../app/api/recipes/[id]/attachments/[attachmentId]/route");
const card = await import("../../app/api/recipes/[id]/card/route");
const { listAthleteRecipes } = await import("../../db/recipes");

const SOURCE = "title: Recipe test\nday A mon\n  back squat 3x5 @75%\n";
const OAT_RECIPE = { title: "Oat bowl", servings: 2, steps: ["Warm the milk", "Stir in the oats", ""], ingredients: OAT_BOWL };


async function pdfText(res: Response): Promise<string> {
  const parser = new PDFParse({ data: new Uint8Array(await res.arrayBuffer()) });
  try {
    return (await parser.getText()).text;
  } finally {
    await parser.destroy();
  }
}

describe("recipes through the route handlers", () => {
  let scratch: Awaited<ReturnType<typeof migratedScratchDb>>;
  let coach: Person, other: Person, tomas: Person, maya: Person, lena: Person;
  let templateId: string, mayaAssignment: string, lenaAssignment: string;

  beforeAll(async () => {
    scratch = await migratedScratchDb();
    h.db = scratch.db;
    coach = await addPerson(scratch.db, "rowan@r.test", "Rowan Hale", "coach");
    other = await addPerson(scratch.db, "sky@r.test", "Sky", "coach");
    tomas = await addPerson(scratch.db, "tomas@r.test", "Tomas", "athlete", coach.id);
    maya = await addPerson(scratch.db, "maya@r.test", "Maya", "athlete", coach.id);
    lena = await addPerson(scratch.db, "lena@r.test", "Lena", "athlete", coach.id);
    const template = await createTemplate(scratch.db, coach, { title: "Upper/Lower", source: SOURCE });
    templateId = template.id;
    const assign = (athleteId: string) => insertAssignment(scratch.db, { template, athleteId, coachId: coach.id, start: "2027-01-04" });
    await assign(tomas.id);
    mayaAssignment = await assign(maya.id);
    lenaAssignment = await assign(lena.id);
  });
  afterAll(async () => {
    await scratch?.drop();
  });

  it("answers 401 without a session and 403 when an athlete tries to write", async () => {
    h.viewer = null;
    expect((await recipes.GET()).status).toBe(401);
    h.viewer = tomas;
    const res = await recipes.POST(request("POST", "/api/recipes", OAT_RECIPE));
    expect(res.status).toBe(403);
    expect((await res.json()).error.code).toBe("forbidden");
  });

  it("refuses impossible labels with 422 naming the ingredient's field", async () => {
    h.viewer = coach;
    const noDensity = await recipes.POST(request("POST", "/api/recipes", { ...OAT_RECIPE, ingredients: [{ ...OAT_BOWL[1], density: null }] }));
    expect(noDensity.status).toBe(422);
    expect((await noDensity.json()).error.fields["ingredients.0.density"]).toBe("Give the density in g per ml (1.00 for water)");
    // 60 + 40 + 10 = 110 g of macros in 100 g of food.
    const tooMuch = await recipes.POST(request("POST", "/api/recipes", { ...OAT_RECIPE, ingredients: [OAT_BOWL[0], { ...OAT_BOWL[3], protein: 60, carbohydrate: 40, fat: 10, fibre: null }] }));
    expect(tooMuch.status).toBe(422);
    const { error } = await tooMuch.json();
    expect(error.code).toBe("invalid_input");
    expect(error.fields["ingredients.1.macros"]).toMatch(/add up to 110 g per 100 g/);
    const negative = await recipes.POST(request("POST", "/api/recipes", { ...OAT_RECIPE, ingredients: [{ ...OAT_BOWL[0], amount: -80 }] }));
    expect((await negative.json()).error.fields["ingredients.0.amount"]).toBe("The amount must be more than 0");
    const broken = await recipes.POST(request("POST", "/api/recipes", '{"title": "x",'));
    expect((await broken.json()).error.message).toBe("The request body is not valid JSON.");
  });

  it("keeps the database from storing an impossible label whoever writes it", async () => {
    const r = await scratch.db.insertInto("recipes").values({ owner_id: coach.id, title: "Raw", servings: 1, steps: [] }).returning("id").executeTakeFirstOrThrow();
    const row = { recipe_id: r.id, position: 0, name: "x", kind: "g" as const, amount: 10, density: null, piece_grams: null, energy_kcal: 500, protein: 50, carbohydrate: 50, fat: 10, fibre: null };
    await expect(scratch.db.insertInto("recipe_ingredients").values(row).execute()).rejects.toThrow(/recipe_ingredients_macro_sum/);
    await expect(scratch.db.insertInto("recipe_ingredients").values({ ...row, fat: 0, kind: "ml" }).execute()).rejects.toThrow(/recipe_ingredients_density_with_ml/);
    await scratch.db.deleteFrom("recipes").where("id", "=", r.id).execute();
  });

  it("creates a recipe and works out per-serving values as done by hand", async () => {
    h.viewer = coach;
    const res = await recipes.POST(request("POST", "/api/recipes", OAT_RECIPE));
    expect(res.status).toBe(201);
    const { recipe } = await res.json();
    // Worked by hand in lib/nutrition/recipe.test.ts: 1188.84 kcal, 39.788 g protein, 165.536 g carbohydrate,
    // 38.94 g fat over 2 servings (labels summed; Atwater 4/4/9 only flags, Merrill & Watt 1955, USDA Handbook 74).
    expect(recipe.perServing.energyKcal).toBeCloseTo(594.42, 9);
    expect(recipe.perServing.protein).toBeCloseTo(19.894, 9);
    expect(recipe.perServing.carbohydrate).toBeCloseTo(82.768, 9);
    expect(recipe.perServing.fat).toBeCloseTo(19.47, 9);
    expect(recipe.steps).toEqual(["Warm the milk", "Stir in the oats"]);
    expect(recipe.ingredients.map((i: { name: string }) => i.name)).toEqual(OAT_BOWL.map((i) => i.name));
    expect(recipe.by).toBe("Rowan Hale");
    const list = await (await recipes.GET()).json();
    expect(list.items).toEqual([expect.objectContaining({ id: recipe.id, ingredientCount: 5, attachmentCount: 0 })]);
  });

  it("keeps per-serving values when the recipe is rewritten for twice the servings", async () => {
    h.viewer = coach;
    const { recipe } = await (await recipes.POST(request("POST", "/api/recipes", OAT_RECIPE))).json();
    const doubled = { ...OAT_RECIPE, servings: 4, ingredients: OAT_BOWL.map((i) => ({ ...i, amount: i.amount * 2 })) };
    const res = await one.PUT(request("PUT", "", doubled), params({ id: recipe.id }));
    expect(res.status).toBe(200);
    const after = (await res.json()).recipe;
    expect(after.servings).toBe(4);
    expect(after.perServing.energyKcal).toBeCloseTo(recipe.perServing.energyKcal, 9);
    expect(after.perServing.fat).toBeCloseTo(recipe.perServing.fat, 9);
    expect((await one.DELETE(request("DELETE", ""), params({ id: recipe.id }))).status).toBe(200);
    expect((await one.GET(request("GET", ""), params({ id: recipe.id }))).status).toBe(404);
  });

  it("answers another coach exactly as for a missing recipe", async () => {
    h.viewer = coach;
    const { items } = await (await recipes.GET()).json();
    const id = items[0].id;
    h.viewer = other;
    for (const res of [
      await one.GET(request("GET", ""), params({ id })),
      await one.PUT(request("PUT", "", OAT_RECIPE), params({ id })),
      await one.DELETE(request("DELETE", ""), params({ id })),
      await attachments.POST(request("POST", "", { templateId }), params({ id })),
      await card.GET(request("GET", "?size=a6"), params({ id })),
    ]) {
      expect(res.status).toBe(404);
      expect((await res.json()).error.message).toBe("That recipe does not exist or is not yours.");
    }
    expect((await (await recipes.GET()).json()).items).toEqual([]);
    h.viewer = coach;
    const notMine = await attachments.POST(request("POST", "", { assignmentId: "00000000-0000-4000-8000-000000000000" }), params({ id }));
    expect(notMine.status).toBe(404);
    expect((await notMine.json()).error.fields.assignmentId).toBe("Pick one of your athletes' assignments");
  });

  it("shows a recipe to the athletes of the template or the assignment it is attached to, and to no one else", async () => {
    h.viewer = coach;
    const { items } = await (await recipes.GET()).json();
    const id = items[0].id;
    const byTemplate = await attachments.POST(request("POST", "", { templateId }), params({ id }));
    expect(byTemplate.status).toBe(201);
    expect((await byTemplate.json()).attachments).toEqual([expect.objectContaining({ kind: "template", templateTitle: "Upper/Lower" })]);
    const both = await attachments.POST(request("POST", "", { templateId: "x", assignmentId: "y" }), params({ id }));
    expect(both.status).toBe(422);

    // Everyone on the template sees it: through the API, the list and the card.
    for (const athlete of [tomas, maya]) {
      h.viewer = athlete;
      const res = await one.GET(request("GET", ""), params({ id }));
      expect(res.status).toBe(200);
      expect((await res.json()).recipe.title).toBe("Oat bowl");
      expect((await listAthleteRecipes(scratch.db, athlete)).map((r) => [r.title, r.via])).toEqual([["Oat bowl", ["Upper/Lower"]]]);
    }

    // An ended assignment no longer shows the template's recipes.
    await scratch.db.updateTable("template_assignments").set({ status: "ended" }).where("id", "=", lenaAssignment).execute();
    h.viewer = lena;
    expect((await one.GET(request("GET", ""), params({ id }))).status).toBe(404);
    expect(await listAthleteRecipes(scratch.db, lena)).toEqual([]);

    // Moved from the template to Maya's assignment alone: Tomas loses it, Maya keeps it.
    h.viewer = coach;
    const attached = await (await attachments.POST(request("POST", "", { assignmentId: mayaAssignment }), params({ id }))).json();
    const onTemplate = attached.attachments.find((a: { kind: string }) => a.kind === "template");
    expect(attached.attachments.find((a: { kind: string }) => a.kind === "assignment")).toMatchObject({ athleteName: "Maya", startDate: "2027-01-04" });
    const left = await attachment.DELETE(request("DELETE", ""), params({ id, attachmentId: onTemplate.id }));
    expect((await left.json()).attachments).toHaveLength(1);
    h.viewer = tomas;
    expect((await one.GET(request("GET", ""), params({ id }))).status).toBe(404);
    h.viewer = maya;
    expect((await one.GET(request("GET", ""), params({ id }))).status).toBe(200);
  });

  it("prints the recipe card in A6, A5 and Letter with the per-serving values", async () => {
    h.viewer = maya;
    const id = (await listAthleteRecipes(scratch.db, maya))[0].id;
    // ISO 216: A6 105 × 148 mm, A5 148 × 210 mm; US Letter 8.5 × 11 in; 72 pt per inch.
    const sizes = { a6: [297.64, 419.53], a5: [419.53, 595.28], letter: [612, 792] } as const;
    for (const [size, [w, hgt]] of Object.entries(sizes)) {
      const res = await card.GET(request("GET", `/api/recipes/${id}/card?size=${size}`), params({ id }));
      expect(res.status).toBe(200);
      expect(res.headers.get("content-type")).toBe("application/pdf");
      expect(res.headers.get("content-disposition")).toMatch(new RegExp(`^attachment; filename="recipe-oat-bowl-${size}\\.pdf"`));
      const bytes = Buffer.from(await res.clone().arrayBuffer());
      const box = /MediaBox \[0 0 ([\d.]+) ([\d.]+)\]/.exec(bytes.toString("latin1"));
      expect([Number(box?.[1]), Number(box?.[2])].map((n) => Math.round(n * 100) / 100)).toEqual([w, hgt]);
      const text = await pdfText(res);
      // Rounded per the EU labelling guidance (from memory): 594.42 → 594 kcal, 19.894 → 20 g, 82.768 → 83 g, 19.47 → 19 g.
      expect(text).toContain("Energy 594 kcal 1189 kcal");
      expect(text).toContain("Protein 20 g 40 g");
      expect(text).toContain("Carbohydrate 83 g 166 g");
      expect(text).toContain("Fat 19 g 39 g");
      expect(text).toContain("400 ml Whole milk (412 g)");
      expect(text).toContain("1. Warm the milk");
    }
    const bad = await card.GET(request("GET", `/api/recipes/${id}/card?size=b5`), params({ id }));
    expect(bad.status).toBe(422);
    expect((await bad.json()).error.fields.size).toBe("size is a6, a5 or letter");
  });
});
