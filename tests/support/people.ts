/**
 * The people of an integration test: a migrated scratch database and users
 * in it, returned in the shape the mocked `getViewer` hands the handlers.
 */
import type { Kysely } from "kysely";
import type { Database } from "../../db/database";
import { migrateToLatest } from "../../db/migrate";
import { createUser } from "../../db/users";
import { createScratchDb } from "./scratchDb";

export type Person = { id: string; name: string; email: string; role: "admin" | "coach" | "athlete" };

/** A scratch database with every migration applied; `drop()` removes it. */
export async function migratedScratchDb() {
  const scratch = await createScratchDb();
  await migrateToLatest(scratch.db);
  return scratch;
}

/**
 * A user who never signs in (the password hash is a placeholder), optionally
 * on a coach's roster.
 *
 * @example
 * const coach = await addPerson(db, "rowan@x.test", "Rowan Hale", "coach");
 * const tomas = await addPerson(db, "tomas@x.test", "Tomas", "athlete", coach.id);
 */
export async function addPerson(db: Kysely<Database>, email: string, name: string, role: Person["role"], coachId: string | null = null): Promise<Person> {
  const row = await createUser(db, { email, name, passwordHash: "h", role, coachId });
  return { id: row!.id, name, email, role };
}
