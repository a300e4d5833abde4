import { sql } from "kysely";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { migrateToLatest } from "../../db/migrate";
import { createShareLink, getSharedVersion, listShareLinks, revokeShareLink } from "../../db/shareLinks";
import { clearDraft, getDraft, NEW_DRAFT, saveDraft } from "../../db/templateDrafts";
import { TemplateError } from "../../db/templateRules";
import { type Actor, createTemplate, deleteTemplate, getTemplate, listTemplates, updateTemplateMeta } from "../../db/templates";
import { saveVersion } from "../../db/templateVersions";
import { createUser } from "../../db/users";
import { createScratchDb } from "../support/scratchDb";

const source = (reps: number) => `title: Drafted\nday A mon\n  deadlift 3x${reps} @80%\n`;

async function failure(p: Promise<unknown>): Promise<TemplateError> {
  try {
    await p;
  } catch (err) {
    if (err instanceof TemplateError) return err;
    throw err;
  }
  throw new Error("expected the call to fail");
}

describe("drafts and share links", () => {
  let scratch: Awaited<ReturnType<typeof createScratchDb>>;
  let ada: Actor;
  let ben: Actor;

  beforeAll(async () => {
    scratch = await createScratchDb();
    await migrateToLatest(scratch.db);
    const a = await createUser(scratch.db, { email: "ada@d.test", name: "Ada Quill", passwordHash: "secret-hash", role: "coach" });
    const b = await createUser(scratch.db, { email: "ben@d.test", name: "Ben Marsh", passwordHash: "h", role: "coach" });
    ada = { id: a!.id, role: "coach" };
    ben = { id: b!.id, role: "coach" };
  });
  afterAll(async () => {
    await scratch?.drop();
  });

  it("keeps a new draft whatever it contains, and clears it when the editor saves it as a template", async () => {
    const broken = "day A mon\n  squat 3xx5 @@\n";
    await saveDraft(scratch.db, ada, NEW_DRAFT, { source: broken });
    expect(await getDraft(scratch.db, ada, NEW_DRAFT)).toMatchObject({ source: broken, baseVersion: null });
    await saveDraft(scratch.db, ada, NEW_DRAFT, { source: source(5) });
    expect((await getDraft(scratch.db, ada, NEW_DRAFT))?.source).toBe(source(5));
    // Another coach's "new" draft is their own.
    expect(await getDraft(scratch.db, ben, NEW_DRAFT)).toBeNull();

    // An import (no clearNewDraft) leaves the draft alone; the editor's save clears it.
    await createTemplate(scratch.db, ada, { title: "Imported", source: source(3) });
    expect(await getDraft(scratch.db, ada, NEW_DRAFT)).not.toBeNull();
    await createTemplate(scratch.db, ada, { title: "From draft", source: source(5) }, { clearNewDraft: true });
    expect(await getDraft(scratch.db, ada, NEW_DRAFT)).toBeNull();
  });

  it("keeps one draft per template, shows it in the list, and clears it when a version is saved", async () => {
    const { id } = await createTemplate(scratch.db, ada, { title: "With draft", source: source(5) });
    await saveDraft(scratch.db, ada, id, { source: source(6), baseVersion: 1 });
    await saveDraft(scratch.db, ada, id, { source: source(7), baseVersion: 1 });
    expect(await getDraft(scratch.db, ada, id)).toMatchObject({ source: source(7), baseVersion: 1 });
    const listed = await listTemplates(scratch.db, ada, { q: "With draft" });
    expect(listed.items[0].hasDraft).toBe(true);

    await saveVersion(scratch.db, ada, id, { source: source(7) });
    expect(await getDraft(scratch.db, ada, id)).toBeNull();
    expect((await getTemplate(scratch.db, ada, id))?.hasDraft).toBe(false);

    await saveDraft(scratch.db, ada, id, { source: source(8) });
    expect(await clearDraft(scratch.db, ada, id)).toEqual({ cleared: true });
    expect(await clearDraft(scratch.db, ada, id)).toEqual({ cleared: false });
  });

  it("refuses drafts on another coach's template, and oversized drafts", async () => {
    const { id } = await createTemplate(scratch.db, ada, { title: "Private work", source: source(5) });
    expect((await failure(saveDraft(scratch.db, ben, id, { source: "mine" }))).code).toBe("not_found");
    expect((await failure(getDraft(scratch.db, ben, id))).code).toBe("not_found");
    expect((await failure(clearDraft(scratch.db, ben, id))).code).toBe("not_found");
    const big = await failure(saveDraft(scratch.db, ada, id, { source: "#".repeat(256 * 1024 + 1) }));
    expect(big.fields.source).toMatch(/256 KB/);
  });

  it("shares a version read-only by an unguessable link until it is revoked", async () => {
    const { id } = await createTemplate(scratch.db, ada, { title: "Shared", description: "For the club", source: source(5) });
    await saveVersion(scratch.db, ada, id, { source: source(6) });
    const link = await createShareLink(scratch.db, ada, id, 1);
    // 32 random bytes in base64url (RFC 4648 §5) are 43 characters: 256 bits ≥ 128.
    expect(link.token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(link.reused).toBe(false);
    expect((await getTemplate(scratch.db, ada, id))?.visibility).toBe("link");

    const shared = await getSharedVersion(scratch.db, link.token);
    expect(shared).toMatchObject({ title: "Shared", description: "For the club", versionNumber: 1, source: source(5), ownerName: "Ada Quill" });
    expect(shared?.model.blocks[0].days[0].exercises[0].variations).toEqual(["deadlift"]);
    // Nothing else about the owner: no ids, e-mail or hashes anywhere in the answer.
    const text = JSON.stringify(shared);
    for (const secret of [ada.id, id, "ada@d.test", "secret-hash"]) expect(text).not.toContain(secret);

    expect((await createShareLink(scratch.db, ada, id, 1)).token).toBe(link.token);
    const second = await createShareLink(scratch.db, ada, id, 2);
    expect(second.token).not.toBe(link.token);
    expect((await listShareLinks(scratch.db, ada, id))?.map((l) => l.versionNumber).sort()).toEqual([1, 2]);

    await updateTemplateMeta(scratch.db, ada, id, { visibility: "private" });
    expect(await getSharedVersion(scratch.db, link.token)).toBeNull();
    await updateTemplateMeta(scratch.db, ada, id, { visibility: "link" });
    expect(await getSharedVersion(scratch.db, link.token)).not.toBeNull();

    expect((await failure(revokeShareLink(scratch.db, ben, link.token))).code).toBe("not_found");
    expect(await getSharedVersion(scratch.db, link.token)).not.toBeNull();
    expect(await revokeShareLink(scratch.db, ada, link.token)).toEqual({ revoked: true });
    expect(await getSharedVersion(scratch.db, link.token)).toBeNull();
    expect(await revokeShareLink(scratch.db, ada, link.token)).toEqual({ revoked: true });
    expect((await listShareLinks(scratch.db, ada, id))?.map((l) => l.versionNumber)).toEqual([2]);
  });

  it("answers null for unknown or malformed tokens and refuses links to others' templates", async () => {
    expect(await getSharedVersion(scratch.db, "A".repeat(43))).toBeNull();
    expect(await getSharedVersion(scratch.db, "../../etc/passwd")).toBeNull();
    const { id } = await createTemplate(scratch.db, ada, { title: "Not Ben's", source: source(5) });
    expect((await failure(createShareLink(scratch.db, ben, id, 1))).code).toBe("not_found");
    expect((await failure(createShareLink(scratch.db, ada, id, 7))).fields.versionNumber).toBe("No such version");
    expect(await listShareLinks(scratch.db, ben, id)).toBeNull();
  });

  it("takes links and drafts along when a template is deleted", async () => {
    const { id } = await createTemplate(scratch.db, ada, { title: "Gone", source: source(5) });
    const link = await createShareLink(scratch.db, ada, id, 1);
    await saveDraft(scratch.db, ada, id, { source: "half-typed" });
    await deleteTemplate(scratch.db, ada, id);
    expect(await getSharedVersion(scratch.db, link.token)).toBeNull();
    const { rows } = await sql<{ n: string }>`
      select (select count(*) from share_links where template_id = ${id}) + (select count(*) from template_drafts where template_id = ${id}) as n`.execute(scratch.db);
    expect(Number(rows[0].n)).toBe(0);
  });
});
