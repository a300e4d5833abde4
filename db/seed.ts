import "server-only";
import { readFile } from "node:fs/promises";
import path from "node:path";
import { fileURLToPath } from "node:url";
import bcrypt from "bcryptjs";
import type { Kysely } from "kysely";
import { equipmentPreset, type EquipmentPresetId } from "../lib/athlete/presets";
import { addDays, isoWeekdayNumber } from "../lib/dates/date";
import { exerciseKey } from "../lib/exercises/resolve";
import { assignTemplate } from "./assignments";
import { seedStore } from "./listings";
import { attachRecipe, createRecipe } from "./recipes";
import type { Database, MaxSource, Role } from "./database";
import { todayUtc } from "./recompute";
import { logPastTraining, MAYA_HABITS, TOMAS_HABITS, type TrainingHabits } from "./seedHistory";
import { createTemplate, updateTemplateMeta } from "./templates";
import { saveVersion } from "./templateVersions";

/**
 * The demo scenario: an invented independent gym, its coach, three athletes
 * (kg and lb gyms) and an admin. Safe to run again: people are matched by
 * e-mail and the gym by name, so a second run adds nothing.
 */
export const DEMO_PASSWORD = "lift-heavy-2027";

export const DEMO_GYM = { name: "Larchmere Barbell Club", city: "Larchmere" };

export const DEMO_PEOPLE: { email: string; name: string; role: Role; coached?: boolean }[] = [
  { email: "admin@larchmere.test", name: "Pat Ellery", role: "admin" },
  { email: "coach@larchmere.test", name: "Rowan Hale", role: "coach" },
  { email: "tomas@larchmere.test", name: "Tomas Brenner", role: "athlete", coached: true },
  { email: "maya@larchmere.test", name: "Maya Okonjo", role: "athlete", coached: true },
  { email: "lena@larchmere.test", name: "Lena Fisk", role: "athlete", coached: true },
];

export async function seedDemo(db: Kysely<Database>): Promise<{ created: number }> {
  const people = await seedPeople(db);
  await seedTemplates(db);
  await seedTraining(db);
  await seedShopAndKitchen(db);
  return people;
}

/**
 * One template on sale, and one batch recipe the coach hands out with the
 * upper/lower programme (label values invented, typical of such foods).
 */
async function seedShopAndKitchen(db: Kysely<Database>): Promise<void> {
  const coach = await db.selectFrom("users").select(["id", "role"]).where("email", "=", "coach@larchmere.test").executeTakeFirst();
  if (!coach) return;
  await seedStore(db, coach.id);
  const hasRecipe = await db.selectFrom("recipes").select("id").where("owner_id", "=", coach.id).executeTakeFirst();
  if (hasRecipe) return;
  const recipe = await createRecipe(db, coach, {
    title: "Chicken, rice and beans batch",
    servings: 4,
    steps: [
      "Rinse the rice and cook it in twice its volume of water, about 12 minutes.",
      "Dice the chicken and brown it in the oil over a high heat, 6–8 minutes.",
      "Add the drained beans and the passata, simmer 10 minutes, season.",
      "Split into four boxes; keeps three days in the fridge.",
    ],
    ingredients: [
      { name: "Chicken breast", kind: "g", amount: 600, density: null, pieceGrams: null, energyKcal: 106, protein: 24, carbohydrate: 0, fat: 1.2, fibre: null },
      { name: "Basmati rice, dry", kind: "g", amount: 300, density: null, pieceGrams: null, energyKcal: 351, protein: 8, carbohydrate: 77, fat: 1, fibre: 1.5 },
      { name: "Kidney beans, drained", kind: "g", amount: 240, density: null, pieceGrams: null, energyKcal: 110, protein: 8, carbohydrate: 14, fat: 0.5, fibre: 7 },
      { name: "Tomato passata", kind: "g", amount: 500, density: null, pieceGrams: null, energyKcal: 31, protein: 1.4, carbohydrate: 5, fat: 0.2, fibre: 1.2 },
      { name: "Olive oil", kind: "ml", amount: 15, density: 0.91, pieceGrams: null, energyKcal: 824, protein: 0, carbohydrate: 0, fat: 91.6, fibre: null },
    ],
  });
  const upperLower = await db.selectFrom("templates").select("id").where("owner_id", "=", coach.id).where("title", "like", "%pper%").executeTakeFirst();
  if (upperLower) await attachRecipe(db, coach, recipe.id, { templateId: upperLower.id });
}

/** The coach's shelf: two templates from the samples, one with a second version. Only on a coach with none. */
const DEMO_TEMPLATES = [
  { file: "upper-lower.iq", tags: ["strength", "4 days"], description: "Four days: two upper, two lower; a deload every fourth week." },
  { file: "beginner-full-body.iq", tags: ["beginner", "3 days"], description: "Three short full-body sessions a week for people new to the barbell." },
];

