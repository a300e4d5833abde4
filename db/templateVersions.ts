import "server-only";
import { type Transaction } from "kysely";
import { parseProgramme } from "../lib/notation/index";
import { programmeSchema, type Programme } from "../lib/notation/model";
import type { Database } from "./database";
import { type Actor, type Db, findOwnTemplate, inTransaction, requireOwnTemplate } from "./templateAccess";
import { check, noteSchema, sourceProblems, versionSourceSchema } from "./templateRules";

export type VersionSummary = { id: string; number: number; note: string | null; createdAt: Date; authorName: string };
export type VersionDetail = VersionSummary & { templateId: string; templateTitle: string; source: string; model: Programme };

/** The programme a source stands for, or invalid_input listing every error with its line:column. */
export function programmeForVersion(source: string): Programme {
  const { programme, diagnostics } = parseProgramme(source);
  const problem = sourceProblems(diagnostics);
  if (problem) throw problem;
  return programme;
}

/** Checks a version's source and note the same way for every path that saves one. */
export function checkVersionInput(input: { source: unknown; note?: unknown }): { source: string; note: string | null } {
  const source = check(versionSourceSchema, input.source, "source");
  const note = input.note === undefined || input.note === null ? null : check(noteSchema, input.note, "note");
  return { source, note };
}

/** Inserts the next version; the caller holds the template's row lock and has checked the input. */
export async function insertVersion(
  trx: Transaction<Database>,
  v: { templateId: string; authorId: string; number: number; source: string; model: Programme; note: string | null },
): Promise<{ id: string; number: number; createdAt: Date }> {
  const row = await trx
    .insertInto("template_versions")
    .values({
      template_id: v.templateId,
      number: v.number,
      source: v.source,
      model: JSON.stringify(v.model),
      author_id: v.authorId,
      note: v.note,
    })
    .returning(["id", "number", "created_at"])
    .executeTakeFirstOrThrow();
  return { id: row.id, number: row.number, createdAt: row.created_at };
}

export type SaveVersionResult = { created: boolean; version: VersionSummary };

/**
 * Saves the text as the template's next version and clears the coach's draft.
 * Text identical to the latest version saves nothing and says so
 * (`created: false`), so pressing save twice never makes an empty version.
 * Two saves at once queue on the template's row lock and get distinct numbers.
 */
export async function saveVersion(db: Db, actor: Actor, templateId: string, input: { source: unknown; note?: unknown }): Promise<SaveVersionResult> {
  const { source, note } = checkVersionInput(input);
  return inTransaction(db, async (trx) => {
    await requireOwnTemplate(trx, actor, templateId, true);
    const latest = await trx
      .selectFrom("template_versions")
      .select(["number", "source"])
      .where("template_id", "=", templateId)
      .orderBy("number", "desc")
      .limit(1)
      .executeTakeFirst();
    let number = latest?.number ?? 0;
    const created = latest?.source !== source;
    if (created) {
      const model = programmeForVersion(source);
      number = (await insertVersion(trx, { templateId, authorId: actor.id, number: number + 1, source, model, note })).number;
      await trx.updateTable("templates").set({ updated_at: new Date() }).where("id", "=", templateId).execute();
    }
    await trx.deleteFrom("template_drafts").where("owner_id", "=", actor.id).where("draft_key", "=", templateId).execute();
    const version = (await versionRows(trx, templateId, number))[0];
    return { created, version };
  });
}

function versionQuery(db: Db, templateId: string) {
  return db
    .selectFrom("template_versions as v")
    .innerJoin("users as u", "u.id", "v.author_id")
    .where("v.template_id", "=", templateId)
    .orderBy("v.number", "desc");
}

async function versionRows(db: Db, templateId: string, number?: number): Promise<VersionSummary[]> {
  let q = versionQuery(db, templateId).select(["v.id", "v.number", "v.note", "v.created_at", "u.name as author_name"]);
  if (number !== undefined) q = q.where("v.number", "=", number);
  const rows = await q.execute();
  return rows.map((r) => ({ id: r.id, number: r.number, note: r.note, createdAt: r.created_at, authorName: r.author_name }));
}

/** Every version of an own template, newest first; null when the template is not the actor's. */
export async function listVersions(db: Db, actor: Actor, templateId: string): Promise<VersionSummary[] | null> {
  if (!(await findOwnTemplate(db, actor, templateId))) return null;
  return versionRows(db, templateId);
}

/**
 * The stored model is a cache of the source: when it no longer fits the
 * current model's shape (the notation grew), it is rebuilt from the source.
 */
export function readModel(stored: unknown, source: string): Programme {
  const parsed = programmeSchema.safeParse(stored);
  return parsed.success ? parsed.data : parseProgramme(source).programme;
}

/** One version of an own template by number (or the latest); null when there is none to show. */
export async function getVersion(db: Db, actor: Actor, templateId: string, number: number | "latest"): Promise<VersionDetail | null> {
  const template = await findOwnTemplate(db, actor, templateId);
  if (!template) return null;
  if (number !== "latest" && (!Number.isSafeInteger(number) || number < 1)) return null;
  let q = versionQuery(db, templateId).select(["v.id", "v.number", "v.note", "v.created_at", "v.source", "v.model", "u.name as author_name"]);
  q = number === "latest" ? q.limit(1) : q.where("v.number", "=", number);
  const r = await q.executeTakeFirst();
  if (!r) return null;
  return {
    id: r.id,
    number: r.number,
    note: r.note,
    createdAt: r.created_at,
    authorName: r.author_name,
    templateId,
    templateTitle: template.title,
    source: r.source,
    model: readModel(r.model, r.source),
  };
}
