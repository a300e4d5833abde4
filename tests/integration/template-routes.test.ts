import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import type { Kysely } from "kysely";
import type { Database } from "../../db/database";
import { migrateToLatest } from "../../db/migrate";
import { createUser } from "../../db/users";
import { createScratchDb } from "../support/scratchDb";

// The handlers ask for the session and the pool themselves; both are swapped here.
const h = vi.hoisted(() => ({
  db: null as unknown as Kysely<Database>,
  viewer: null as null | { id: string; name: string; email: string; role: "admin" | "coach" | "athlete" },
}));
vi.mock("@/server/auth", () => ({ getViewer: async () => h.viewer }));
vi.mock("@/db/client", async (importOriginal) => ({ ...(await importOriginal<object>()), getDb: () => h.db }));

const templates = await import("../../app/api/templates/route");
const one = await import("../../app/api/templates/[id]/route");
const versions = await import("../../app/api/templates/[id]/versions/route");
const version = await import("../../app/api/templates/[id]/versions/[number]/route");
const fork = await import("../../app/api/templates/[id]/fork/route");
const share = await import("../../app/api/templates/[id]/share/route");
const shared = await import("../../app/api/share/[token]/route");
const newDraft = await import("../../app/api/templates/drafts/new/route");
const draft = await import("../../app/api/templates/[id]/draft/route");
const importer = await import("../../app/api/templates/import/route");
const samples = await import("../../app/api/templates/samples/route");
const fromSample = await import("../../app/api/templates/from-sample/route");

const URL_BASE = "http://ironquill.test";
const SOURCE = "title: Route test\nday A mon\n  back squat 3x5 @75%\n";

function json(method: string, url: string, body?: unknown): Request {
  return new Request(URL_BASE + url, {
    method,
    headers: { "content-type": "application/json" },
    body: body === undefined ? undefined : typeof body === "string" ? body : JSON.stringify(body),
  });
}
const params = <T extends object>(p: T) => ({ params: Promise.resolve(p) });

function upload(name: string, content: BlobPart, extra: Record<string, string> = {}): Request {
  const form = new FormData();
  form.append("file", new File([content], name));
  for (const [k, v] of Object.entries(extra)) form.append(k, v);
  return new Request(URL_BASE + "/api/templates/import", { method: "POST", body: form });
}

