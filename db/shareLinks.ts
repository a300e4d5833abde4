import "server-only";
import { randomBytes } from "node:crypto";
import type { Programme } from "../lib/notation/model";
import { type Actor, canOwnTemplates, type Db, findOwnTemplate, inTransaction, requireOwnTemplate } from "./templateAccess";
import { TemplateError } from "./templateRules";
import { readModel } from "./templateVersions";

export type ShareLink = { token: string; versionNumber: number; createdAt: Date };

/** What anyone holding a link may read: the programme, and the owner's display name only. */
export type SharedVersion = {
  title: string;
  description: string;
  versionNumber: number;
  versionCreatedAt: Date;
  source: string;
  model: Programme;
  ownerName: string;
};

// 32 random bytes (256 bits) in base64url: 43 characters, never guessable.
const TOKEN_BYTES = 32;
const TOKEN_SHAPE = /^[A-Za-z0-9_-]{22,128}$/;

export function newShareToken(): string {
  return randomBytes(TOKEN_BYTES).toString("base64url");
}

/**
 * A read-only link to one version. Asking again for the same version returns
 * the link already out rather than minting another. A private template
 * becomes "link": setting it back to private later stops every link from
 * working without revoking them.
 */
export async function createShareLink(
  db: Db,
  actor: Actor,
  templateId: string,
  versionNumber: number,
): Promise<ShareLink & { reused: boolean }> {
  return inTransaction(db, async (trx) => {
    await requireOwnTemplate(trx, actor, templateId, true);
    const version = Number.isSafeInteger(versionNumber)
      ? await trx
          .selectFrom("template_versions")
          .select(["id", "number"])
          .where("template_id", "=", templateId)
          .where("number", "=", versionNumber)
          .executeTakeFirst()
      : undefined;
    if (!version) throw new TemplateError("not_found", `That template has no version ${versionNumber}.`, { versionNumber: "No such version" });
    await trx.updateTable("templates").set({ visibility: "link" }).where("id", "=", templateId).where("visibility", "=", "private").execute();
    const existing = await trx
      .selectFrom("share_links")
      .select(["token", "created_at"])
      .where("version_id", "=", version.id)
      .where("created_by", "=", actor.id)
      .where("revoked_at", "is", null)
      .orderBy("created_at")
      .executeTakeFirst();
    if (existing) return { token: existing.token, versionNumber: version.number, createdAt: existing.created_at, reused: true };
    const row = await trx
      .insertInto("share_links")
      .values({ token: newShareToken(), template_id: templateId, version_id: version.id, created_by: actor.id, revoked_at: null })
      .returning(["token", "created_at"])
      .executeTakeFirstOrThrow();
    return { token: row.token, versionNumber: version.number, createdAt: row.created_at, reused: false };
  });
}

/** The links of an own template that still work (not revoked), newest first; null when not theirs. */
export async function listShareLinks(db: Db, actor: Actor, templateId: string): Promise<ShareLink[] | null> {
  if (!(await findOwnTemplate(db, actor, templateId))) return null;
  const rows = await db
    .selectFrom("share_links as s")
    .innerJoin("template_versions as v", "v.id", "s.version_id")
    .select(["s.token", "s.created_at", "v.number"])
    .where("s.template_id", "=", templateId)
    .where("s.revoked_at", "is", null)
    .orderBy("s.created_at", "desc")
    .execute();
  return rows.map((r) => ({ token: r.token, versionNumber: r.number, createdAt: r.created_at }));
}

/** Revokes a link to one of the actor's templates; revoking twice is fine. Anyone else's link is not_found. */
export async function revokeShareLink(db: Db, actor: Actor, token: string): Promise<{ revoked: true }> {
  const notFound = new TemplateError("not_found", "That share link does not exist or is not yours.");
  if (!canOwnTemplates(actor) || !TOKEN_SHAPE.test(token)) throw notFound;
  const link = await db
    .selectFrom("share_links as s")
    .innerJoin("templates as t", "t.id", "s.template_id")
    .select(["s.token"])
    .where("s.token", "=", token)
    .where("t.owner_id", "=", actor.id)
    .executeTakeFirst();
  if (!link) throw notFound;
  await db.updateTable("share_links").set({ revoked_at: new Date() }).where("token", "=", token).where("revoked_at", "is", null).execute();
  return { revoked: true };
}

/**
 * The version behind a link, for anyone holding it; null when the link is
 * unknown, revoked, or its template was made private again.
 */
export async function getSharedVersion(db: Db, token: string): Promise<SharedVersion | null> {
  if (!TOKEN_SHAPE.test(token)) return null;
  const r = await db
    .selectFrom("share_links as s")
    .innerJoin("templates as t", "t.id", "s.template_id")
    .innerJoin("template_versions as v", "v.id", "s.version_id")
    .innerJoin("users as o", "o.id", "t.owner_id")
    .select(["t.title", "t.description", "v.number", "v.created_at", "v.source", "v.model", "o.name"])
    .where("s.token", "=", token)
    .where("s.revoked_at", "is", null)
    .where("t.visibility", "in", ["link", "listed"])
    .executeTakeFirst();
  if (!r) return null;
  return {
    title: r.title,
    description: r.description,
    versionNumber: r.number,
    versionCreatedAt: r.created_at,
    source: r.source,
    model: readModel(r.model, r.source),
    ownerName: r.name,
  };
}
