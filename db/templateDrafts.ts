import "server-only";
import { type Actor, canOwnTemplates, type Db, requireOwnTemplate, templateNotFound } from "./templateAccess";
import { check, draftSourceSchema, TemplateError } from "./templateRules";

/** "new" for a programme that is not a template yet, else the template's id. */
export type DraftKey = string;
export const NEW_DRAFT = "new";

export type Draft = { source: string; baseVersion: number | null; updatedAt: Date };

async function checkKey(db: Db, actor: Actor, key: DraftKey): Promise<string | null> {
  if (key === NEW_DRAFT) {
    if (!canOwnTemplates(actor)) throw templateNotFound();
    return null;
  }
  return (await requireOwnTemplate(db, actor, key)).id;
}

/**
 * Keeps whatever the coach typed, parseable or not (only the size is
 * limited): autosave must never refuse work. One draft per coach and key; the
 * newest write wins.
 */
export async function saveDraft(
  db: Db,
  actor: Actor,
  key: DraftKey,
  input: { source: unknown; baseVersion?: unknown },
): Promise<{ updatedAt: Date }> {
  const source = check(draftSourceSchema, input.source, "source");
  const base = input.baseVersion ?? null;
  if (base !== null && !(Number.isSafeInteger(base) && (base as number) >= 1)) {
    throw new TemplateError("invalid_input", "The base version is a version number (1, 2, …)", { baseVersion: "A version number (1, 2, …)" });
  }
  const templateId = await checkKey(db, actor, key);
  const now = new Date();
  const row = await db
    .insertInto("template_drafts")
    .values({ owner_id: actor.id, draft_key: key, template_id: templateId, source, base_version: base as number | null, updated_at: now })
    .onConflict((oc) => oc.columns(["owner_id", "draft_key"]).doUpdateSet({ source, base_version: base as number | null, updated_at: now }))
    .returning("updated_at")
    .executeTakeFirstOrThrow();
  return { updatedAt: row.updated_at };
}

/** The actor's draft for the key, or null when there is none; a template not theirs is not_found. */
export async function getDraft(db: Db, actor: Actor, key: DraftKey): Promise<Draft | null> {
  await checkKey(db, actor, key);
  const row = await db
    .selectFrom("template_drafts")
    .select(["source", "base_version", "updated_at"])
    .where("owner_id", "=", actor.id)
    .where("draft_key", "=", key)
    .executeTakeFirst();
  return row ? { source: row.source, baseVersion: row.base_version, updatedAt: row.updated_at } : null;
}

/** Throws the draft away (the coach chose to); says whether there was one. */
export async function clearDraft(db: Db, actor: Actor, key: DraftKey): Promise<{ cleared: boolean }> {
  await checkKey(db, actor, key);
  const result = await db.deleteFrom("template_drafts").where("owner_id", "=", actor.id).where("draft_key", "=", key).executeTakeFirst();
  return { cleared: Number(result.numDeletedRows) > 0 };
}