async function seedTemplates(db: Kysely<Database>): Promise<void> {
  const coach = await db.selectFrom("users").select(["id", "role"]).where("email", "=", "coach@larchmere.test").executeTakeFirst();
  if (!coach) return;
  const has = await db.selectFrom("templates").select("id").where("owner_id", "=", coach.id).executeTakeFirst();
  if (has) return;
  const dir = path.join(path.dirname(fileURLToPath(import.meta.url)), "..", "templates");
  for (const t of DEMO_TEMPLATES) {
    const source = await readFile(path.join(dir, t.file), "utf8");
    const title = /^title:\s*(.+)$/m.exec(source)?.[1].trim() ?? t.file;
    const created = await createTemplate(db, coach, { title, description: t.description, tags: t.tags, source, note: "First version" });
    if (t.file === "upper-lower.iq") {
      const v2 = source.replace("lateral raise 3x15 6kg", "lateral raise 4x15 6kg");
      if (v2 !== source) await saveVersion(db, coach, created.id, { source: v2, note: "One more set of lateral raises" });
      await updateTemplateMeta(db, coach, created.id, { visibility: "link" });
    }
  }
}

async function seedPeople(db: Kysely<Database>): Promise<{ created: number }> {
  return db.transaction().execute(async (trx) => {
    let gym = await trx.selectFrom("gyms").select("id").where("name", "=", DEMO_GYM.name).executeTakeFirst();
    gym ??= await trx.insertInto("gyms").values({ name: DEMO_GYM.name, city: DEMO_GYM.city }).returning("id").executeTakeFirstOrThrow();

    const hash = await bcrypt.hash(DEMO_PASSWORD, 10);
    let created = 0;
    let coachId: string | null = null;
    for (const p of DEMO_PEOPLE) {
      const existing = await trx
        .selectFrom("users")
        .select("id")
        .where((eb) => eb(eb.fn("lower", ["email"]), "=", p.email))
        .executeTakeFirst();
      let id = existing?.id;
      if (!id) {
        const row = await trx
          .insertInto("users")
          .values({
            email: p.email,
            name: p.name,
            password_hash: hash,
            role: p.role,
            coach_id: p.coached ? coachId : null,
            gym_id: gym.id,
            disabled_at: null,
          })
          .returning("id")
          .executeTakeFirstOrThrow();
        id = row.id;
        created++;
      }
      if (p.role === "coach") coachId = id;
    }
    return { created };
  });
}

/** True when the database holds no accounts at all (a fresh install). */
export async function isEmpty(db: Kysely<Database>): Promise<boolean> {
  const row = await db.selectFrom("users").select((eb) => eb.fn.countAll<string>().as("n")).executeTakeFirstOrThrow();
  return Number(row.n) === 0;
}

/** daysBefore counts back from the Monday of the current week, so test days fall before the block starts. */
type DemoMax = { exercise: string; value: number; daysBefore: number; source: MaxSource; note?: string };

/**
 * Each athlete's gym and maxes (Tomas in a kg club, Maya in an lb garage,
 * Lena at a kg home rack with a few lifts on file), and the coach's
 * upper/lower template for Tomas and Maya with two weeks of it logged (their
 * habits: db/seedHistory.ts). Lena is left unassigned so the coach has
 * someone to assign on a first visit.
 */
/** How far back history is logged: up to yesterday (on track), or only up to last week (behind this week). */
type LoggedUntil = "yesterday" | "last week";

