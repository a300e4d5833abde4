import "server-only";
import { sql } from "kysely";
import { type Ingredient, type Nutrients, type RecipeInput, recipeInputSchema, recipeNutrition } from "../lib/nutrition";
import { type Actor, type Db } from "./athleteAccess";
import { DomainError } from "./domainError";
import { findOwnTemplate, inTransaction } from "./templateAccess";
import { isUuid } from "./templateRules";

/**
 * A coach's recipes: create, edit, delete, attach to one of their templates
 * or to an assignment of one of their athletes. Athletes read the recipes
 * attached to their active assignments or to those assignments' templates.
 * Anyone else's recipe answers exactly like a missing one.
 *
 * @example
 * const r = await createRecipe(db, coach, { title: "Oat bowl", servings: 2, steps: [], ingredients });
 * await attachRecipe(db, coach, r.id, { templateId });
 * await listAthleteRecipes(db, athlete); // [{ id, title, perServing, via: ["Upper/Lower"] … }]
 */

export type Attachment = {
  id: string;
  kind: "template" | "assignment";
  templateId: string;
  templateTitle: string;
  assignmentId: string | null;
  athleteName: string | null;
  startDate: string | null;
};

export type Recipe = {
  id: string;
  title: string;
  /** The coach who wrote it. */
  by: string;
  servings: number;
  steps: string[];
  ingredients: Ingredient[];
  perServing: Nutrients;
  updatedAt: Date;
};

export type RecipeSummary = Omit<Recipe, "steps" | "ingredients"> & { ingredientCount: number; attachmentCount: number };
export type RecipeDetail = Recipe & { attachments: Attachment[] };
export type AthleteRecipe = Recipe & { via: string[] };

export type AttachTargets = {
  templates: { id: string; title: string }[];
  assignments: { id: string; templateTitle: string; athleteName: string; startDate: string; status: "active" | "ended" }[];
};

export type AttachTarget = { templateId: string } | { assignmentId: string };

export function recipeNotFound(): DomainError {
  return new DomainError("not_found", "That recipe does not exist or is not yours.");
}

/** "ingredients.2.density" → "Ingredient 3, density", so the message names what the person sees. */
function fieldLabel(path: string): string {
  const m = /^ingredients\.(\d+)\.(\w+)$/.exec(path);
  if (m) return `Ingredient ${Number(m[1]) + 1}, ${m[2] === "macros" ? "protein, carbohydrate, fat and fibre" : m[2]}`;
  const s = /^steps\.(\d+)$/.exec(path);
  if (s) return `Step ${Number(s[1]) + 1}`;
  return path;
}

/** Parses a recipe with lib/nutrition's rules, or throws invalid_input naming every field at fault. */
export function checkRecipeInput(input: unknown): RecipeInput {
  const parsed = recipeInputSchema.safeParse(input);
  if (parsed.success) return parsed.data;
  const fields: Record<string, string> = {};
  for (const issue of parsed.error.issues) fields[issue.path.join(".") || "_"] ??= issue.message;
  const [field, message] = Object.entries(fields)[0];
  throw new DomainError("invalid_input", field === "_" ? message : `${fieldLabel(field)}: ${message}`, fields);
}

type RecipeRow = { id: string; title: string; by: string; servings: number; steps: string[]; updated_at: Date };

async function ingredientsOf(db: Db, recipeIds: string[]): Promise<Map<string, Ingredient[]>> {
  const out = new Map<string, Ingredient[]>(recipeIds.map((id) => [id, []]));
  if (recipeIds.length === 0) return out;
  const rows = await db
    .selectFrom("recipe_ingredients")
    .selectAll()
    .where("recipe_id", "in", recipeIds)
    .orderBy("recipe_id")
    .orderBy("position")
    .execute();
  for (const r of rows) {
    out.get(r.recipe_id)?.push({
      name: r.name,
      kind: r.kind,
      amount: r.amount,
      density: r.density,
      pieceGrams: r.piece_grams,
      energyKcal: r.energy_kcal,
      protein: r.protein,
      carbohydrate: r.carbohydrate,
      fat: r.fat,
      fibre: r.fibre,
    });
  }
  return out;
}

function toRecipe(row: RecipeRow, ingredients: Ingredient[]): Recipe {
  return {
    id: row.id,
    title: row.title,
    by: row.by,
    servings: row.servings,
    steps: row.steps,
    ingredients,
    perServing: recipeNutrition(ingredients, row.servings).perServing,
    updatedAt: row.updated_at,
  };
}

async function recipesByIds(db: Db, rows: RecipeRow[]): Promise<Recipe[]> {
  const ingredients = await ingredientsOf(db, rows.map((r) => r.id));
  return rows.map((r) => toRecipe(r, ingredients.get(r.id) ?? []));
}

function ownRecipeQuery(db: Db, actor: Actor) {
  return db
    .selectFrom("recipes as r")
    .innerJoin("users as o", "o.id", "r.owner_id")
    .select(["r.id", "r.title", "o.name as by", "r.servings", "r.steps", "r.updated_at"])
    .where("r.owner_id", "=", actor.id);
}

