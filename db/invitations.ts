import "server-only";
import { createHash, randomBytes } from "node:crypto";
import { type Kysely, sql, type Transaction } from "kysely";
import type { Database, InvitationsTable, Role } from "./database";
import { DomainError } from "./domainError";
import { isUuid } from "./templateRules";
import { createUser } from "./users";

type Db = Kysely<Database> | Transaction<Database>;
type Actor = { id: string; role: Role };

export const INVITATION_DAYS = 7;
const DAY_MS = 24 * 60 * 60 * 1000;

/** 32 random bytes (256 bits) as base64url: the plain token only ever travels in the e-mail. */
export function newSecretToken(): string {
  return randomBytes(32).toString("base64url");
}

/** What is stored instead of the token: a leaked table does not open any link. */
export function hashSecretToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}

const TOKEN_SHAPE = /^[A-Za-z0-9_-]{32,128}$/;
export function looksLikeToken(token: string): boolean {
  return TOKEN_SHAPE.test(token);
}

export async function inTransaction<T>(db: Db, fn: (trx: Transaction<Database>) => Promise<T>): Promise<T> {
  if (db.isTransaction) return fn(db as Transaction<Database>);
  return (db as Kysely<Database>).transaction().execute(fn);
}

/** Why a link cannot be used; the pages say which and what to do. */
export type ClosedState = "unknown" | "accepted" | "used" | "expired" | "revoked";

/** A link (invitation or password reset) that is unknown, used, expired or withdrawn. */
export class LinkClosedError extends DomainError {
  constructor(readonly state: ClosedState, message: string) {
    super(state === "unknown" ? "not_found" : "conflict", message, { token: state });
    this.name = "LinkClosedError";
  }
}

export type InvitationState = "pending" | "accepted" | "expired" | "revoked";

export type InvitationSummary = {
  id: string;
  email: string;
  name: string | null;
  state: InvitationState;
  expiresAt: Date;
  sentAt: Date;
  createdAt: Date;
  acceptedAt: Date | null;
};

type Row = Pick<InvitationsTable, "email" | "name" | "expires_at" | "accepted_at" | "revoked_at"> & { id: string; sent_at: Date; created_at: Date };
const COLUMNS = ["id", "email", "name", "expires_at", "sent_at", "created_at", "accepted_at", "revoked_at"] as const;

function stateOf(row: Pick<Row, "accepted_at" | "revoked_at" | "expires_at">, now = new Date()): InvitationState {
  if (row.accepted_at) return "accepted";
  if (row.revoked_at) return "revoked";
  return row.expires_at.getTime() <= now.getTime() ? "expired" : "pending";
}

function summary(row: Row): InvitationSummary {
  return {
    id: row.id,
    email: row.email,
    name: row.name,
    state: stateOf(row),
    expiresAt: row.expires_at,
    sentAt: row.sent_at,
    createdAt: row.created_at,
    acceptedAt: row.accepted_at,
  };
}

function notFound(): DomainError {
  return new DomainError("not_found", "That invitation does not exist or is not yours.");
}

function requireCoach(actor: Actor): void {
  if (actor.role !== "coach") throw new DomainError("forbidden", "Only coaches invite athletes.");
}

const lowerEmail = (email: string) => email.trim().toLowerCase();

export type IssuedInvitation = { invitation: InvitationSummary; token: string; coachName: string };

/**
 * A new invitation from a coach to an e-mail address, with the plain token for the e-mail.
 * Refused (conflict, field `email`) when the person is already on the coach's roster or an
 * invitation to the same address is still open.
 *
 * @example
 * const { token, invitation } = await createInvitation(db, coach, { email: "tomas@larchmere.test", name: "Tomas" });
 */
export async function createInvitation(db: Db, actor: Actor, input: { email: string; name: string | null }): Promise<IssuedInvitation> {
  requireCoach(actor);
  const email = input.email.trim();
  return inTransaction(db, async (trx) => {
    // Two quick clicks must not send two open invitations to one address.
    await sql`select pg_advisory_xact_lock(hashtext(${`invite:${actor.id}:${lowerEmail(email)}`}))`.execute(trx);
    const coach = await trx.selectFrom("users").select("name").where("id", "=", actor.id).where("role", "=", "coach").executeTakeFirst();
    if (!coach) throw new DomainError("forbidden", "Only coaches invite athletes.");
    const onRoster = await trx
      .selectFrom("users")
      .select("id")
      .where((eb) => eb(eb.fn("lower", ["email"]), "=", lowerEmail(email)))
      .where("coach_id", "=", actor.id)
      .where("role", "=", "athlete")
      .executeTakeFirst();
    if (onRoster) throw new DomainError("conflict", `${email} is already on your roster.`, { email: "Already on your roster" });
    const open = await trx
      .selectFrom("invitations")
      .select("id")
      .where("coach_id", "=", actor.id)
      .where((eb) => eb(eb.fn("lower", ["email"]), "=", lowerEmail(email)))
      .where("accepted_at", "is", null)
      .where("revoked_at", "is", null)
      .where("expires_at", ">", sql<Date>`now()`)
      .executeTakeFirst();
    if (open) {
      throw new DomainError("conflict", `An invitation to ${email} is still open. Send it again from the list instead.`, {
        email: "Already invited — use Resend in the list below",
      });
    }
    const token = newSecretToken();
    const row = await trx
      .insertInto("invitations")
      .values({
        coach_id: actor.id,
        email,
        name: input.name?.trim() || null,
        token_hash: hashSecretToken(token),
        expires_at: new Date(Date.now() + INVITATION_DAYS * DAY_MS),
        accepted_at: null,
        accepted_user_id: null,
        revoked_at: null,
      })
      .returning(COLUMNS)
      .executeTakeFirstOrThrow();
    return { invitation: summary(row), token, coachName: coach.name };
  });
}

