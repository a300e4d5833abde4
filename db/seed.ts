import "server-only";
import { readFile } from "node:fs/promises";
import path from "node:path";
import { fileURLToPath } from "node:url";
import bcrypt from "bcryptjs";
import type { Kysely } from "kysely";
import type { Database, Role } from "./database";
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
  return people;
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
