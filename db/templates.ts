import "server-only";
import { sql } from "kysely";
import type { Visibility } from "./database";
import {
  type Actor,
  canOwnTemplates,
  type Db,
  findOwnTemplate,
  inTransaction,
  requireOwnTemplate,
  templateNotFound,
} from "./templateAccess";
import { check, descriptionSchema, TemplateError, tagsSchema, TITLE_MAX, titleSchema, visibilitySchema } from "./templateRules";
import { checkVersionInput, insertVersion, programmeForVersion, type VersionSummary, listVersions } from "./templateVersions";

export type { Actor } from "./templateAccess";

type VersionRef = { id: string; number: number; createdAt: Date };

export type TemplateSummary = {
  id: string;
  title: string;
  description: string;
  tags: string[];
  visibility: Visibility;
  archived: boolean;
  latestVersion: VersionRef | null;
  updatedAt: Date;
  hasDraft: boolean;
};

export type TemplateDetail = TemplateSummary & {
  createdAt: Date;
  /** The version this template was copied from, when that version is still the actor's to see. */
  forkedFrom: { templateId: string; title: string; versionNumber: number } | null;
  versions: VersionSummary[];
};

export type TemplatePage = { items: TemplateSummary[]; total: number; page: number; pageSize: number };

export type ListOptions = { q?: string; tag?: string; page?: number; pageSize?: number; includeArchived?: boolean };

function likePattern(text: string): string {
  return `%${text.toLowerCase().replace(/[\\%_]/g, "\\$&")}%`;
}

function summaryQuery(db: Db, actor: Actor) {
  return db
    .selectFrom("templates as t")
    .leftJoinLateral(
      (eb) =>
        eb
          .selectFrom("template_versions as v")
          .select(["v.id", "v.number", "v.created_at"])
          .whereRef("v.template_id", "=", "t.id")
          .orderBy("v.number", "desc")
          .limit(1)
          .as("lv"),
      (join) => join.onTrue(),
    )
    .select((eb) => [
      "t.id",
      "t.title",
      "t.description",
      "t.tags",
      "t.visibility",
      "t.archived_at",
      "t.updated_at",
      "t.created_at",
      "t.forked_from_version_id",
      "lv.id as lv_id",
      "lv.number as lv_number",
      "lv.created_at as lv_created_at",
      eb
        .exists(
          eb
            .selectFrom("template_drafts as d")
            .select("d.draft_key")
            .where("d.owner_id", "=", actor.id)
            .whereRef("d.template_id", "=", "t.id"),
        )
        .as("has_draft"),
    ])
    .where("t.owner_id", "=", actor.id);
}

type SummaryRow = Awaited<ReturnType<ReturnType<typeof summaryQuery>["executeTakeFirstOrThrow"]>>;

function toSummary(r: SummaryRow): TemplateSummary {
  return {
    id: r.id,
    title: r.title,
    description: r.description,
    tags: r.tags,
    visibility: r.visibility,
    archived: r.archived_at !== null,
    latestVersion: r.lv_id !== null && r.lv_number !== null && r.lv_created_at !== null ? { id: r.lv_id, number: r.lv_number, createdAt: r.lv_created_at } : null,
    updatedAt: r.updated_at,
    hasDraft: Boolean(r.has_draft),
  };
}

/**
 * The actor's templates, most recently changed first. `q` matches title or a
 * tag, case-insensitively; `tag` must be one of the tags exactly. Archived
 * templates are left out unless asked for.
 */
export async function listTemplates(db: Db, actor: Actor, options: ListOptions = {}): Promise<TemplatePage> {
  const page = Math.max(1, Math.floor(options.page ?? 1));
  const pageSize = Math.min(100, Math.max(1, Math.floor(options.pageSize ?? 20)));
  if (!canOwnTemplates(actor)) return { items: [], total: 0, page, pageSize };

  let query = summaryQuery(db, actor);
  if (!options.includeArchived) query = query.where("t.archived_at", "is", null);
  const q = options.q?.trim();
  if (q) {
    const pattern = likePattern(q);
    query = query.where((eb) =>
      eb.or([eb("t.title", "ilike", pattern), sql<boolean>`exists (select 1 from unnest(t.tags) as tag where tag like ${pattern})`]),
    );
  }
  const tag = options.tag?.trim().toLowerCase();
  if (tag) query = query.where(sql<boolean>`t.tags @> array[${tag}]::text[]`);

  const [rows, count] = await Promise.all([
    query.orderBy("t.updated_at", "desc").orderBy("t.id").limit(pageSize).offset((page - 1) * pageSize).execute(),
    query.clearSelect().select((eb) => eb.fn.countAll<string>().as("n")).executeTakeFirstOrThrow(),
  ]);
  return { items: rows.map(toSummary), total: Number(count.n), page, pageSize };
}

/** One of the actor's templates with its versions (newest first); null when it is not theirs. */
export async function getTemplate(db: Db, actor: Actor, id: string): Promise<TemplateDetail | null> {
  if (!(await findOwnTemplate(db, actor, id))) return null;
  const row = await summaryQuery(db, actor).where("t.id", "=", id).executeTakeFirst();
  if (!row) return null;
  const versions = (await listVersions(db, actor, id)) ?? [];
  let forkedFrom: TemplateDetail["forkedFrom"] = null;
  if (row.forked_from_version_id) {
    const origin = await db
      .selectFrom("template_versions as v")
      .innerJoin("templates as o", "o.id", "v.template_id")
      .select(["o.id", "o.title", "v.number"])
      .where("v.id", "=", row.forked_from_version_id)
      .where("o.owner_id", "=", actor.id)
      .executeTakeFirst();
    if (origin) forkedFrom = { templateId: origin.id, title: origin.title, versionNumber: origin.number };
  }
  return { ...toSummary(row), createdAt: row.created_at, forkedFrom, versions };
}

