import "server-only";
import { type Kysely, sql, type Transaction } from "kysely";
import type { Database, Role } from "./database";

type Db = Kysely<Database> | Transaction<Database>;

export type SignInRecord = { id: string; email: string; name: string; role: Role; passwordHash: string; disabled: boolean };
export type UserSummary = { id: string; email: string; name: string; role: Role; createdAt: Date; disabled: boolean };

export async function findUserForSignIn(db: Db, email: string): Promise<SignInRecord | null> {
  const row = await db
    .selectFrom("users")
    .select(["id", "email", "name", "role", "password_hash", "disabled_at"])
    .where((eb) => eb(eb.fn("lower", ["email"]), "=", email.trim().toLowerCase()))
    .executeTakeFirst();
  if (!row) return null;
  return { id: row.id, email: row.email, name: row.name, role: row.role, passwordHash: row.password_hash, disabled: row.disabled_at !== null };
}

export async function emailTaken(db: Db, email: string): Promise<boolean> {
  const row = await db
    .selectFrom("users")
    .select("id")
    .where((eb) => eb(eb.fn("lower", ["email"]), "=", email.trim().toLowerCase()))
    .executeTakeFirst();
  return row !== undefined;
}

/** Creates an account; returns null when the e-mail is already registered (case-insensitively). */
export async function createUser(
  db: Db,
  input: { email: string; name: string; passwordHash: string; role: Role; coachId?: string | null; gymId?: string | null },
): Promise<{ id: string } | null> {
  const row = await db
    .insertInto("users")
    .values({
      email: input.email.trim(),
      name: input.name.trim(),
      password_hash: input.passwordHash,
      role: input.role,
      coach_id: input.coachId ?? null,
      gym_id: input.gymId ?? null,
      disabled_at: null,
    })
    .onConflict((oc) => oc.expression(sql`lower(email)`).doNothing())
    .returning("id")
    .executeTakeFirst();
  return row ?? null;
}

/** Every account, newest first. Only an admin may ask. */
export async function listUsers(db: Db, actor: { role: Role }): Promise<UserSummary[]> {
  if (actor.role !== "admin") return [];
  const rows = await db
    .selectFrom("users")
    .select(["id", "email", "name", "role", "created_at", "disabled_at"])
    .orderBy("created_at", "desc")
    .execute();
  return rows.map((r) => ({ id: r.id, email: r.email, name: r.name, role: r.role, createdAt: r.created_at, disabled: r.disabled_at !== null }));
}

/** The athletes a coach looks after, by name. */
export async function listAthletesOfCoach(db: Db, coachId: string): Promise<{ id: string; name: string; email: string }[]> {
  return db
    .selectFrom("users")
    .select(["id", "name", "email"])
    .where("coach_id", "=", coachId)
    .where("role", "=", "athlete")
    .orderBy("name")
    .execute();
}
