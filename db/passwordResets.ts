import "server-only";
import { type Kysely, sql, type Transaction } from "kysely";
import type { Database } from "./database";
import { hashSecretToken, inTransaction, LinkClosedError, looksLikeToken, newSecretToken } from "./invitations";

type Db = Kysely<Database> | Transaction<Database>;

export const RESET_MINUTES = 60;
// More requests than this in an hour send nothing more: the page answers the same either way.
const MAX_PER_HOUR = 5;

export type IssuedReset = { token: string; user: { id: string; email: string; name: string }; expiresAt: Date };

/**
 * A one-hour, single-use reset link for the account with that e-mail, or null when there is
 * no such active account (or it asked too often). Callers answer the same in every case, so
 * the form cannot be used to find out who has an account. A new link retires earlier ones.
 *
 * @example
 * const issued = await createPasswordReset(db, "maya@larchmere.test"); // { token, user, expiresAt } | null
 */
export async function createPasswordReset(db: Db, email: string): Promise<IssuedReset | null> {
  const wanted = email.trim().toLowerCase();
  if (!wanted) return null;
  return inTransaction(db, async (trx) => {
    const user = await trx
      .selectFrom("users")
      .select(["id", "email", "name"])
      .where((eb) => eb(eb.fn("lower", ["email"]), "=", wanted))
      .where("disabled_at", "is", null)
      .forUpdate()
      .executeTakeFirst();
    if (!user) return null;
    const recent = await trx
      .selectFrom("password_resets")
      .select((eb) => eb.fn.countAll<string>().as("n"))
      .where("user_id", "=", user.id)
      .where("created_at", ">", sql<Date>`now() - interval '1 hour'`)
      .executeTakeFirstOrThrow();
    if (Number(recent.n) >= MAX_PER_HOUR) return null;
    // Only the newest link works: earlier unused ones end now.
    await trx
      .updateTable("password_resets")
      .set({ expires_at: sql<Date>`now()` })
      .where("user_id", "=", user.id)
      .where("used_at", "is", null)
      .where("expires_at", ">", sql<Date>`now()`)
      .execute();
    const token = newSecretToken();
    const expiresAt = new Date(Date.now() + RESET_MINUTES * 60_000);
    await trx.insertInto("password_resets").values({ token_hash: hashSecretToken(token), user_id: user.id, expires_at: expiresAt, used_at: null }).execute();
    return { token, user, expiresAt };
  });
}

export type ResetLookup = { status: "valid"; email: string } | { status: "used" | "expired" | "unknown" };

/** What the reset page shows for a link. Reading never changes anything. */
export async function findPasswordReset(db: Db, token: string): Promise<ResetLookup> {
  if (!looksLikeToken(token)) return { status: "unknown" };
  const row = await db
    .selectFrom("password_resets as r")
    .innerJoin("users as u", "u.id", "r.user_id")
    .select(["r.used_at", "r.expires_at", "u.email", "u.disabled_at"])
    .where("r.token_hash", "=", hashSecretToken(token))
    .executeTakeFirst();
  if (!row || row.disabled_at) return { status: "unknown" };
  if (row.used_at) return { status: "used" };
  if (row.expires_at.getTime() <= Date.now()) return { status: "expired" };
  return { status: "valid", email: row.email };
}

const CLOSED = {
  unknown: "This reset link isn't valid. Check that the whole link was copied, or ask for a new one.",
  used: "This reset link has already been used. If you still can't sign in, ask for a new one.",
  expired: "This reset link has run out (links last an hour, and a newer request replaces older links). Ask for a new one.",
} as const;

/**
 * Sets a new password through a reset link, once. The row is locked and re-checked
 * (`used_at is null and expires_at > now()`), so a link cannot be used twice.
 */
export async function completePasswordReset(db: Db, token: string, passwordHash: string): Promise<{ email: string }> {
  if (!looksLikeToken(token)) throw new LinkClosedError("unknown", CLOSED.unknown);
  return inTransaction(db, async (trx) => {
    const hash = hashSecretToken(token);
    const reset = await trx
      .selectFrom("password_resets")
      .select(["token_hash", "user_id"])
      .where("token_hash", "=", hash)
      .where("used_at", "is", null)
      .where("expires_at", ">", sql<Date>`now()`)
      .forUpdate()
      .executeTakeFirst();
    if (!reset) {
      const row = await trx.selectFrom("password_resets").select(["used_at"]).where("token_hash", "=", hash).executeTakeFirst();
      const state = !row ? "unknown" : row.used_at ? "used" : "expired";
      throw new LinkClosedError(state, CLOSED[state]);
    }
    const user = await trx
      .updateTable("users")
      // Sessions are signed tokens held by browsers; this is what ends the ones already out.
      .set({ password_hash: passwordHash, credentials_changed_at: new Date() })
      .where("id", "=", reset.user_id)
      .where("disabled_at", "is", null)
      .returning("email")
      .executeTakeFirst();
    if (!user) throw new LinkClosedError("unknown", CLOSED.unknown);
    await trx.updateTable("password_resets").set({ used_at: sql<Date>`now()` }).where("token_hash", "=", hash).execute();
    // Any other link still out for this account ends with the change.
    await trx
      .updateTable("password_resets")
      .set({ expires_at: sql<Date>`now()` })
      .where("user_id", "=", reset.user_id)
      .where("used_at", "is", null)
      .where("expires_at", ">", sql<Date>`now()`)
      .execute();
    return { email: user.email };
  });
}
