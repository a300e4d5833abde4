import { mkdtempSync, readdirSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { crc32, deflateSync } from "node:zlib";
import type { Kysely } from "kysely";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import type { Database } from "../../db/database";
import { ExerciseError, sniffMedia } from "../../db/exerciseRules";
import {
  createExercise,
  deleteExercise,
  exerciseNamesFor,
  getExercise,
  listLibrary,
  mediaForViewer,
  removeExerciseMedia,
  setExerciseMedia,
  updateExercise,
  type Actor,
} from "../../db/exercises";
import { migrateToLatest } from "../../db/migrate";
import { createUser } from "../../db/users";
import { CATALOGUE } from "../../lib/exercises/catalogue";
import { localDiskStorage } from "../../server/storage";
import { createScratchDb } from "../support/scratchDb";

// The handlers ask for the session and the pool themselves; both are swapped here.
const h = vi.hoisted(() => ({
  db: null as unknown as Kysely<Database>,
  viewer: null as null | { id: string; name: string; email: string; role: "admin" | "coach" | "athlete" },
}));
vi.mock("@/server/auth", () => ({ getViewer: async () => h.viewer }));
vi.mock("@/db/client", async (importOriginal) => ({ ...(await importOriginal<object>()), getDb: () => h.db }));

const uploads = mkdtempSync(path.join(tmpdir(), "iq-uploads-"));
process.env.IQ_UPLOADS_DIR = uploads;

const listRoute = await import("../../app/api/exercises/route");
const oneRoute = await import("../../app/api/exercises/[id]/route");
const mediaRoute = await import("../../app/api/exercises/[id]/media/route");
const namesRoute = await import("../../app/api/exercises/names/route");
const serveRoute = await import("../../app/api/media/[key]/route");

/** A chunk as the PNG specification lays it out: length, type, data, CRC-32 of type and data (W3C PNG 2nd ed. §5.3). */
function chunk(type: string, data: Uint8Array): Buffer {
  const head = Buffer.alloc(4);
  head.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, "ascii"), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([head, body, crc]);
}

/** A real 1×1 grey PNG: signature, IHDR, one zlib-compressed scanline, IEND (W3C PNG 2nd ed. §5.2, §11.2). */
function tinyPng(): Uint8Array {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(1, 0); // width
  ihdr.writeUInt32BE(1, 4); // height
  ihdr[8] = 8; // bit depth
  ihdr[9] = 0; // colour type: greyscale
  const scanline = Buffer.from([0, 0x80]); // filter type 0, one pixel
  return new Uint8Array(
    Buffer.concat([
      Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
      chunk("IHDR", ihdr),
      chunk("IDAT", deflateSync(scanline)),
      chunk("IEND", new Uint8Array(0)),
    ]),
  );
}

async function failure(p: Promise<unknown>): Promise<ExerciseError> {
  try {
    await p;
  } catch (err) {
    if (err instanceof ExerciseError) return err;
    throw err;
  }
  throw new Error("expected the call to fail");
}

const URL_BASE = "http://ironquill.test";
function json(method: string, url: string, body?: unknown): Request {
  return new Request(URL_BASE + url, {
    method,
    headers: { "content-type": "application/json" },
    body: body === undefined ? undefined : typeof body === "string" ? body : JSON.stringify(body),
  });
}
function upload(bytes: Uint8Array, name: string, type: string): Request {
  const form = new FormData();
  form.append("file", new File([bytes as Uint8Array<ArrayBuffer>], name, { type }));
  return new Request(URL_BASE + "/api/exercises/x/media", { method: "POST", body: form });
}
const params = <T extends object>(p: T) => ({ params: Promise.resolve(p) });

