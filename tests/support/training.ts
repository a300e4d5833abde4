/**
 * Training data written straight to the tables, the way the assignment code
 * writes it, for tests of what reads maxes and dated sessions (calendar,
 * cards, feeds, logs, progress) without going through assignment itself.
 */
import type { Kysely } from "kysely";
import { sessionRows } from "../../db/assignments";
import type { Database } from "../../db/database";
import { planAssignment } from "../../db/recompute";

type TemplateRef = { id: string; version: { id: string } };

/**
 * One tested 1RM in kg per exercise, entered by the coach. `key` gives the
 * stored exercise_key; by default the name as written.
 *
 * @example
 * await addTestedMaxes(db, coach.id, tomas.id, { "back squat": 100, deadlift: 140 }, "2026-12-01");
 */
export async function addTestedMaxes(
  db: Kysely<Database>,
  coachId: string,
  athleteId: string,
  maxes: Record<string, number>,
  measuredOn: string,
  key: (exercise: string) => string = (exercise) => exercise,
): Promise<void> {
  for (const [exercise, value] of Object.entries(maxes)) {
    await db
      .insertInto("athlete_maxes")
      .values({ athlete_id: athleteId, exercise, exercise_key: key(exercise), kind: "1rm", value, units: "kg", measured_on: measuredOn, source: "tested", note: null, created_by: coachId })
      .execute();
  }
}

/** An active assignment of the template's version to the athlete, on the programme's own days; answers its id. */
export async function insertAssignment(
  db: Kysely<Database>,
  input: { template: TemplateRef; athleteId: string; coachId: string; start: string; autoRegulate?: boolean },
): Promise<string> {
  const row = await db
    .insertInto("template_assignments")
    .values({
      template_id: input.template.id,
      version_id: input.template.version.id,
      athlete_id: input.athleteId,
      assigned_by: input.coachId,
      start_date: input.start,
      weekdays: [],
      ...(input.autoRegulate === undefined ? {} : { auto_regulate: input.autoRegulate }),
      ended_at: null,
    })
    .returning("id")
    .executeTakeFirstOrThrow();
  return row.id;
}

/**
 * Assigns the template to the athlete from `start` and stores every planned
 * session with loads worked from the maxes on file; the rows come back in
 * date order.
 *
 * @example
 * const { rows } = await assignWithSessions(db, { template, athlete: tomas, coachId: coach.id, start: "2027-01-04" });
 */
export async function assignWithSessions(
  db: Kysely<Database>,
  input: { template: TemplateRef; athlete: { id: string; name: string }; coachId: string; start: string; autoRegulate?: boolean },
) {
  const { template, athlete, start } = input;
  const assignmentId = await insertAssignment(db, { template, athleteId: athlete.id, coachId: input.coachId, start, autoRegulate: input.autoRegulate });
  const plan = await planAssignment(db, { athleteId: athlete.id, athleteName: athlete.name, versionId: template.version.id, startDate: start, weekdays: [] });
  const rows = await db
    .insertInto("training_sessions")
    .values(sessionRows(assignmentId, athlete.id, plan.sessions.map((session, ordinal) => ({ ordinal, session }))))
    .returning(["id", "date", "title", "plan"])
    .execute();
  return { assignmentId, plan, rows: rows.sort((a, b) => a.date.localeCompare(b.date)) };
}
