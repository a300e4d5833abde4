import { type Kysely, sql } from "kysely";

// Frozen: never edit a migration that has shipped; add a new one instead.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable("coach_exercises")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("owner_id", "uuid", (c) => c.notNull().references("users.id").onDelete("cascade"))
    .addColumn("name", "text", (c) => c.notNull().check(sql`char_length(name) between 1 and 80`))
    .addColumn("aliases", sql`text[]`, (c) => c.notNull().defaultTo(sql`'{}'::text[]`).check(sql`cardinality(aliases) <= 12`))
    .addColumn("equipment", "text", (c) =>
      c.notNull().check(sql`equipment in ('barbell', 'dumbbell', 'cable', 'machine', 'bodyweight', 'other')`),
    )
    .addColumn("primary_muscles", sql`text[]`, (c) => c.notNull().defaultTo(sql`'{}'::text[]`).check(sql`cardinality(primary_muscles) <= 8`))
    // Free text: the suggested patterns cover most lifts, but a coach may name their own.
    .addColumn("movement_pattern", "text", (c) => c.check(sql`char_length(movement_pattern) between 1 and 40`))
    .addColumn("cues", "text", (c) => c.notNull().defaultTo("").check(sql`char_length(cues) <= 2000`))
    .addColumn("substitution_group", "text", (c) => c.check(sql`char_length(substitution_group) between 1 and 60`))
    .addColumn("media_key", "text")
    .addColumn("media_type", "text", (c) =>
      c.check(sql`media_type in ('image/jpeg', 'image/png', 'image/webp', 'video/mp4', 'video/webm')`),
    )
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint("coach_exercises_media_pair", sql`(media_key is null) = (media_type is null)`)
    .execute();
  // Names are unique per coach ignoring case; aliases are checked by the query
  // module under a per-coach lock, since an index cannot span array elements of other rows.
  await sql`create unique index coach_exercises_owner_name on coach_exercises (owner_id, lower(name))`.execute(db);
  await sql`create unique index coach_exercises_media_key on coach_exercises (media_key) where media_key is not null`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable("coach_exercises").execute();
}
