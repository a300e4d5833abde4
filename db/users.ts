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

export type SessionViewer = { id: string; email: string; name: string; role: Role };

/**
 * The person behind a signed session, read fresh: null when the account is
 * gone or disabled, or when its password changed after this session signed
 * in (`signedInAt`, ms since the epoch; null for a session from before that
 * was recorded). Name and role come from the account, not the token, so an
 * admin's change applies at once.
 *
 * @example
 * await viewerForSession(db, { id, signedInAt: Date.now() }); // { id, email, name, role } | null
 */
export async function viewerForSession(db: Db, session: { id: string; signedInAt: number | null }): Promise<SessionViewer | null> {
  if (!/^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i.test(session.id)) return null;
  const row = await db
    .selectFrom("users")
    .select(["id", "email", "name", "role", "disabled_at", "credentials_changed_at"])
    .where("id", "=", session.id)
    .executeTakeFirst();
  if (!row || row.disabled_at !== null) return null;
  if (row.credentials_changed_at !== null && (session.signedInAt ?? 0) < row.credentials_changed_at.getTime()) return null;
  return { id: row.id, email: row.email, name: row.name, role: row.role };
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
