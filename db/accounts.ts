import "server-only";
import { sql } from "kysely";
import type { Role } from "./database";
import { DomainError } from "./domainError";
import { type Actor, type Db, inTransaction } from "./templateAccess";
import { isUuid } from "./templateRules";
import type { UserSummary } from "./users";

export type AccountChange = { disabled?: boolean; role?: Role };

/**
 * What an admin changes on an account: disable or enable it, and its role.
 * Disabling ends the person's open sessions at once (server/auth.ts reads the
 * account on every request) and blocks sign-in; nothing of theirs is deleted.
 * A role changes only while the account holds nothing that belongs to its
 * current role — a coach with athletes or templates stays a coach — so no
 * athlete is left with a coach who can no longer see them. Nobody changes
 * their own account here, so an admin can never lock themself out.
 *
 * @example
 * await updateAccount(db, admin, userId, { disabled: true }); // { …, disabled: true }
 * await updateAccount(db, admin, newUserId, { role: "coach" });
 */
export async function updateAccount(db: Db, actor: Actor, userId: string, change: AccountChange): Promise<UserSummary> {
  if (actor.role !== "admin") throw new DomainError("forbidden", "Only an admin manages accounts.");
  if (!isUuid(userId)) throw new DomainError("not_found", "That account does not exist.");
  if (userId === actor.id) throw new DomainError("conflict", "You cannot change your own account here; ask another admin.");
  return inTransaction(db, async (trx) => {
    const user = await trx.selectFrom("users").select(["id", "name", "role"]).where("id", "=", userId).forUpdate().executeTakeFirst();
    if (!user) throw new DomainError("not_found", "That account does not exist.");
    if (change.role !== undefined && change.role !== user.role) {
      const held = await heldByRole(trx, user.id, user.role);
      if (held.length > 0) {
        const list = held.length === 1 ? held[0] : `${held.slice(0, -1).join(", ")} and ${held.at(-1)}`;
        throw new DomainError("conflict", `${user.name} still has ${list} as ${article(user.role)} ${user.role}, so the role cannot change yet.`, { role: `Still has ${list}` });
      }
    }
    const row = await trx
      .updateTable("users")
      .set({
        ...(change.role !== undefined ? { role: change.role } : {}),
        ...(change.disabled !== undefined ? { disabled_at: change.disabled ? sql<Date>`coalesce(disabled_at, now())` : null } : {}),
      })
      .where("id", "=", user.id)
      .returning(["id", "email", "name", "role", "created_at", "disabled_at"])
      .executeTakeFirstOrThrow();
    return { id: row.id, email: row.email, name: row.name, role: row.role, createdAt: row.created_at, disabled: row.disabled_at !== null };
  });
}

const article = (role: Role) => (role === "admin" || role === "athlete" ? "an" : "a");
const count = async (q: { executeTakeFirstOrThrow(): Promise<{ n: string | number | bigint }> }) => Number((await q.executeTakeFirstOrThrow()).n);
const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** In words, what ties the account to its role ("3 athletes", "2 templates"); empty when nothing does. */
async function heldByRole(db: Db, id: string, role: Role): Promise<string[]> {
  const held: string[] = [];
  if (role === "coach") {
    const athletes = await count(db.selectFrom("users").select((eb) => eb.fn.countAll().as("n")).where("coach_id", "=", id));
    const templates = await count(db.selectFrom("templates").select((eb) => eb.fn.countAll().as("n")).where("owner_id", "=", id));
    const sales = await count(db.selectFrom("purchases").select((eb) => eb.fn.countAll().as("n")).where("seller_id", "=", id).where("status", "<>", "pending"));
    if (athletes) held.push(plural(athletes, "athlete", "athletes"));
    if (templates) held.push(plural(templates, "template", "templates"));
    if (sales) held.push(plural(sales, "sale", "sales"));
  } else if (role === "athlete") {
    const coach = await db.selectFrom("users").select("coach_id").where("id", "=", id).executeTakeFirst();
    const programmes = await count(db.selectFrom("template_assignments").select((eb) => eb.fn.countAll().as("n")).where("athlete_id", "=", id));
    const bought = await count(db.selectFrom("purchases").select((eb) => eb.fn.countAll().as("n")).where("buyer_id", "=", id).where("status", "<>", "pending"));
    if (coach?.coach_id) held.push("a coach");
    if (programmes) held.push(plural(programmes, "programme", "programmes"));
    if (bought) held.push(plural(bought, "purchase", "purchases"));
  }
  return held;
}