async function findOwnRecipe(db: Db, actor: Actor, id: string, lock = false): Promise<RecipeRow | null> {
  if (actor.role !== "coach" || !isUuid(id)) return null;
  let q = ownRecipeQuery(db, actor).where("r.id", "=", id);
  if (lock) q = q.forUpdate("r");
  return (await q.executeTakeFirst()) ?? null;
}

/** The coach's recipes, most recently changed first, each with its per-serving values. */
export async function listRecipes(db: Db, actor: Actor): Promise<RecipeSummary[]> {
  if (actor.role !== "coach") return [];
  const rows = await ownRecipeQuery(db, actor).orderBy("r.updated_at", "desc").orderBy("r.id").limit(500).execute();
  const recipes = await recipesByIds(db, rows);
  const counts = new Map<string, number>();
  if (rows.length > 0) {
    const c = await db
      .selectFrom("recipe_attachments")
      .select(["recipe_id", (eb) => eb.fn.countAll<string>().as("n")])
      .where("recipe_id", "in", rows.map((r) => r.id))
      .groupBy("recipe_id")
      .execute();
    for (const r of c) counts.set(r.recipe_id, Number(r.n));
  }
  return recipes.map(({ steps: _s, ingredients, ...r }) => ({ ...r, ingredientCount: ingredients.length, attachmentCount: counts.get(r.id) ?? 0 }));
}

async function attachmentsOf(db: Db, recipeId: string): Promise<Attachment[]> {
  const rows = await db
    .selectFrom("recipe_attachments as a")
    .leftJoin("template_assignments as x", "x.id", "a.assignment_id")
    .leftJoin("users as u", "u.id", "x.athlete_id")
    .innerJoin("templates as t", (j) => j.on(sql<boolean>`t.id = coalesce(a.template_id, x.template_id)`))
    .select(["a.id", "a.template_id", "a.assignment_id", "t.id as tid", "t.title", "u.name as athlete", "x.start_date"])
    .where("a.recipe_id", "=", recipeId)
    .orderBy("a.created_at")
    .execute();
  return rows.map((r) => ({
    id: r.id,
    kind: r.assignment_id ? "assignment" : "template",
    templateId: r.tid,
    templateTitle: r.title,
    assignmentId: r.assignment_id,
    athleteName: r.athlete ?? null,
    startDate: r.start_date ?? null,
  }));
}

/** One of the coach's recipes with where it is attached; null when it is not theirs. */
export async function getRecipe(db: Db, actor: Actor, id: string): Promise<RecipeDetail | null> {
  const row = await findOwnRecipe(db, actor, id);
  if (!row) return null;
  const [recipe] = await recipesByIds(db, [row]);
  return { ...recipe, attachments: await attachmentsOf(db, id) };
}

async function writeIngredients(db: Db, recipeId: string, ingredients: Ingredient[]): Promise<void> {
  await db.deleteFrom("recipe_ingredients").where("recipe_id", "=", recipeId).execute();
  await db
    .insertInto("recipe_ingredients")
    .values(
      ingredients.map((i, position) => ({
        recipe_id: recipeId,
        position,
        name: i.name,
        kind: i.kind,
        amount: i.amount,
        density: i.density,
        piece_grams: i.pieceGrams,
        energy_kcal: i.energyKcal,
        protein: i.protein,
        carbohydrate: i.carbohydrate,
        fat: i.fat,
        fibre: i.fibre,
      })),
    )
    .execute();
}

export async function createRecipe(db: Db, actor: Actor, input: unknown): Promise<RecipeDetail> {
  if (actor.role !== "coach") throw new DomainError("forbidden", "Only coaches write recipes.");
  const r = checkRecipeInput(input);
  const id = await inTransaction(db, async (trx) => {
    const row = await trx
      .insertInto("recipes")
      .values({ owner_id: actor.id, title: r.title, servings: r.servings, steps: r.steps })
      .returning("id")
      .executeTakeFirstOrThrow();
    await writeIngredients(trx, row.id, r.ingredients);
    return row.id;
  });
  return (await getRecipe(db, actor, id))!;
}

/** Replaces the recipe's title, servings, steps and ingredients; attachments stay. */
export async function updateRecipe(db: Db, actor: Actor, id: string, input: unknown): Promise<RecipeDetail> {
  const r = checkRecipeInput(input);
  await inTransaction(db, async (trx) => {
    if (!(await findOwnRecipe(trx, actor, id, true))) throw recipeNotFound();
    await trx.updateTable("recipes").set({ title: r.title, servings: r.servings, steps: r.steps, updated_at: new Date() }).where("id", "=", id).execute();
    await writeIngredients(trx, id, r.ingredients);
  });
  return (await getRecipe(db, actor, id))!;
}

export async function deleteRecipe(db: Db, actor: Actor, id: string): Promise<{ deleted: true }> {
  if (!(await findOwnRecipe(db, actor, id))) throw recipeNotFound();
  await db.deleteFrom("recipes").where("id", "=", id).where("owner_id", "=", actor.id).execute();
  return { deleted: true };
}