/** Locks one of the coach's invitations for a change; others' answer like missing ones. */
async function lockOwn(trx: Transaction<Database>, actor: Actor, id: string): Promise<Row> {
  if (!isUuid(id)) throw notFound();
  const row = await trx.selectFrom("invitations").select(COLUMNS).where("id", "=", id).where("coach_id", "=", actor.id).forUpdate().executeTakeFirst();
  if (!row) throw notFound();
  return row;
}

/**
 * A new token and a new week for an invitation not yet accepted; the old link stops working
 * because its hash is gone. Works on expired invitations (that is what it is for), not on
 * accepted or withdrawn ones.
 */
export async function resendInvitation(db: Db, actor: Actor, id: string): Promise<IssuedInvitation> {
  requireCoach(actor);
  return inTransaction(db, async (trx) => {
    const row = await lockOwn(trx, actor, id);
    const state = stateOf(row);
    if (state === "accepted") throw new DomainError("conflict", `${row.email} has already accepted this invitation.`);
    if (state === "revoked") throw new DomainError("conflict", `This invitation to ${row.email} was withdrawn. Send a new one instead.`);
    const token = newSecretToken();
    const updated = await trx
      .updateTable("invitations")
      .set({ token_hash: hashSecretToken(token), expires_at: new Date(Date.now() + INVITATION_DAYS * DAY_MS), sent_at: sql<Date>`now()` })
      .where("id", "=", row.id)
      .returning(COLUMNS)
      .executeTakeFirstOrThrow();
    const coach = await trx.selectFrom("users").select("name").where("id", "=", actor.id).executeTakeFirstOrThrow();
    return { invitation: summary(updated), token, coachName: coach.name };
  });
}

/** Withdraws an invitation not yet accepted; withdrawing twice is harmless. */
export async function revokeInvitation(db: Db, actor: Actor, id: string): Promise<InvitationSummary> {
  requireCoach(actor);
  return inTransaction(db, async (trx) => {
    const row = await lockOwn(trx, actor, id);
    if (row.accepted_at) throw new DomainError("conflict", `${row.email} has already accepted this invitation; it can no longer be withdrawn.`);
    if (row.revoked_at) return summary(row);
    const updated = await trx.updateTable("invitations").set({ revoked_at: sql<Date>`now()` }).where("id", "=", row.id).returning(COLUMNS).executeTakeFirstOrThrow();
    return summary(updated);
  });
}

/** The coach's invitations, newest first, each with its state. */
export async function listInvitations(db: Db, actor: Actor, limit = 200): Promise<InvitationSummary[]> {
  if (actor.role !== "coach") return [];
  const rows = await db.selectFrom("invitations").select(COLUMNS).where("coach_id", "=", actor.id).orderBy("created_at", "desc").limit(limit).execute();
  return rows.map(summary);
}

/** Who the invited address already belongs to: nobody, an athlete (link them), or an account that cannot join. */
export type InvitedAccount = "none" | "athlete" | "staff" | "disabled";

export type InvitationLookup =
  | { status: "unknown" }
  | { status: "accepted" | "expired" | "revoked"; coachName: string }
  | { status: "pending"; coachName: string; email: string; name: string | null; expiresAt: Date; account: InvitedAccount };

async function accountFor(db: Db, email: string): Promise<{ id: string; email: string; role: Role; disabled: boolean; passwordHash: string } | null> {
  const user = await db
    .selectFrom("users")
    .select(["id", "email", "role", "disabled_at", "password_hash"])
    .where((eb) => eb(eb.fn("lower", ["email"]), "=", lowerEmail(email)))
    .executeTakeFirst();
  return user ? { id: user.id, email: user.email, role: user.role, disabled: user.disabled_at !== null, passwordHash: user.password_hash } : null;
}

function accountKind(user: { role: Role; disabled: boolean } | null): InvitedAccount {
  if (!user) return "none";
  if (user.disabled) return "disabled";
  return user.role === "athlete" ? "athlete" : "staff";
}