export type CreateInput = { title: unknown; description?: unknown; tags?: unknown; source: unknown; note?: unknown };
export type Created = { id: string; version: VersionRef };

/**
 * A new template and its version 1, together or not at all. With
 * `clearNewDraft` the actor's unsaved "new" draft goes in the same transaction
 * (the editor saved it); imports and copies leave that draft alone.
 */
export async function createTemplate(
  db: Db,
  actor: Actor,
  input: CreateInput,
  options: { clearNewDraft?: boolean; forkedFromVersionId?: string | null } = {},
): Promise<Created> {
  if (!canOwnTemplates(actor)) throw templateNotFound();
  const title = check(titleSchema, input.title, "title");
  const description = input.description == null ? "" : check(descriptionSchema, input.description, "description");
  const tags = input.tags == null ? [] : check(tagsSchema, input.tags, "tags");
  const { source, note } = checkVersionInput(input);
  const model = programmeForVersion(source);
  return inTransaction(db, async (trx) => {
    const t = await trx
      .insertInto("templates")
      .values({
        owner_id: actor.id,
        title,
        description,
        tags,
        visibility: "private",
        archived_at: null,
        forked_from_version_id: options.forkedFromVersionId ?? null,
      })
      .returning("id")
      .executeTakeFirstOrThrow();
    const version = await insertVersion(trx, { templateId: t.id, authorId: actor.id, number: 1, source, model, note });
    if (options.clearNewDraft) {
      await trx.deleteFrom("template_drafts").where("owner_id", "=", actor.id).where("draft_key", "=", "new").execute();
    }
    return { id: t.id, version };
  });
}

export type MetaPatch = { title?: unknown; description?: unknown; tags?: unknown; visibility?: unknown; archived?: unknown };

/** Changes what describes a template (never its versions); `archived: false` brings an archived one back. */
export async function updateTemplateMeta(db: Db, actor: Actor, id: string, patch: MetaPatch): Promise<void> {
  const set: { title?: string; description?: string; tags?: string[]; visibility?: Visibility; archived_at?: Date | null; updated_at: Date } = {
    updated_at: new Date(),
  };
  if (patch.title !== undefined) set.title = check(titleSchema, patch.title, "title");
  if (patch.description !== undefined) set.description = check(descriptionSchema, patch.description ?? "", "description");
  if (patch.tags !== undefined) set.tags = check(tagsSchema, patch.tags ?? [], "tags");
  if (patch.visibility !== undefined) set.visibility = check(visibilitySchema, patch.visibility, "visibility");
  if (patch.archived !== undefined) {
    if (typeof patch.archived !== "boolean") {
      throw new TemplateError("invalid_input", "Archived is true or false", { archived: "Archived is true or false" });
    }
    set.archived_at = patch.archived ? new Date() : null;
  }
  await inTransaction(db, async (trx) => {
    await requireOwnTemplate(trx, actor, id, true);
    if (set.archived_at !== undefined && set.archived_at !== null) {
      // Archiving twice keeps the first date.
      const current = await trx.selectFrom("templates").select("archived_at").where("id", "=", id).executeTakeFirstOrThrow();
      if (current.archived_at) set.archived_at = current.archived_at;
    }
    await trx.updateTable("templates").set(set).where("id", "=", id).execute();
  });
}

/** Whether athletes were given this template (then deleting archives it instead). */
export async function hasAssignments(db: Db, templateId: string): Promise<boolean> {
  const row = await db.selectFrom("template_assignments").select("id").where("template_id", "=", templateId).limit(1).executeTakeFirst();
  return row !== undefined;
}

/** Deletes a template with its versions, drafts and links, or archives it when athletes were given it. */
export async function deleteTemplate(db: Db, actor: Actor, id: string): Promise<{ outcome: "deleted" | "archived" }> {
  return inTransaction(db, async (trx) => {
    await requireOwnTemplate(trx, actor, id, true);
    if (await hasAssignments(trx, id)) {
      await trx
        .updateTable("templates")
        .set({ archived_at: sql<Date>`coalesce(archived_at, now())`, updated_at: new Date() })
        .where("id", "=", id)
        .execute();
      return { outcome: "archived" as const };
    }
    await trx.deleteFrom("templates").where("id", "=", id).execute();
    return { outcome: "deleted" as const };
  });
}

/** "Title (copy)", shortened so the result stays within the title limit. */
export function copyTitle(title: string): string {
  const suffix = " (copy)";
  return title.length + suffix.length <= TITLE_MAX ? title + suffix : `${title.slice(0, TITLE_MAX - suffix.length - 1).trimEnd()}…${suffix}`;
}

/** A new private template of the actor's own, starting from a version (latest by default) of one of theirs. */
export async function forkTemplate(db: Db, actor: Actor, templateId: string, versionNumber?: number): Promise<Created> {
  const origin = await findOwnTemplate(db, actor, templateId);
  if (!origin) throw templateNotFound();
  let q = db
    .selectFrom("template_versions")
    .select(["id", "number", "source"])
    .where("template_id", "=", templateId)
    .orderBy("number", "desc")
    .limit(1);
  if (versionNumber !== undefined) q = q.where("number", "=", versionNumber);
  const version = await q.executeTakeFirst();
  if (!version) throw new TemplateError("not_found", versionNumber === undefined ? "That template has no versions yet." : `That template has no version ${versionNumber}.`, { versionNumber: "No such version" });
  return createTemplate(
    db,
    actor,
    {
      title: copyTitle(origin.title),
      description: origin.description,
      tags: origin.tags,
      source: version.source,
      note: `Copied from “${origin.title}” version ${version.number}`,
    },
    { forkedFromVersionId: version.id },
  );
}