/** Assignments the coach manages: those of athletes on their roster. */
function managedAssignments(db: Db, actor: Actor) {
  return db
    .selectFrom("template_assignments as x")
    .innerJoin("users as u", "u.id", "x.athlete_id")
    .innerJoin("templates as t", "t.id", "x.template_id")
    .where("u.coach_id", "=", actor.id)
    .where("u.disabled_at", "is", null);
}

/** Where the coach may attach a recipe: their templates (not archived) and their athletes' assignments. */
export async function attachTargets(db: Db, actor: Actor): Promise<AttachTargets> {
  if (actor.role !== "coach") return { templates: [], assignments: [] };
  const [templates, assignments] = await Promise.all([
    db.selectFrom("templates").select(["id", "title"]).where("owner_id", "=", actor.id).where("archived_at", "is", null).orderBy("title").limit(500).execute(),
    managedAssignments(db, actor)
      .select(["x.id", "t.title", "u.name", "x.start_date", "x.status"])
      .orderBy("x.status")
      .orderBy("x.start_date", "desc")
      .limit(500)
      .execute(),
  ]);
  return {
    templates,
    assignments: assignments.map((a) => ({ id: a.id, templateTitle: a.title, athleteName: a.name, startDate: a.start_date, status: a.status })),
  };
}

/** Attaches the recipe (once) to one of the coach's templates or their athletes' assignments. */
export async function attachRecipe(db: Db, actor: Actor, id: string, target: AttachTarget): Promise<Attachment[]> {
  if (!(await findOwnRecipe(db, actor, id))) throw recipeNotFound();
  let values: { template_id: string | null; assignment_id: string | null };
  if ("templateId" in target) {
    if (!(await findOwnTemplate(db, actor, target.templateId))) {
      throw new DomainError("not_found", "That template does not exist or is not yours.", { templateId: "Pick one of your templates" });
    }
    values = { template_id: target.templateId, assignment_id: null };
  } else {
    const found = isUuid(target.assignmentId) && (await managedAssignments(db, actor).select("x.id").where("x.id", "=", target.assignmentId).executeTakeFirst());
    if (!found) throw new DomainError("not_found", "That assignment does not exist or is not one of your athletes'.", { assignmentId: "Pick one of your athletes' assignments" });
    values = { template_id: null, assignment_id: target.assignmentId };
  }
  await db
    .insertInto("recipe_attachments")
    .values({ recipe_id: id, ...values, attached_by: actor.id })
    .onConflict((oc) => oc.doNothing())
    .execute();
  return attachmentsOf(db, id);
}

export async function detachRecipe(db: Db, actor: Actor, id: string, attachmentId: string): Promise<Attachment[]> {
  if (!(await findOwnRecipe(db, actor, id))) throw recipeNotFound();
  const gone = isUuid(attachmentId) && (await db.deleteFrom("recipe_attachments").where("id", "=", attachmentId).where("recipe_id", "=", id).executeTakeFirst());
  if (!gone || gone.numDeletedRows === BigInt(0)) throw new DomainError("not_found", "That recipe is not attached there.");
  return attachmentsOf(db, id);
}

/**
 * The recipes an athlete sees: attached to one of their active assignments or
 * to the template of one, each with the programme titles it came through.
 */
export async function listAthleteRecipes(db: Db, actor: Actor, onlyId?: string): Promise<AthleteRecipe[]> {
  if (actor.role !== "athlete") return [];
  if (onlyId !== undefined && !isUuid(onlyId)) return [];
  let q = db
    .selectFrom("template_assignments as x")
    .innerJoin("recipe_attachments as a", (j) => j.on(sql<boolean>`(a.assignment_id = x.id or a.template_id = x.template_id)`))
    .innerJoin("templates as t", "t.id", "x.template_id")
    .innerJoin("recipes as r", "r.id", "a.recipe_id")
    .innerJoin("users as o", "o.id", "r.owner_id")
    .select(["r.id", "r.title", "o.name as by", "r.servings", "r.steps", "r.updated_at", "t.title as via"])
    .where("x.athlete_id", "=", actor.id)
    .where("x.status", "=", "active");
  if (onlyId) q = q.where("r.id", "=", onlyId);
  const rows = await q.orderBy("r.title").orderBy("r.id").execute();
  const byId = new Map<string, { row: RecipeRow; via: Set<string> }>();
  for (const r of rows) {
    const entry = byId.get(r.id) ?? { row: r, via: new Set<string>() };
    entry.via.add(r.via);
    byId.set(r.id, entry);
  }
  const entries = [...byId.values()];
  const recipes = await recipesByIds(db, entries.map((e) => e.row));
  return recipes.map((r, i) => ({ ...r, via: [...entries[i].via] }));
}

/** A recipe the actor may read: their own (coach) or one attached to their programme (athlete). */
export async function readableRecipe(db: Db, actor: Actor, id: string): Promise<Recipe | null> {
  if (actor.role === "coach") return getRecipe(db, actor, id);
  if (actor.role === "athlete") return (await listAthleteRecipes(db, actor, id))[0] ?? null;
  return null;
}