/** What the invitation page shows for a link. Reading never changes anything. */
export async function findInvitationByToken(db: Db, token: string): Promise<InvitationLookup> {
  if (!looksLikeToken(token)) return { status: "unknown" };
  const row = await db
    .selectFrom("invitations as i")
    .innerJoin("users as c", "c.id", "i.coach_id")
    .select(["i.email", "i.name", "i.expires_at", "i.accepted_at", "i.revoked_at", "c.name as coach_name"])
    .where("i.token_hash", "=", hashSecretToken(token))
    .executeTakeFirst();
  if (!row) return { status: "unknown" };
  const state = stateOf(row);
  if (state !== "pending") return { status: state, coachName: row.coach_name };
  const account = accountKind(await accountFor(db, row.email));
  return { status: "pending", coachName: row.coach_name, email: row.email, name: row.name, expiresAt: row.expires_at, account };
}

const CLOSED_MESSAGES: Record<Exclude<ClosedState, "used">, string> = {
  unknown: "This invitation link isn't valid. Check that the whole link was copied, or ask your coach to send it again.",
  accepted: "This invitation has already been used. Sign in with the e-mail it was sent to.",
  expired: "This invitation has expired. Ask your coach to send it again; the new e-mail carries a fresh link.",
  revoked: "Your coach withdrew this invitation. Ask them if they meant to, and for a new one if so.",
};

export type AcceptClaim =
  | { kind: "new"; name: string; passwordHash: string }
  /** An athlete account exists: its own password proves the person holding the link owns it. */
  | { kind: "existing"; checkPassword: (storedHash: string) => Promise<boolean> };

export type Accepted = { userId: string; email: string; coachId: string; linked: boolean };

/**
 * Uses an invitation, once: creates the athlete account under the coach, or links an existing
 * athlete account to them. The invitation row is locked and re-checked
 * (`accepted_at is null and revoked_at is null and expires_at > now()`), so two submissions of
 * the same link cannot both succeed. Anything refused changes nothing.
 */
export async function acceptInvitation(db: Db, token: string, claim: AcceptClaim): Promise<Accepted> {
  if (!looksLikeToken(token)) throw new LinkClosedError("unknown", CLOSED_MESSAGES.unknown);
  return inTransaction(db, async (trx) => {
    const hash = hashSecretToken(token);
    const invitation = await trx
      .selectFrom("invitations")
      .select(["id", "coach_id", "email"])
      .where("token_hash", "=", hash)
      .where("accepted_at", "is", null)
      .where("revoked_at", "is", null)
      .where("expires_at", ">", sql<Date>`now()`)
      .forUpdate()
      .executeTakeFirst();
    if (!invitation) {
      const row = await trx.selectFrom("invitations").select(["accepted_at", "revoked_at", "expires_at"]).where("token_hash", "=", hash).executeTakeFirst();
      const state = row ? stateOf(row) : "unknown";
      const closed = state === "pending" ? "expired" : state;
      throw new LinkClosedError(closed, CLOSED_MESSAGES[closed]);
    }
    const existing = await accountFor(trx, invitation.email);
    const kind = accountKind(existing);
    if (kind === "staff") {
      throw new DomainError("forbidden", `${invitation.email} belongs to a coach or admin account, which cannot join as an athlete. Ask your coach to invite another address.`);
    }
    if (kind === "disabled") throw new DomainError("forbidden", `The account for ${invitation.email} is switched off. Ask the person who runs your Ironquill account.`);

    let userId: string;
    // The address to sign in with: the account's own spelling when it already existed.
    let email = invitation.email;
    if (claim.kind === "new") {
      if (existing) throw new DomainError("conflict", `${invitation.email} already has an account. Reload the page to link it with its password.`);
      const created = await createUser(trx, { email: invitation.email, name: claim.name, passwordHash: claim.passwordHash, role: "athlete", coachId: invitation.coach_id });
      if (!created) throw new DomainError("conflict", `${invitation.email} already has an account. Reload the page to link it with its password.`);
      userId = created.id;
    } else {
      if (!existing) throw new DomainError("conflict", `There is no account for ${invitation.email} yet. Reload the page to create one.`);
      if (!(await claim.checkPassword(existing.passwordHash))) {
        throw new DomainError("invalid_input", `That is not the password of the account for ${invitation.email}.`, { password: "Not the password of this account" });
      }
      await trx.updateTable("users").set({ coach_id: invitation.coach_id }).where("id", "=", existing.id).execute();
      userId = existing.id;
      email = existing.email;
    }
    await trx.updateTable("invitations").set({ accepted_at: sql<Date>`now()`, accepted_user_id: userId }).where("id", "=", invitation.id).execute();
    return { userId, email, coachId: invitation.coach_id, linked: claim.kind === "existing" };
  });
}