describe("template route handlers", () => {
  let scratch: Awaited<ReturnType<typeof createScratchDb>>;
  let coach: NonNullable<typeof h.viewer>;
  let other: NonNullable<typeof h.viewer>;

  beforeAll(async () => {
    scratch = await createScratchDb();
    await migrateToLatest(scratch.db);
    h.db = scratch.db;
    const a = await createUser(scratch.db, { email: "rowan@r.test", name: "Rowan", passwordHash: "h", role: "coach" });
    const b = await createUser(scratch.db, { email: "sky@r.test", name: "Sky", passwordHash: "h", role: "coach" });
    coach = { id: a!.id, name: "Rowan", email: "rowan@r.test", role: "coach" };
    other = { id: b!.id, name: "Sky", email: "sky@r.test", role: "coach" };
  });
  afterAll(async () => {
    await scratch?.drop();
  });

  it("answers 401 without a session and 403 for an athlete", async () => {
    h.viewer = null;
    const anon = await templates.GET(json("GET", "/api/templates"));
    expect(anon.status).toBe(401);
    expect((await anon.json()).error.code).toBe("unauthenticated");
    h.viewer = { id: coach.id, name: "A", email: "a@r.test", role: "athlete" };
    const athlete = await templates.POST(json("POST", "/api/templates", { title: "T", source: SOURCE }));
    expect(athlete.status).toBe(403);
    expect((await athlete.json()).error.code).toBe("forbidden");
  });

  it("answers malformed JSON and bad fields with 422 and a message naming the problem", async () => {
    h.viewer = coach;
    const bad = await templates.POST(json("POST", "/api/templates", '{"title": "x",'));
    expect(bad.status).toBe(422);
    expect((await bad.json()).error).toMatchObject({ code: "invalid_input", message: "The request body is not valid JSON." });
    const noTitle = await templates.POST(json("POST", "/api/templates", { source: SOURCE }));
    expect(noTitle.status).toBe(422);
    expect((await noTitle.json()).error.fields.title).toBe("Give the template a title");
    const paging = await templates.GET(json("GET", "/api/templates?pageSize=500"));
    expect(paging.status).toBe(422);
    expect((await paging.json()).error.fields.pageSize).toMatch(/between 1 and 100/);
  });

  it("returns the parser's problems, positioned, when a version does not parse", async () => {
    h.viewer = coach;
    const source = "day A mon\n  back squat 3x5 @75%\n  bench press 3x5 @rpe\n";
    const res = await templates.POST(json("POST", "/api/templates", { title: "Broken", source }));
    expect(res.status).toBe(422);
    const { error } = await res.json();
    expect(error.fields.source).toMatch(/^1 problem, first at 3:\d+: /);
    expect(error.diagnostics).toEqual([expect.objectContaining({ line: 3, severity: "error" })]);
    // The column points into the third line's text, at or after where "@rpe" starts.
    expect(error.diagnostics[0].column).toBeGreaterThanOrEqual(source.split("\n")[2].indexOf("@rpe") + 1);
  });

  it("creates, reads, versions, downloads, forks and lists through the handlers", async () => {
    h.viewer = coach;
    const created = await templates.POST(json("POST", "/api/templates", { title: "Route test", tags: ["Legs"], source: SOURCE }));
    expect(created.status).toBe(201);
    const { template } = await created.json();
    expect(template).toMatchObject({ title: "Route test", tags: ["legs"], latestVersion: { number: 1 } });
    const ctx = params({ id: template.id });

    expect((await one.GET(json("GET", `/api/templates/${template.id}`), ctx)).status).toBe(200);
    const saved = await versions.POST(json("POST", "", { source: SOURCE.replace("3x5", "5x5"), note: "more sets" }), ctx);
    expect(saved.status).toBe(201);
    const same = await versions.POST(json("POST", "", { source: SOURCE.replace("3x5", "5x5") }), ctx);
    expect(same.status).toBe(200);
    expect(await same.json()).toMatchObject({ created: false, version: { number: 2 } });

    const file = await version.GET(json("GET", "?format=iq"), params({ id: template.id, number: "1" }));
    expect(file.headers.get("content-type")).toMatch(/^text\/plain/);
    expect(file.headers.get("content-disposition")).toBe('attachment; filename="route-test-v1.iq"');
    expect(await file.text()).toBe(SOURCE);
    const latest = await version.GET(json("GET", ""), params({ id: template.id, number: "latest" }));
    expect((await latest.json()).version.number).toBe(2);

    const patched = await one.PATCH(json("PATCH", "", { title: "Renamed" }), ctx);
    expect((await patched.json()).template.title).toBe("Renamed");
    expect((await one.PATCH(json("PATCH", "", {}), ctx)).status).toBe(422);

    const copy = await fork.POST(new Request(URL_BASE, { method: "POST" }), ctx);
    expect(copy.status).toBe(201);
    expect((await copy.json()).template.title).toBe("Renamed (copy)");
    const list = await (await templates.GET(json("GET", "/api/templates?tag=legs"))).json();
    expect(list.total).toBe(2);
  });

  it("answers 404 for another coach's template and for ids that are not ids", async () => {
    h.viewer = coach;
    const { template } = await (await templates.POST(json("POST", "/api/templates", { title: "Mine", source: SOURCE }))).json();
    h.viewer = other;
    const ctx = params({ id: template.id });
    for (const res of [
      await one.GET(json("GET", ""), ctx),
      await one.PATCH(json("PATCH", "", { title: "Taken" }), ctx),
      await one.DELETE(json("DELETE", ""), ctx),
      await fork.POST(json("POST", "", {}), ctx),
      await share.POST(json("POST", "", { versionNumber: 1 }), ctx),
      await versions.POST(json("POST", "", { source: SOURCE }), ctx),
      await one.GET(json("GET", ""), params({ id: "nope" })),
    ]) {
      expect(res.status).toBe(404);
      expect((await res.json()).error.code).toBe("not_found");
    }
  });

  it("keeps a new draft and shares a version publicly until revoked", async () => {
    h.viewer = coach;
    expect((await newDraft.PUT(json("PUT", "", { source: "day A\n  squat 3xx" }))).status).toBe(200);
    expect((await (await newDraft.GET(json("GET", ""))).json()).draft.source).toBe("day A\n  squat 3xx");
    const created = await templates.POST(json("POST", "/api/templates", { title: "Shared", source: SOURCE, fromDraft: true }));
    const { template } = await created.json();
    expect((await (await newDraft.GET(json("GET", ""))).json()).draft).toBeNull();

    const ctx = params({ id: template.id });
    expect((await draft.PUT(json("PUT", "", { source: "half typed @", baseVersion: 1 }), ctx)).status).toBe(200);
    expect((await (await draft.GET(json("GET", ""), ctx)).json()).draft).toMatchObject({ source: "half typed @", baseVersion: 1 });
    expect((await draft.PUT(json("PUT", "", { source: 42 }), ctx)).status).toBe(422);
    h.viewer = other;
    expect((await draft.GET(json("GET", ""), ctx)).status).toBe(404);
    h.viewer = coach;
    expect(await (await draft.DELETE(json("DELETE", ""), ctx)).json()).toEqual({ cleared: true });

    const made = await share.POST(json("POST", "", { versionNumber: 1 }), params({ id: template.id }));
    expect(made.status).toBe(201);
    const { link } = await made.json();
    expect(link.url).toBe(`/share/${link.token}`);

    h.viewer = null;
    const publicRead = await shared.GET(json("GET", ""), params({ token: link.token }));
    expect(publicRead.status).toBe(200);
    expect((await publicRead.json()).shared).toMatchObject({ title: "Shared", versionNumber: 1, source: SOURCE, ownerName: "Rowan" });
    expect((await shared.DELETE(json("DELETE", ""), params({ token: link.token }))).status).toBe(401);

    h.viewer = coach;
    expect((await shared.DELETE(json("DELETE", ""), params({ token: link.token }))).status).toBe(200);
    h.viewer = null;
    expect((await shared.GET(json("GET", ""), params({ token: link.token }))).status).toBe(404);
  });

  it("imports a .iq upload and explains wrong type, size and encoding", async () => {
    h.viewer = coach;
    const ok = await importer.POST(upload("winter-block.iq", SOURCE));
    expect(ok.status).toBe(201);
    expect((await ok.json()).template.title).toBe("Route test");
    const untitled = await importer.POST(upload("winter_block.iq", "day A mon\n  squat 3x5 @75%\n"));
    expect((await untitled.json()).template.title).toBe("winter block");

    const pdf = await importer.POST(upload("plan.pdf", SOURCE));
    expect(pdf.status).toBe(422);
    expect((await pdf.json()).error.fields.file).toMatch(/\.iq file/);
    const big = await importer.POST(upload("big.iq", "#".repeat(256 * 1024 + 1)));
    expect(big.status).toBe(422);
    expect((await big.json()).error.fields.file).toMatch(/256 KB/);
    // 0xC3 0x28 is an invalid two-byte UTF-8 sequence (RFC 3629 §3).
    const latin = await importer.POST(upload("old.iq", new Uint8Array([0x64, 0x61, 0x79, 0x20, 0xc3, 0x28])));
    expect(latin.status).toBe(422);
    expect((await latin.json()).error.message).toMatch(/not UTF-8/);
    const noFile = await importer.POST(json("POST", "/api/templates/import", { file: "x" }));
    expect(noFile.status).toBe(422);
  });

  it("lists the sample files and starts a template from one", async () => {
    h.viewer = coach;
    const onDisk = readdirSync(path.join(process.cwd(), "templates")).filter((f) => f.endsWith(".iq"));
    const { samples: listed } = await (await samples.GET()).json();
    expect(listed.map((s: { name: string }) => `${s.name}.iq`).sort()).toEqual(onDisk.sort());
    const name = onDisk[0].replace(/\.iq$/, "");
    const made = await fromSample.POST(json("POST", "", { sample: name }));
    expect(made.status).toBe(201);
    const { template } = await made.json();
    const v1 = await (await version.GET(json("GET", ""), params({ id: template.id, number: "1" }))).json();
    expect(v1.version.source).toBe(readFileSync(path.join(process.cwd(), "templates", `${name}.iq`), "utf8"));
    expect((await fromSample.POST(json("POST", "", { sample: "../package" }))).status).toBe(422);
    expect((await fromSample.POST(json("POST", "", { sample: "no-such-sample" }))).status).toBe(404);
  });
});
