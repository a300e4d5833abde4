import { readFileSync } from "node:fs";
import path from "node:path";
import { sql } from "kysely";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { migrateToLatest } from "../../db/migrate";
import { createUser } from "../../db/users";
import {
  copyTitle,
  createTemplate,
  deleteTemplate,
  forkTemplate,
  getTemplate,
  listTemplates,
  updateTemplateMeta,
  type Actor,
} from "../../db/templates";
import { getVersion, saveVersion } from "../../db/templateVersions";
import { TemplateError } from "../../db/templateRules";
import { createScratchDb } from "../support/scratchDb";

const SAMPLE = readFileSync(path.join(__dirname, "../../templates/upper-lower.iq"), "utf8");
const small = (reps: number) => `title: Small\nday A mon\n  back squat 3x${reps} @75%\n`;

/** Resolves to the TemplateError a call fails with (and fails the test if it succeeds). */
async function failure(p: Promise<unknown>): Promise<TemplateError> {
  try {
    await p;
  } catch (err) {
    if (err instanceof TemplateError) return err;
    throw err;
  }
  throw new Error("expected the call to fail");
}

describe("templates and their versions", () => {
  let scratch: Awaited<ReturnType<typeof createScratchDb>>;
  let ada: Actor;
  let ben: Actor;
  let athlete: Actor;

  beforeAll(async () => {
    scratch = await createScratchDb();
    await migrateToLatest(scratch.db);
    const make = async (email: string, name: string, role: Actor["role"]) => {
      const u = await createUser(scratch.db, { email, name, passwordHash: "h", role });
      return { id: u!.id, role };
    };
    ada = await make("ada@t.test", "Ada Quill", "coach");
    ben = await make("ben@t.test", "Ben Marsh", "coach");
    athlete = await make("cal@t.test", "Cal", "athlete");
  });
  afterAll(async () => {
    await scratch?.drop();
  });

  it("creates a template with version 1 holding the source and its parsed model", async () => {
    const made = await createTemplate(scratch.db, ada, { title: "  Upper/lower ", tags: ["Strength", "strength", " KG "], source: SAMPLE, note: "first cut" });
    expect(made.version.number).toBe(1);
    const t = await getTemplate(scratch.db, ada, made.id);
    expect(t?.title).toBe("Upper/lower");
    expect(t?.tags).toEqual(["strength", "kg"]);
    expect(t?.visibility).toBe("private");
    expect(t?.versions).toEqual([expect.objectContaining({ number: 1, note: "first cut", authorName: "Ada Quill" })]);
    const v = await getVersion(scratch.db, ada, made.id, 1);
    expect(v?.source).toBe(SAMPLE);
    // The sample file has four `day` lines; count them in the text itself.
    const dayLines = SAMPLE.split("\n").filter((l) => /^day /.test(l)).length;
    expect(v?.model.blocks.flatMap((b) => b.days)).toHaveLength(dayLines);
    expect(v?.model.title).toBe("Upper/lower, four days");
  });

  it("refuses a missing or over-long title, too many tags and a long note, naming the field", async () => {
    expect((await failure(createTemplate(scratch.db, ada, { title: "", source: small(5) }))).fields).toEqual({ title: "Give the template a title" });
    expect((await failure(createTemplate(scratch.db, ada, { title: undefined, source: small(5) }))).fields.title).toMatch(/title/);
    expect((await failure(createTemplate(scratch.db, ada, { title: "x".repeat(121), source: small(5) }))).fields.title).toMatch(/120 characters/);
    const tags = Array.from({ length: 13 }, (_, i) => `t${i}`);
    expect((await failure(createTemplate(scratch.db, ada, { title: "T", tags, source: small(5) }))).fields.tags).toMatch(/at most 12 tags/);
    const longTag = await failure(createTemplate(scratch.db, ada, { title: "T", tags: ["x".repeat(33)], source: small(5) }));
    expect(longTag.fields["tags.0"]).toMatch(/32 characters/);
    const note = await failure(createTemplate(scratch.db, ada, { title: "T", source: small(5), note: "n".repeat(501) }));
    expect(note.code).toBe("invalid_input");
    expect(note.fields).toEqual({ note: expect.stringMatching(/500 characters/) });
    expect((await failure(createTemplate(scratch.db, ada, { title: "T", source: "  \n" }))).fields.source).toBe("The programme is empty");
  });

  it("refuses a version whose source has errors, with every problem at its line:column", async () => {
    const source = "title: Broken\nunits: kgs\nday A mon\n  back squat 3xx5 @75%\n";
    const err = await failure(createTemplate(scratch.db, ada, { title: "Broken", source }));
    expect(err.code).toBe("invalid_input");
    // Positions counted in the text itself (1-based line and column).
    const lines = source.split("\n");
    const unitCol = lines[1].indexOf("kgs") + 1;
    expect(err.fields.source).toMatch(new RegExp(`^2 problems, first at 2:${unitCol}: .*kgs`));
    expect(err.diagnostics.map((d) => d.line)).toEqual([2, 4]);
    expect(err.diagnostics[0].column).toBe(unitCol);
    expect(err.diagnostics[1].column).toBeGreaterThanOrEqual(lines[3].indexOf("3xx5") + 1);
    const { rows } = await sql<{ n: string }>`select count(*) as n from templates where title = 'Broken'`.execute(scratch.db);
    expect(Number(rows[0].n)).toBe(0);
  });

  it("lists, searches by title or tag case-insensitively, filters by tag and pages", async () => {
    const mine = await listTemplates(scratch.db, ada, { pageSize: 100 });
    for (const t of mine.items) await deleteTemplate(scratch.db, ada, t.id);
    const specs = [
      { title: "Winter Strength", tags: ["strength", "winter"] },
      { title: "Summer hypertrophy", tags: ["muscle"] },
      { title: "Meet peak", tags: ["strength", "meet"] },
      { title: "100% effort_days", tags: [] },
      { title: "Easy week", tags: ["deload"] },
    ];
    for (const s of specs) await createTemplate(scratch.db, ada, { ...s, source: small(5) });

    const byTitle = await listTemplates(scratch.db, ada, { q: "WINTER" });
    expect(byTitle.items.map((t) => t.title)).toEqual(["Winter Strength"]);
    const byTag = await listTemplates(scratch.db, ada, { q: "Musc" });
    expect(byTag.items.map((t) => t.title)).toEqual(["Summer hypertrophy"]);
    const tagged = await listTemplates(scratch.db, ada, { tag: "Strength" });
    expect(tagged.items.map((t) => t.title).sort()).toEqual(["Meet peak", "Winter Strength"]);
    // % and _ are searched for literally, not as wildcards.
    expect((await listTemplates(scratch.db, ada, { q: "0%" })).items.map((t) => t.title)).toEqual(["100% effort_days"]);
    expect((await listTemplates(scratch.db, ada, { q: "t_d" })).total).toBe(1);

    const pages = await Promise.all([1, 2, 3].map((page) => listTemplates(scratch.db, ada, { page, pageSize: 2 })));
    expect(pages.map((p) => p.items.length)).toEqual([2, 2, 1]);
    expect(pages.every((p) => p.total === specs.length)).toBe(true);
    const ids = pages.flatMap((p) => p.items.map((i) => i.id));
    expect(new Set(ids).size).toBe(specs.length);
    // Most recently changed first.
    expect(pages[0].items[0].title).toBe("Easy week");
    expect(pages[0].items[0].latestVersion?.number).toBe(1);
    expect(pages[0].items[0].hasDraft).toBe(false);

    await updateTemplateMeta(scratch.db, ada, ids[0], { archived: true });
    expect((await listTemplates(scratch.db, ada, {})).total).toBe(specs.length - 1);
    const all = await listTemplates(scratch.db, ada, { includeArchived: true });
    expect(all.items.find((t) => t.id === ids[0])?.archived).toBe(true);
  });

  it("numbers versions 1, 2, 3 and returns the latest instead of duplicating identical text", async () => {
    const { id } = await createTemplate(scratch.db, ada, { title: "Versions", source: small(5) });
    const second = await saveVersion(scratch.db, ada, id, { source: small(6), note: "more reps" });
    expect(second).toMatchObject({ created: true, version: { number: 2, note: "more reps", authorName: "Ada Quill" } });
    const again = await saveVersion(scratch.db, ada, id, { source: small(6).replace(/\n/g, "\r\n") });
    expect(again).toMatchObject({ created: false, version: { number: 2 } });
    const third = await saveVersion(scratch.db, ada, id, { source: small(8) });
    expect(third.version.number).toBe(3);
    expect((await getTemplate(scratch.db, ada, id))?.versions.map((v) => v.number)).toEqual([3, 2, 1]);
    expect((await getVersion(scratch.db, ada, id, "latest"))?.source).toBe(small(8));
    expect(await getVersion(scratch.db, ada, id, 4)).toBeNull();
  });

  it("gives concurrent saves on one template distinct numbers", async () => {
    const { id } = await createTemplate(scratch.db, ada, { title: "Race", source: small(5) });
    const results = await Promise.all([6, 7, 8, 9].map((reps) => saveVersion(scratch.db, ada, id, { source: small(reps) })));
    const numbers = results.map((r) => r.version.number).sort();
    expect(numbers).toEqual([2, 3, 4, 5]);
  });

  it("refuses UPDATE, DELETE and TRUNCATE of a saved version in the database itself", async () => {
    const { id } = await createTemplate(scratch.db, ada, { title: "Frozen", source: small(5) });
    await expect(sql`update template_versions set source = 'x' where template_id = ${id}`.execute(scratch.db)).rejects.toThrow(/immutable/);
    await expect(sql`update template_versions set note = 'changed' where template_id = ${id}`.execute(scratch.db)).rejects.toThrow(/immutable/);
    await expect(sql`delete from template_versions where template_id = ${id}`.execute(scratch.db)).rejects.toThrow(/immutable/);
    await expect(sql`truncate template_versions cascade`.execute(scratch.db)).rejects.toThrow(/immutable/);
    expect((await getVersion(scratch.db, ada, id, 1))?.source).toBe(small(5));
  });

  it("deletes a template with its versions when no athlete was given it", async () => {
    const { id } = await createTemplate(scratch.db, ada, { title: "Short-lived", source: small(5) });
    await saveVersion(scratch.db, ada, id, { source: small(6) });
    expect(await deleteTemplate(scratch.db, ada, id)).toEqual({ outcome: "deleted" });
    const { rows } = await sql<{ n: string }>`select count(*) as n from template_versions where template_id = ${id}`.execute(scratch.db);
    expect(Number(rows[0].n)).toBe(0);
    expect(await getTemplate(scratch.db, ada, id)).toBeNull();
  });

  it("archives instead of deleting once the template has assignments", async () => {
    const { id } = await createTemplate(scratch.db, ada, { title: "Given out", source: small(5) });
    const version = await scratch.db.selectFrom("template_versions").select("id").where("template_id", "=", id).executeTakeFirstOrThrow();
    const athlete = await createUser(scratch.db, { email: `given-${id}@x.test`, name: "Given", passwordHash: "x", role: "athlete" });
    if (!athlete) throw new Error("the athlete was not created");
    await scratch.db
      .insertInto("template_assignments")
      .values({ template_id: id, version_id: version.id, athlete_id: athlete.id, assigned_by: ada.id, start_date: "2027-01-04", weekdays: [], ended_at: null })
      .execute();
    expect(await deleteTemplate(scratch.db, ada, id)).toEqual({ outcome: "archived" });
    expect((await getTemplate(scratch.db, ada, id))?.archived).toBe(true);
  });

  it("updates title, description, tags and visibility, checking each", async () => {
    const { id } = await createTemplate(scratch.db, ada, { title: "Meta", source: small(5) });
    await updateTemplateMeta(scratch.db, ada, id, { title: "Meta two", description: "For the spring", tags: ["Spring"], visibility: "listed" });
    expect(await getTemplate(scratch.db, ada, id)).toMatchObject({ title: "Meta two", description: "For the spring", tags: ["spring"], visibility: "listed" });
    expect((await failure(updateTemplateMeta(scratch.db, ada, id, { visibility: "public" }))).fields.visibility).toMatch(/private, link or listed/);
    expect((await failure(updateTemplateMeta(scratch.db, ada, id, { title: " " }))).fields).toEqual({ title: "Give the template a title" });
  });

  it("forks a version into a new template of the coach's own with the same source", async () => {
    const { id } = await createTemplate(scratch.db, ada, { title: "Origin", tags: ["base"], source: small(5) });
    await saveVersion(scratch.db, ada, id, { source: small(6) });
    const fork = await forkTemplate(scratch.db, ada, id, 1);
    const copy = await getTemplate(scratch.db, ada, fork.id);
    expect(copy).toMatchObject({ title: "Origin (copy)", tags: ["base"], forkedFrom: { templateId: id, versionNumber: 1 } });
    expect((await getVersion(scratch.db, ada, fork.id, 1))?.source).toBe(small(5));
    const latest = await forkTemplate(scratch.db, ada, id);
    expect((await getVersion(scratch.db, ada, latest.id, 1))?.source).toBe(small(6));
    expect((await failure(forkTemplate(scratch.db, ada, id, 9))).code).toBe("not_found");
    expect(copyTitle("x".repeat(120))).toHaveLength(120);
  });

  it("treats another coach's template as not found for every read and write", async () => {
    const { id } = await createTemplate(scratch.db, ada, { title: "Ada's own", source: small(5) });
    expect(await getTemplate(scratch.db, ben, id)).toBeNull();
    expect(await getVersion(scratch.db, ben, id, 1)).toBeNull();
    expect((await listTemplates(scratch.db, ben, { q: "Ada" })).total).toBe(0);
    const attempts = [
      () => updateTemplateMeta(scratch.db, ben, id, { title: "Mine now" }),
      () => saveVersion(scratch.db, ben, id, { source: small(6) }),
      () => forkTemplate(scratch.db, ben, id),
      () => deleteTemplate(scratch.db, ben, id),
    ];
    for (const attempt of attempts) expect((await failure(attempt())).code).toBe("not_found");
    expect((await getTemplate(scratch.db, ada, id))?.title).toBe("Ada's own");
    expect((await getTemplate(scratch.db, ada, id))?.versions).toHaveLength(1);
  });

  it("gives an athlete no templates and treats ids that are not uuids as unknown", async () => {
    expect((await listTemplates(scratch.db, athlete, {})).total).toBe(0);
    expect((await failure(createTemplate(scratch.db, athlete, { title: "Nope", source: small(5) }))).code).toBe("not_found");
    expect(await getTemplate(scratch.db, ada, "not-a-uuid")).toBeNull();
    expect((await failure(saveVersion(scratch.db, ada, "'; drop table templates; --", { source: small(5) }))).code).toBe("not_found");
  });
});
