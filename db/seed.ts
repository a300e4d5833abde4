import "server-only";
import bcrypt from "bcryptjs";
import type { Kysely } from "kysely";
import type { Database, Role } from "./database";

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
