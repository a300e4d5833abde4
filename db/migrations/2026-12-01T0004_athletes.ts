import { type Kysely, sql } from "kysely";

// Frozen: never edit a migration that has shipped; add a new one instead.
// Athletes' gyms and maxes, invitations, password resets, assignments of a
// template version, the dated sessions they expand into, calendar feeds and
// the progress rows of background jobs.
export async function up(db: Kysely<any>): Promise<void> {
  const id = (c: any) => c.primaryKey().defaultTo(sql`gen_random_uuid()`);
  const now = (c: any) => c.notNull().defaultTo(sql`now()`);
  const user = (c: any) => c.notNull().references("users.id").onDelete("cascade");

  await db.schema
    .createTable("athlete_profiles")
    .addColumn("user_id", "uuid", (c) => c.primaryKey().references("users.id").onDelete("cascade"))
    .addColumn("units", "text", (c) => c.notNull().check(sql`units in ('kg', 'lb')`))
    .addColumn("bodyweight", "float8", (c) => c.check(sql`bodyweight > 0 and bodyweight <= 1000`))
    .addColumn("bar", "float8", (c) => c.notNull().check(sql`bar > 0 and bar <= 100`))
    // Either [20, 10, 5] (as many pairs as needed) or [{"weight": 20, "pairs": 4}, …].
    .addColumn("plates", "jsonb", (c) => c.notNull().check(sql`jsonb_typeof(plates) = 'array'`))
    .addColumn("dumbbell_step", "float8", (c) => c.notNull().check(sql`dumbbell_step > 0 and dumbbell_step <= 50`))
    .addColumn("machine_step", "float8", (c) => c.notNull().check(sql`machine_step > 0 and machine_step <= 50`))
    .addColumn("preset", "text")
    .addColumn("updated_by", "uuid", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("updated_at", "timestamptz", now)
    .execute();

  // Every max ever entered is kept: the latest per exercise is the current one, the rest is history.
  await db.schema
    .createTable("athlete_maxes")
    .addColumn("id", "uuid", id)
    .addColumn("athlete_id", "uuid", user)
    .addColumn("exercise", "text", (c) => c.notNull().check(sql`char_length(exercise) between 1 and 80`))
    // Normalised name (lower case, no hyphens or apostrophes) so "Back squat" and "back-squat" meet.
    .addColumn("exercise_key", "text", (c) => c.notNull())
    .addColumn("kind", "text", (c) => c.notNull().check(sql`kind in ('1rm', 'tm')`))
    .addColumn("value", "float8", (c) => c.notNull().check(sql`value > 0 and value <= 10000`))
    .addColumn("units", "text", (c) => c.notNull().check(sql`units in ('kg', 'lb')`))
    .addColumn("measured_on", "date", (c) => c.notNull())
    .addColumn("source", "text", (c) => c.notNull().check(sql`source in ('tested', 'estimated', 'logs')`))
    .addColumn("note", "text", (c) => c.check(sql`char_length(note) <= 500`))
    .addColumn("created_by", "uuid", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", now)
    .execute();
  await sql`create index athlete_maxes_current on athlete_maxes (athlete_id, exercise_key, measured_on desc, created_at desc)`.execute(db);

  // Tokens are stored hashed (sha-256); the plain token only ever travels in the e-mail.
  await db.schema
    .createTable("invitations")
    .addColumn("id", "uuid", id)
    .addColumn("coach_id", "uuid", user)
    .addColumn("email", "text", (c) => c.notNull().check(sql`char_length(email) between 3 and 254`))
    .addColumn("name", "text", (c) => c.check(sql`char_length(name) between 1 and 120`))
    .addColumn("token_hash", "text", (c) => c.notNull().unique())
    .addColumn("expires_at", "timestamptz", (c) => c.notNull())
    .addColumn("sent_at", "timestamptz", now)
    .addColumn("accepted_at", "timestamptz")
    .addColumn("accepted_user_id", "uuid", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("revoked_at", "timestamptz")
    .addColumn("created_at", "timestamptz", now)
    .execute();
  await sql`create index invitations_coach on invitations (coach_id, created_at desc)`.execute(db);

  await db.schema
    .createTable("password_resets")
    .addColumn("token_hash", "text", (c) => c.primaryKey())
    .addColumn("user_id", "uuid", user)
    .addColumn("expires_at", "timestamptz", (c) => c.notNull())
    .addColumn("used_at", "timestamptz")
    .addColumn("created_at", "timestamptz", now)
    .execute();

  await db.schema
    .createTable("template_assignments")
    .addColumn("id", "uuid", id)
    .addColumn("template_id", "uuid", (c) => c.notNull().references("templates.id").onDelete("restrict"))
    .addColumn("version_id", "uuid", (c) => c.notNull().references("template_versions.id").onDelete("restrict"))
    .addColumn("athlete_id", "uuid", user)
    .addColumn("assigned_by", "uuid", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("start_date", "date", (c) => c.notNull())
    // Weekdays for days without a weekday tag, e.g. {mon,wed,fri}.
    .addColumn("weekdays", sql`text[]`, (c) => c.notNull().defaultTo(sql`'{}'::text[]`))
    .addColumn("status", "text", (c) => c.notNull().defaultTo("active").check(sql`status in ('active', 'ended')`))
    .addColumn("auto_regulate", "boolean", (c) => c.notNull().defaultTo(false))
    .addColumn("created_at", "timestamptz", now)
    .addColumn("updated_at", "timestamptz", now)
    .addColumn("ended_at", "timestamptz")
    .execute();
  await sql`create index template_assignments_athlete on template_assignments (athlete_id, status)`.execute(db);

  // One row per dated session. `ordinal` is the session's place in the expansion,
  // which stays the same when loads are recomputed or the date is moved.
  await db.schema
    .createTable("training_sessions")
    .addColumn("id", "uuid", id)
    .addColumn("assignment_id", "uuid", (c) => c.notNull().references("template_assignments.id").onDelete("cascade"))
    .addColumn("athlete_id", "uuid", user)
    .addColumn("ordinal", "integer", (c) => c.notNull().check(sql`ordinal >= 0`))
    .addColumn("planned_date", "date", (c) => c.notNull())
    .addColumn("date", "date", (c) => c.notNull())
    .addColumn("title", "text", (c) => c.notNull())
    .addColumn("plan", "jsonb", (c) => c.notNull())
    .addColumn("computed_at", "timestamptz", now)
    .addColumn("logged_at", "timestamptz")
    .addColumn("completed_at", "timestamptz")
    .addUniqueConstraint("training_sessions_assignment_ordinal", ["assignment_id", "ordinal"])
    .execute();
  await sql`create index training_sessions_athlete_date on training_sessions (athlete_id, date)`.execute(db);

  await db.schema
    .createTable("calendar_feeds")
    .addColumn("token", "text", (c) => c.primaryKey())
    .addColumn("athlete_id", "uuid", user)
    .addColumn("created_at", "timestamptz", now)
    .addColumn("revoked_at", "timestamptz")
    .execute();
  await sql`create unique index calendar_feeds_live on calendar_feeds (athlete_id) where revoked_at is null`.execute(db);

  // Progress of background work the UI polls (bulk assignment, e-mailed packs).
  await db.schema
    .createTable("job_runs")
    .addColumn("id", "uuid", id)
    .addColumn("kind", "text", (c) => c.notNull())
    .addColumn("requested_by", "uuid", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("status", "text", (c) => c.notNull().defaultTo("queued").check(sql`status in ('queued', 'running', 'done', 'failed')`))
    .addColumn("total", "integer", (c) => c.notNull().defaultTo(0))
    .addColumn("done", "integer", (c) => c.notNull().defaultTo(0))
    .addColumn("failed", "integer", (c) => c.notNull().defaultTo(0))
    .addColumn("payload", "jsonb", (c) => c.notNull().defaultTo(sql`'{}'::jsonb`))
    .addColumn("result", "jsonb")
    .addColumn("error", "text")
    .addColumn("created_at", "timestamptz", now)
    .addColumn("finished_at", "timestamptz")
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  for (const t of ["job_runs", "calendar_feeds", "training_sessions", "template_assignments", "password_resets", "invitations", "athlete_maxes", "athlete_profiles"]) {
    await db.schema.dropTable(t).execute();
  }
}
