import { type Kysely, sql } from "kysely";

// Frozen: never edit a migration that has shipped; add a new one instead.
// A coach's recipes, their ingredients with label values per 100 g, and the
// templates or assignments they are attached to. The checks repeat
// lib/nutrition/rules.ts so that no writer can store an impossible label.
export async function up(db: Kysely<any>): Promise<void> {
  const id = (c: any) => c.primaryKey().defaultTo(sql`gen_random_uuid()`);
  const now = (c: any) => c.notNull().defaultTo(sql`now()`);

  await db.schema
    .createTable("recipes")
    .addColumn("id", "uuid", id)
    .addColumn("owner_id", "uuid", (c) => c.notNull().references("users.id").onDelete("cascade"))
    .addColumn("title", "text", (c) => c.notNull().check(sql`char_length(title) between 1 and 120`))
    .addColumn("servings", "integer", (c) => c.notNull().check(sql`servings between 1 and 100`))
    .addColumn("steps", sql`text[]`, (c) => c.notNull().defaultTo(sql`'{}'::text[]`).check(sql`cardinality(steps) <= 30`))
    .addColumn("created_at", "timestamptz", now)
    .addColumn("updated_at", "timestamptz", now)
    .execute();
  await sql`create index recipes_owner on recipes (owner_id, updated_at desc)`.execute(db);

  const per100 = (name: string, max: number) => (c: any) => c.notNull().check(sql`${sql.ref(name)} >= 0 and ${sql.ref(name)} <= ${sql.lit(max)}`);
  await db.schema
    .createTable("recipe_ingredients")
    .addColumn("id", "uuid", id)
    .addColumn("recipe_id", "uuid", (c) => c.notNull().references("recipes.id").onDelete("cascade"))
    .addColumn("position", "integer", (c) => c.notNull().check(sql`position >= 0 and position < 40`))
    .addColumn("name", "text", (c) => c.notNull().check(sql`char_length(name) between 1 and 80`))
    .addColumn("kind", "text", (c) => c.notNull().check(sql`kind in ('g', 'ml', 'piece')`))
    .addColumn("amount", "float8", (c) => c.notNull().check(sql`amount > 0 and amount <= 10000`))
    .addColumn("density", "float8", (c) => c.check(sql`density >= 0.1 and density <= 3`))
    .addColumn("piece_grams", "float8", (c) => c.check(sql`piece_grams > 0 and piece_grams <= 5000`))
    .addColumn("energy_kcal", "float8", per100("energy_kcal", 900))
    .addColumn("protein", "float8", per100("protein", 100))
    .addColumn("carbohydrate", "float8", per100("carbohydrate", 100))
    .addColumn("fat", "float8", per100("fat", 100))
    .addColumn("fibre", "float8", (c) => c.check(sql`fibre >= 0 and fibre <= 100`))
    .addCheckConstraint("recipe_ingredients_density_with_ml", sql`(kind = 'ml') = (density is not null)`)
    .addCheckConstraint("recipe_ingredients_piece_weight", sql`(kind = 'piece') = (piece_grams is not null)`)
    // 100 g of food holds at most 100 g of macros; 2 g allows for each value rounded on the label.
    .addCheckConstraint("recipe_ingredients_macro_sum", sql`protein + carbohydrate + fat + coalesce(fibre, 0) <= 102`)
    .addUniqueConstraint("recipe_ingredients_position", ["recipe_id", "position"])
    .execute();

  // Exactly one of template or assignment; a recipe is attached to each at most once.
  await db.schema
    .createTable("recipe_attachments")
    .addColumn("id", "uuid", id)
    .addColumn("recipe_id", "uuid", (c) => c.notNull().references("recipes.id").onDelete("cascade"))
    .addColumn("template_id", "uuid", (c) => c.references("templates.id").onDelete("cascade"))
    .addColumn("assignment_id", "uuid", (c) => c.references("template_assignments.id").onDelete("cascade"))
    .addColumn("attached_by", "uuid", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", now)
    .addCheckConstraint("recipe_attachments_one_target", sql`num_nonnulls(template_id, assignment_id) = 1`)
    .execute();
  await sql`create unique index recipe_attachments_template on recipe_attachments (template_id, recipe_id) where template_id is not null`.execute(db);
  await sql`create unique index recipe_attachments_assignment on recipe_attachments (assignment_id, recipe_id) where assignment_id is not null`.execute(db);
  await sql`create index recipe_attachments_recipe on recipe_attachments (recipe_id)`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  for (const t of ["recipe_attachments", "recipe_ingredients", "recipes"]) await db.schema.dropTable(t).execute();
}
