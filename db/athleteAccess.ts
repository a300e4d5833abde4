import "server-only";
import type { Kysely, Transaction } from "kysely";
import type { Database, Role } from "./database";
import { DomainError } from "./domainError";
import { isUuid } from "./templateRules";

export type Db = Kysely<Database> | Transaction<Database>;
export type Actor = { id: string; role: Role };

export type AthleteRef = { id: string; name: string; email: string; coachId: string | null };

/**
 * Someone else's athlete answers exactly like a missing one, so ids cannot be probed.
 */
export function athleteNotFound(): DomainError {
  return new DomainError("not_found", "That athlete does not exist or is not on your roster.");
}

/**
 * The athlete when the actor may see and edit their training: the athlete
 * themself, or the coach they are linked to. Everyone else gets null.
 *
 * @example
 * await findAthleteFor(db, { id: coachId, role: "coach" }, athleteId); // { id, name, email, coachId } | null
 */
export async function findAthleteFor(db: Db, actor: Actor, athleteId: string): Promise<AthleteRef | null> {
  if (!isUuid(athleteId)) return null;
  if (actor.role === "athlete" && actor.id !== athleteId) return null;
  if (actor.role !== "athlete" && actor.role !== "coach") return null;
  const row = await db
    .selectFrom("users")
    .select(["id", "name", "email", "coach_id"])
    .where("id", "=", athleteId)
    .where("role", "=", "athlete")
    .where("disabled_at", "is", null)
    .executeTakeFirst();
  if (!row) return null;
  if (actor.role === "coach" && row.coach_id !== actor.id) return null;
  return { id: row.id, name: row.name, email: row.email, coachId: row.coach_id };
}

/** As findAthleteFor, but throws not_found instead of answering null. */
export async function requireAthleteFor(db: Db, actor: Actor, athleteId: string): Promise<AthleteRef> {
  const found = await findAthleteFor(db, actor, athleteId);
  if (!found) throw athleteNotFound();
  return found;
}

export type RosterEntry = { id: string; name: string; email: string };

/**
 * The athletes a coach looks after, by name; accounts an admin disabled are
 * left out, as everywhere else. Only a coach has a roster.
 *
 * @example
 * await listRoster(db, { id: coachId, role: "coach" }); // [{ id, name: "Lena Okafor", email }, …]
 */
export async function listRoster(db: Db, actor: Actor): Promise<RosterEntry[]> {
  if (actor.role !== "coach") throw new DomainError("forbidden", "Only a coach has athletes.");
  return db
    .selectFrom("users")
    .select(["id", "name", "email"])
    .where("coach_id", "=", actor.id)
    .where("role", "=", "athlete")
    .where("disabled_at", "is", null)
    .orderBy("name")
    .orderBy("id")
    .execute();
}