const DEMO_TRAINING: { email: string; preset: EquipmentPresetId; bodyweight: number; maxes: DemoMax[]; assign: boolean; habits: TrainingHabits | null; logged: LoggedUntil }[] = [
  {
    email: "tomas@larchmere.test",
    preset: "kg-club",
    bodyweight: 82.5,
    assign: true,
    habits: TOMAS_HABITS,
    logged: "yesterday",
    maxes: [
      { exercise: "back squat", value: 132.5, daysBefore: 120, source: "tested", note: "Autumn test day" },
      { exercise: "back squat", value: 140, daysBefore: 18, source: "tested", note: "Winter test day" },
      { exercise: "bench press", value: 100, daysBefore: 18, source: "tested", note: "Winter test day" },
      { exercise: "deadlift", value: 180, daysBefore: 17, source: "tested", note: "Winter test day" },
      { exercise: "incline press", value: 82.5, daysBefore: 30, source: "estimated" },
      { exercise: "front squat", value: 112.5, daysBefore: 30, source: "estimated" },
      { exercise: "romanian deadlift", value: 140, daysBefore: 30, source: "estimated" },
      { exercise: "cable row", value: 80, daysBefore: 30, source: "estimated" },
      { exercise: "chest-supported row", value: 70, daysBefore: 30, source: "estimated" },
      { exercise: "leg curl", value: 60, daysBefore: 30, source: "estimated" },
    ],
  },
  {
    email: "maya@larchmere.test",
    preset: "lb-garage",
    bodyweight: 148,
    assign: true,
    habits: MAYA_HABITS,
    logged: "last week",
    maxes: [
      { exercise: "back squat", value: 225, daysBefore: 25, source: "tested" },
      { exercise: "bench press", value: 135, daysBefore: 25, source: "tested" },
      { exercise: "deadlift", value: 285, daysBefore: 24, source: "tested" },
      { exercise: "incline press", value: 115, daysBefore: 40, source: "estimated" },
      { exercise: "front squat", value: 175, daysBefore: 40, source: "estimated" },
      { exercise: "romanian deadlift", value: 205, daysBefore: 40, source: "estimated" },
    ],
  },
  {
    email: "lena@larchmere.test",
    preset: "kg-home",
    bodyweight: 64,
    assign: false,
    habits: null,
    logged: "last week",
    maxes: [
      { exercise: "back squat", value: 85, daysBefore: 10, source: "estimated" },
      { exercise: "bench press", value: 50, daysBefore: 10, source: "estimated" },
      { exercise: "deadlift", value: 105, daysBefore: 10, source: "estimated" },
    ],
  },
];

/**
 * Each piece is added only when the athlete has none of it yet, so running the
 * seed again changes nothing. The assignment starts on the Monday two weeks
 * before the current week's (UTC, at seed time), so weeks 1 and 2 are history
 * and this is week 3 of the four-week block (week 4 deloads). Every day of the
 * upper/lower template is tagged with its weekday (Mon, Tue, Thu, Fri), so
 * today has a session whenever today is one of those days, and the nearest one
 * is at most two days away otherwise; no weekday list is passed because no day
 * is left untagged. Tomas has logged everything before today, so he reads as
 * on track whatever the weekday; Maya only up to last week (one session
 * skipped), so she is the athlete the coach's dashboard asks about. Today's
 * session and the rest of the block are still there to log.
 */
async function seedTraining(db: Kysely<Database>): Promise<void> {
  const coach = await db.selectFrom("users").select(["id", "role"]).where("email", "=", "coach@larchmere.test").executeTakeFirst();
  if (!coach) return;
  const today = todayUtc();
  const monday = addDays(today, 1 - isoWeekdayNumber(today));
  const start = addDays(monday, -14);
  const version = await db
    .selectFrom("template_versions as v")
    .innerJoin("templates as t", "t.id", "v.template_id")
    .select("v.id")
    .where("t.owner_id", "=", coach.id)
    .where("t.title", "=", "Upper/lower, four days")
    .where("t.archived_at", "is", null)
    .orderBy("v.number", "desc")
    .limit(1)
    .executeTakeFirst();
  for (const d of DEMO_TRAINING) {
    const athlete = await db.selectFrom("users").select("id").where("email", "=", d.email).where("coach_id", "=", coach.id).executeTakeFirst();
    if (!athlete) continue;
    const p = equipmentPreset(d.preset);
    await db
      .insertInto("athlete_profiles")
      .values({
        user_id: athlete.id,
        units: p.units,
        bodyweight: d.bodyweight,
        bar: p.bar,
        plates: JSON.stringify(p.plates),
        dumbbell_step: p.dumbbellStep,
        machine_step: p.machineStep,
        preset: p.id,
        updated_by: coach.id,
      })
      .onConflict((oc) => oc.column("user_id").doNothing())
      .execute();
    const hasMax = await db.selectFrom("athlete_maxes").select("id").where("athlete_id", "=", athlete.id).executeTakeFirst();
    if (!hasMax) {
      await db
        .insertInto("athlete_maxes")
        .values(
          d.maxes.map((m) => ({
            athlete_id: athlete.id,
            exercise: m.exercise,
            exercise_key: exerciseKey(m.exercise),
            kind: "1rm" as const,
            value: m.value,
            units: p.units,
            measured_on: addDays(monday, -m.daysBefore),
            source: m.source,
            note: m.note ?? null,
            created_by: coach.id,
          })),
        )
        .execute();
    }
    const hasAssignment = await db.selectFrom("template_assignments").select("id").where("athlete_id", "=", athlete.id).executeTakeFirst();
    if (d.assign && version && !hasAssignment) {
      await assignTemplate(db, coach, { versionId: version.id, athleteIds: [athlete.id], startDate: start, weekdays: [] });
    }
    if (d.assign && d.habits) await logPastTraining(db, athlete.id, d.habits, p, d.logged === "yesterday" ? today : monday);
  }
}
