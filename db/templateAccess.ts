import "server-only";
import type { Kysely, Transaction } from "kysely";
import type { Database, Role } from "./database";
import { isUuid, TemplateError } from "./templateRules";

export type Db = Kysely<Database> | Transaction<Database>;

/** Who is asking; the session's viewer fits. */
export type Actor = { id: string; role: Role };

/**
 * Someone else's template answers exactly like a missing one, so ids of other
 * coaches' work cannot be probed.
 */
export function templateNotFound(): TemplateError {
  return new TemplateError("not_found", "That template does not exist or is not yours.");
}

/** Only coaches write templates today; anyone else owns none. */
export function canOwnTemplates(actor: Actor): boolean {
  return actor.role === "coach";
}

export type OwnedTemplate = { id: string; title: string; description: string; tags: string[] };

/**
 * The template when the actor owns it, else null. With `lock`, the row is held
 * (FOR UPDATE) until the surrounding transaction ends, which serialises
 * concurrent version saves on one template.
 */
export async function findOwnTemplate(db: Db, actor: Actor, id: string, lock = false): Promise<OwnedTemplate | null> {
  if (!canOwnTemplates(actor) || !isUuid(id)) return null;
  let query = db
    .selectFrom("templates")
    .select(["id", "title", "description", "tags"])
    .where("id", "=", id)
    .where("owner_id", "=", actor.id);
  if (lock) query = query.forUpdate();
  return (await query.executeTakeFirst()) ?? null;
}

export async function requireOwnTemplate(db: Db, actor: Actor, id: string, lock = false): Promise<OwnedTemplate> {
  const row = await findOwnTemplate(db, actor, id, lock);
  if (!row) throw templateNotFound();
  return row;
}

/** Runs inside the caller's transaction when given one, else in a new one. */
export async function inTransaction<T>(db: Db, fn: (trx: Transaction<Database>) => Promise<T>): Promise<T> {
  if (db.isTransaction) return fn(db as Transaction<Database>);
  return (db as Kysely<Database>).transaction().execute(fn);
}