describe("the coach's exercise library", () => {
  let scratch: Awaited<ReturnType<typeof createScratchDb>>;
  let ada: Actor;
  let ben: Actor;
  let adasAthlete: Actor;
  let bensAthlete: Actor;
  const store = localDiskStorage(path.join(uploads, "direct"));

  beforeAll(async () => {
    scratch = await createScratchDb();
    await migrateToLatest(scratch.db);
    h.db = scratch.db;
    const make = async (email: string, role: Actor["role"], coachId: string | null = null) => {
      const u = await createUser(scratch.db, { email, name: email.split("@")[0], passwordHash: "h", role, coachId });
      return { id: u!.id, role };
    };
    ada = await make("ada@x.test", "coach");
    ben = await make("ben@x.test", "coach");
    adasAthlete = await make("cal@x.test", "athlete", ada.id);
    bensAthlete = await make("dee@x.test", "athlete", ben.id);
  });
  afterAll(async () => {
    await scratch?.drop();
    rmSync(uploads, { recursive: true, force: true });
  });

  it("creates an exercise, tidying its fields, and lists it beside the built-in catalogue", async () => {
    const made = await createExercise(scratch.db, ada, {
      name: "  Pin   squat ",
      aliases: ["Pin Squat", "pin-squat", "rack squat"],
      equipment: "barbell",
      primaryMuscles: ["Quads", "quads", "Glutes"],
      movementPattern: "Squat",
      cues: "Pause on the pins\r\nDrive up",
      substitutionGroup: "",
    });
    expect(made).toMatchObject({
      builtIn: false,
      name: "Pin squat",
      aliases: ["rack squat"],
      primaryMuscles: ["quads", "glutes"],
      movementPattern: "squat",
      cues: "Pause on the pins\nDrive up",
      substitutionGroup: null,
      media: null,
    });
    const all = await listLibrary(scratch.db, ada, { pageSize: 100 });
    expect(all.total).toBe(CATALOGUE.length + 1);
    expect(all.items.filter((e) => e.builtIn)).toHaveLength(Math.min(99, CATALOGUE.length));
    expect(all.items.find((e) => e.name === "back squat")).toMatchObject({ builtIn: true, equipment: "barbell" });
    // Ben's library holds only the catalogue.
    expect((await listLibrary(scratch.db, ben, { pageSize: 1 })).total).toBe(CATALOGUE.length);
    expect((await listLibrary(scratch.db, adasAthlete, {})).total).toBe(0);
  });

  it("searches name, alias and muscle ignoring case and hyphens, and sorts by name, equipment and pattern", async () => {
    await createExercise(scratch.db, ada, { name: "Zercher carry", equipment: "other", primaryMuscles: ["upper back"], movementPattern: "carry" });
    await createExercise(scratch.db, ada, { name: "Anderson press", equipment: "barbell", movementPattern: "horizontal push", aliases: ["dead bench"] });

    expect((await listLibrary(scratch.db, ada, { q: "RACK" })).items.map((e) => e.name)).toEqual(["Pin squat"]);
    expect((await listLibrary(scratch.db, ada, { q: "upper back" })).items.map((e) => e.name)).toEqual(["Zercher carry"]);
    expect((await listLibrary(scratch.db, ada, { q: "dead-bench" })).items.map((e) => e.name)).toEqual(["Anderson press"]);
    // Built-in aliases are searched too.
    expect((await listLibrary(scratch.db, ada, { q: "rdl" })).items.map((e) => e.name)).toContain("romanian deadlift");

    const byName = (await listLibrary(scratch.db, ada, { pageSize: 100 })).items.map((e) => e.name.toLowerCase());
    expect(byName).toEqual([...byName].sort((a, b) => a.localeCompare(b, "en")));
    const desc = (await listLibrary(scratch.db, ada, { sort: "name", dir: "desc", pageSize: 3 })).items.map((e) => e.name);
    expect(desc[0].toLowerCase()).toBe(byName[byName.length - 1]);

    const byEquipment = (await listLibrary(scratch.db, ada, { sort: "equipment", pageSize: 100 })).items.map((e) => e.equipment);
    expect(byEquipment).toEqual([...byEquipment].sort());
    // Rows with a pattern come first, in order; the rest (the catalogue) follow.
    const byPattern = (await listLibrary(scratch.db, ada, { sort: "pattern", pageSize: 100 })).items;
    expect(byPattern.slice(0, 3).map((e) => e.movementPattern)).toEqual(["carry", "horizontal push", "squat"]);
    expect(byPattern[3].movementPattern).toBeNull();

    const p2 = await listLibrary(scratch.db, ada, { page: 2, pageSize: 10 });
    expect(p2.items.map((e) => e.name.toLowerCase())).toEqual(byName.slice(10, 20));
  });

  it("refuses names and aliases that clash with the coach's other exercises or the catalogue, whatever the case", async () => {
    const sameName = await failure(createExercise(scratch.db, ada, { name: "PIN SQUAT", equipment: "barbell" }));
    expect(sameName.code).toBe("conflict");
    expect(sameName.fields.name).toBe("You already have an exercise called “Pin squat”");
    const nameIsAlias = await failure(createExercise(scratch.db, ada, { name: "Rack Squat", equipment: "barbell" }));
    expect(nameIsAlias.fields.name).toBe("“Rack Squat” is already an alias of your exercise “Pin squat”");
    const aliasIsName = await failure(createExercise(scratch.db, ada, { name: "Box squat", aliases: ["low box", "zercher CARRY"], equipment: "barbell" }));
    expect(aliasIsName.fields).toEqual({ "aliases.1": "You already have an exercise called “Zercher carry”" });
    const builtIn = await failure(createExercise(scratch.db, ada, { name: "Box squat", aliases: ["OHP"], equipment: "barbell" }));
    expect(builtIn.fields["aliases.0"]).toBe("“OHP” already means the built-in exercise “overhead press”");
    // An alias spelling the exercise's own name is dropped rather than refused.
    const box = await createExercise(scratch.db, ada, { name: "Box squat", aliases: ["box-squat", "Low box"], equipment: "barbell" });
    expect(box.aliases).toEqual(["Low box"]);
    await deleteExercise(scratch.db, store, ada, box.id);

    // Another coach may use the same names.
    expect((await createExercise(scratch.db, ben, { name: "pin squat", aliases: ["rack squat"], equipment: "barbell" })).name).toBe("pin squat");
    // Renaming to another exercise's alias is refused; keeping one's own name is not a clash.
    const pin = (await listLibrary(scratch.db, ada, { q: "pin squat" })).items[0];
    const renamed = await failure(updateExercise(scratch.db, ada, pin.id, { aliases: ["Dead bench"] }));
    expect(renamed.fields["aliases.0"]).toBe("“Dead bench” is already an alias of your exercise “Anderson press”");
    expect((await updateExercise(scratch.db, ada, pin.id, { name: "pin squat", cues: "Brace" })).name).toBe("pin squat");
  });

  it("names the field at fault for bad input", async () => {
    expect((await failure(createExercise(scratch.db, ada, { name: " ", equipment: "barbell" }))).fields).toEqual({ name: "Give the exercise a name" });
    expect((await failure(createExercise(scratch.db, ada, { name: "X", equipment: "kettlebell" }))).fields.equipment).toMatch(/barbell, dumbbell/);
    const tooMany = await failure(createExercise(scratch.db, ada, { name: "X", equipment: "other", aliases: Array.from({ length: 13 }, (_, i) => `x${i}`) }));
    expect(tooMany.fields.aliases).toMatch(/at most 12/);
    expect((await failure(createExercise(scratch.db, ada, { name: "X", equipment: "other", cues: "c".repeat(2001) }))).fields.cues).toMatch(/2000/);
  });

  it("answers another coach exactly as if the exercise did not exist", async () => {
    const mine = await createExercise(scratch.db, ada, { name: "Spoto press", equipment: "barbell" });
    expect(await getExercise(scratch.db, ben, mine.id)).toBeNull();
    expect((await failure(updateExercise(scratch.db, ben, mine.id, { cues: "x" }))).code).toBe("not_found");
    expect((await failure(deleteExercise(scratch.db, store, ben, mine.id))).code).toBe("not_found");
    expect((await failure(setExerciseMedia(scratch.db, store, ben, mine.id, { bytes: tinyPng(), declaredType: "image/png" }))).code).toBe("not_found");
    expect((await failure(removeExerciseMedia(scratch.db, store, ben, mine.id))).code).toBe("not_found");
    expect((await failure(updateExercise(scratch.db, ada, "builtin:back-squat", { cues: "x" }))).code).toBe("not_found");
    expect(await getExercise(scratch.db, ada, mine.id)).toMatchObject({ name: "Spoto press" });
  });

  it("accepts a real PNG, replaces it, removes it, and refuses lying or oversized files", async () => {
    const ex = await createExercise(scratch.db, ada, { name: "Belt squat", equipment: "machine" });
    const png = tinyPng();
    expect(sniffMedia(png)).toBe("image/png");
    const withPng = await setExerciseMedia(scratch.db, store, ada, ex.id, { bytes: png, declaredType: "image/png" });
    expect(withPng.media?.type).toBe("image/png");
    const firstKey = withPng.media!.url.split("/").pop()!;
    expect(await store.get(firstKey)).toEqual({ bytes: png, contentType: "image/png" });

    // The coach and the coach's athlete may see it; nobody else.
    expect(await mediaForViewer(scratch.db, ada, firstKey)).toEqual({ type: "image/png" });
    expect(await mediaForViewer(scratch.db, adasAthlete, firstKey)).toEqual({ type: "image/png" });
    expect(await mediaForViewer(scratch.db, ben, firstKey)).toBeNull();
    expect(await mediaForViewer(scratch.db, bensAthlete, firstKey)).toBeNull();

    // JPEG files open with the SOI marker FF D8 followed by another marker (ITU-T T.81 Annex B).
    const jpeg = new Uint8Array([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10, 0x4a, 0x46, 0x49, 0x46, 0x00]);
    const replaced = await setExerciseMedia(scratch.db, store, ada, ex.id, { bytes: jpeg, declaredType: "" });
    expect(replaced.media?.type).toBe("image/jpeg");
    expect(await store.get(firstKey)).toBeNull();

    const text = new TextEncoder().encode("GIF89a is not on the list, and neither is this text");
    const lying = await failure(setExerciseMedia(scratch.db, store, ada, ex.id, { bytes: text, declaredType: "image/png" }));
    expect(lying.code).toBe("invalid_input");
    expect(lying.message).toMatch(/JPEG, PNG or WebP image \(up to 5 MB\) or an MP4 or WebM video \(up to 25 MB\)/);
    expect(lying.fields.file).toBe("Not an allowed type");
    const pdf = await failure(setExerciseMedia(scratch.db, store, ada, ex.id, { bytes: png, declaredType: "application/pdf" }));
    expect(pdf.message).toMatch(/application\/pdf are not accepted/);

    const big = new Uint8Array(5 * 1024 * 1024 + 1);
    big.set(png);
    const over = await failure(setExerciseMedia(scratch.db, store, ada, ex.id, { bytes: big, declaredType: "image/png" }));
    expect(over.fields.file).toBe("Over the 5 MB limit");
    // Refused uploads leave the stored JPEG as it was.
    expect((await getExercise(scratch.db, ada, ex.id))?.media).toEqual(replaced.media);

    const cleared = await removeExerciseMedia(scratch.db, store, ada, ex.id);
    expect(cleared.media).toBeNull();
    expect(readdirSync(path.join(uploads, "direct"))).toEqual([]);
  });

  it("deletes an exercise with its media file", async () => {
    const ex = await createExercise(scratch.db, ada, { name: "Sissy squat", equipment: "bodyweight" });
    await setExerciseMedia(scratch.db, store, ada, ex.id, { bytes: tinyPng(), declaredType: "image/png" });
    expect(await deleteExercise(scratch.db, store, ada, ex.id)).toEqual({ deleted: true });
    expect(await getExercise(scratch.db, ada, ex.id)).toBeNull();
    expect(readdirSync(path.join(uploads, "direct"))).toEqual([]);
  });

  it("gives the editor every name and alias: a coach their own, an athlete their coach's", async () => {
    const builtInCount = CATALOGUE.reduce((n, e) => n + 1 + e.aliases.length, 0);
    const adas = await exerciseNamesFor(scratch.db, ada);
    const own = adas.filter((n) => !n.builtIn);
    expect(own).toContainEqual({ name: "rack squat", exercise: "pin squat", builtIn: false, equipment: "barbell" });
    expect(adas.filter((n) => n.builtIn)).toHaveLength(builtInCount);
    expect(await exerciseNamesFor(scratch.db, adasAthlete)).toEqual(adas);
    const bens = await exerciseNamesFor(scratch.db, bensAthlete);
    expect(bens.filter((n) => !n.builtIn).map((n) => n.name)).toEqual(["pin squat", "rack squat"]);
    expect(await exerciseNamesFor(scratch.db, { id: ada.id, role: "admin" })).toHaveLength(builtInCount);
  });

  it("stores, reads back and removes files on the local disk, refusing keys that climb folders", async () => {
    const disk = localDiskStorage(path.join(uploads, "disk"));
    const bytes = new Uint8Array([1, 2, 3, 250]);
    await disk.put("a-file.bin", bytes, "application/x-test");
    expect(await disk.get("a-file.bin")).toEqual({ bytes, contentType: "application/x-test" });
    expect(await disk.get("missing.bin")).toBeNull();
    expect(await disk.get("../disk/a-file.bin")).toBeNull();
    await expect(disk.put("../escape", bytes, "x/y")).rejects.toThrow(/unsafe key/);
    await disk.remove("a-file.bin");
    expect(await disk.get("a-file.bin")).toBeNull();
    await disk.remove("a-file.bin");
  });

  describe("route handlers", () => {
    const coachViewer = () => ({ id: ada.id, name: "Ada", email: "ada@x.test", role: "coach" as const });

    it("answers 401 without a session and 403 for an athlete", async () => {
      h.viewer = null;
      const anon = await listRoute.GET(json("GET", "/api/exercises"));
      expect(anon.status).toBe(401);
      expect((await anon.json()).error.code).toBe("unauthenticated");
      h.viewer = { id: adasAthlete.id, name: "Cal", email: "cal@x.test", role: "athlete" };
      const athlete = await listRoute.POST(json("POST", "/api/exercises", { name: "T", equipment: "other" }));
      expect(athlete.status).toBe(403);
      expect((await athlete.json()).error.code).toBe("forbidden");
      // The names list is for athletes too (their coach's library).
      expect((await namesRoute.GET(json("GET", "/api/exercises/names"))).status).toBe(200);
    });

    it("answers bad JSON and bad fields with 422 naming the field", async () => {
      h.viewer = coachViewer();
      const bad = await listRoute.POST(json("POST", "/api/exercises", '{"name": "x",'));
      expect(bad.status).toBe(422);
      expect((await bad.json()).error).toMatchObject({ code: "invalid_input", message: "The request body is not valid JSON." });
      const noEquipment = await listRoute.POST(json("POST", "/api/exercises", { name: "Hatfield squat" }));
      expect(noEquipment.status).toBe(422);
      expect((await noEquipment.json()).error.fields.equipment).toMatch(/barbell/);
      const sort = await listRoute.GET(json("GET", "/api/exercises?sort=colour"));
      expect(sort.status).toBe(422);
      expect((await sort.json()).error.fields.sort).toMatch(/name, equipment or pattern/);
      const clash = await listRoute.POST(json("POST", "/api/exercises", { name: "Pin Squat", equipment: "barbell" }));
      expect(clash.status).toBe(409);
      expect((await clash.json()).error.fields.name).toMatch(/already have/);
    });

    it("creates, reads, edits, uploads, serves and deletes through the handlers", async () => {
      h.viewer = coachViewer();
      const created = await listRoute.POST(json("POST", "/api/exercises", { name: "Hatfield squat", equipment: "barbell", aliases: ["safety bar squat"] }));
      expect(created.status).toBe(201);
      const { exercise } = await created.json();
      const ctx = params({ id: exercise.id });
      expect((await (await oneRoute.GET(json("GET", ""), ctx)).json()).exercise.name).toBe("Hatfield squat");
      expect((await (await oneRoute.PATCH(json("PATCH", "", { movementPattern: "squat" }), ctx)).json()).exercise.movementPattern).toBe("squat");
      expect((await oneRoute.PATCH(json("PATCH", "", {}), ctx)).status).toBe(422);
      const listed = await (await listRoute.GET(json("GET", "/api/exercises?q=safety"))).json();
      expect(listed.items.map((e: { name: string }) => e.name)).toEqual(["Hatfield squat"]);

      const up = await mediaRoute.POST(upload(tinyPng(), "bar.png", "image/png"), ctx);
      expect(up.status).toBe(201);
      const url: string = (await up.json()).exercise.media.url;
      const key = url.split("/").pop()!;
      const served = await serveRoute.GET(json("GET", url), params({ key }));
      expect(served.status).toBe(200);
      expect(served.headers.get("content-type")).toBe("image/png");
      expect(served.headers.get("cache-control")).toMatch(/max-age=31536000/);
      expect(new Uint8Array(await served.arrayBuffer())).toEqual(tinyPng());

      h.viewer = { id: adasAthlete.id, name: "Cal", email: "cal@x.test", role: "athlete" };
      expect((await serveRoute.GET(json("GET", url), params({ key }))).status).toBe(200);
      h.viewer = { id: ben.id, name: "Ben", email: "ben@x.test", role: "coach" };
      expect((await serveRoute.GET(json("GET", url), params({ key }))).status).toBe(404);
      for (const res of [
        await oneRoute.GET(json("GET", ""), ctx),
        await oneRoute.PATCH(json("PATCH", "", { cues: "mine now" }), ctx),
        await mediaRoute.POST(upload(tinyPng(), "bar.png", "image/png"), ctx),
        await mediaRoute.DELETE(json("DELETE", ""), ctx),
        await oneRoute.DELETE(json("DELETE", ""), ctx),
      ]) {
        expect(res.status).toBe(404);
        expect((await res.json()).error.code).toBe("not_found");
      }
      h.viewer = null;
      expect((await serveRoute.GET(json("GET", url), params({ key }))).status).toBe(401);

      h.viewer = coachViewer();
      const lying = await mediaRoute.POST(upload(new TextEncoder().encode("<svg></svg>"), "fake.png", "image/png"), ctx);
      expect(lying.status).toBe(422);
      expect((await lying.json()).error.fields.file).toBe("Not an allowed type");
      const noFile = await mediaRoute.POST(json("POST", "", { file: "x" }), ctx);
      expect(noFile.status).toBe(422);
      const removed = await mediaRoute.DELETE(json("DELETE", ""), ctx);
      expect((await removed.json()).exercise.media).toBeNull();
      expect((await serveRoute.GET(json("GET", url), params({ key }))).status).toBe(404);
      expect((await oneRoute.DELETE(json("DELETE", ""), ctx)).status).toBe(200);
      expect((await oneRoute.GET(json("GET", ""), ctx)).status).toBe(404);
    });
  });
});
