import { type Kysely, sql } from "kysely";

// Frozen: never edit a migration that has shipped; add a new one instead.
// What athletes log against their dated sessions: one row per planned set,
// a note and the exercise actually done per exercise slot, and the max
// changes proposed from the logs for a person to accept or dismiss.
export async function up(db: Kysely<any>): Promise<void> {
  const now = (c: any) => c.notNull().defaultTo(sql`now()`);
  const user = (c: any) => c.notNull().references("users.id").onDelete("cascade");
  const session = (c: any) => c.notNull().references("training_sessions.id").onDelete("cascade");

  // (session, exercise slot, set) is unique so logging the same set twice updates it.
  await db.schema
    .createTable("set_logs")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("session_id", "uuid", session)
    .addColumn("athlete_id", "uuid", user)
    // Index in plan.exercises, and in the sets of the exercise actually done (warm-ups first).
    .addColumn("exercise_index", "integer", (c) => c.notNull().check(sql`exercise_index >= 0 and exercise_index < 200`))
    .addColumn("set_index", "integer", (c) => c.notNull().check(sql`set_index >= 0 and set_index < 200`))
    .addColumn("kind", "text", (c) => c.notNull().check(sql`kind in ('warmup', 'work')`))
    // The exercise done: the substitute's name when the athlete swapped.
    .addColumn("exercise", "text", (c) => c.notNull().check(sql`char_length(exercise) between 1 and 200`))
    .addColumn("exercise_key", "text", (c) => c.notNull())
    .addColumn("planned_exercise", "text", (c) => c.notNull())
    // What the plan said when the set was logged; the plan may be recomputed later.
    .addColumn("planned_reps", "integer")
    .addColumn("planned_load", "float8")
    .addColumn("planned_seconds", "integer")
    .addColumn("bodyweight", "boolean", (c) => c.notNull().defaultTo(false))
    .addColumn("reps", "integer", (c) => c.notNull().check(sql`reps between 0 and 100`))
    .addColumn("load", "float8", (c) => c.notNull().check(sql`load >= 0 and load <= 1500`))
    .addColumn("unit", "text", (c) => c.notNull().check(sql`unit in ('kg', 'lb')`))
    .addColumn("rir", "integer", (c) => c.check(sql`rir between 0 and 10`))
    .addColumn("done", "boolean", (c) => c.notNull().defaultTo(false))
    // The offline queue's own id and the moment the athlete made the change:
    // a late replay of an older change never overwrites a newer one.
    .addColumn("client_id", "text", (c) => c.check(sql`char_length(client_id) <= 100`))
    .addColumn("client_updated_at", "timestamptz", (c) => c.notNull())
    .addColumn("logged_at", "timestamptz", now)
    .addColumn("updated_at", "timestamptz", now)
    .addUniqueConstraint("set_logs_slot", ["session_id", "exercise_index", "set_index"])
    .execute();
  await sql`create index set_logs_athlete_exercise on set_logs (athlete_id, exercise_key)`.execute(db);

  await db.schema
    .createTable("session_exercise_logs")
    .addColumn("session_id", "uuid", session)
    .addColumn("exercise_index", "integer", (c) => c.notNull().check(sql`exercise_index >= 0 and exercise_index < 200`))
    .addColumn("athlete_id", "uuid", user)
    .addColumn("exercise", "text", (c) => c.notNull().check(sql`char_length(exercise) between 1 and 200`))
    .addColumn("exercise_key", "text", (c) => c.notNull())
    .addColumn("note", "text", (c) => c.check(sql`char_length(note) <= 1000`))
    .addColumn("updated_at", "timestamptz", now)
    .addPrimaryKeyConstraint("session_exercise_logs_pk", ["session_id", "exercise_index"])
    .execute();

  await db.schema
    .createTable("max_proposals")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("athlete_id", "uuid", user)
    .addColumn("assignment_id", "uuid", (c) => c.notNull().references("template_assignments.id").onDelete("cascade"))
    .addColumn("exercise", "text", (c) => c.notNull())
    .addColumn("exercise_key", "text", (c) => c.notNull())
    .addColumn("current_max_id", "uuid", (c) => c.references("athlete_maxes.id").onDelete("set null"))
    .addColumn("current_value", "float8", (c) => c.notNull())
    .addColumn("proposed_value", "float8", (c) => c.notNull().check(sql`proposed_value > 0 and proposed_value <= 10000`))
    .addColumn("estimate", "float8", (c) => c.notNull())
    .addColumn("units", "text", (c) => c.notNull().check(sql`units in ('kg', 'lb')`))
    // The session bests the proposal rests on: [{ sessionId, date, e1rm, reps, load, rir }].
    .addColumn("basis", "jsonb", (c) => c.notNull().check(sql`jsonb_typeof(basis) = 'array'`))
    .addColumn("status", "text", (c) => c.notNull().defaultTo("open").check(sql`status in ('open', 'accepted', 'dismissed')`))
    .addColumn("decided_at", "timestamptz")
    .addColumn("decided_by", "uuid", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("accepted_max_id", "uuid", (c) => c.references("athlete_maxes.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", now)
    .addColumn("updated_at", "timestamptz", now)
    .execute();
  await sql`create unique index max_proposals_open on max_proposals (athlete_id, exercise_key) where status = 'open'`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  for (const t of ["max_proposals", "session_exercise_logs", "set_logs"]) await db.schema.dropTable(t).execute();
}
