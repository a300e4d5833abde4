import type { Kysely } from "kysely";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import type { Database } from "../../db/database";
import { createTemplate } from "../../db/templates";
import { viewerForSession } from "../../db/users";
import { addPerson, migratedScratchDb, type Person } from "../support/people";
import { idParams, request } from "../support/requests";

const h = vi.hoisted(() => ({ db: null as unknown as Kysely<Database>, viewer: null as null | Person }));
vi.mock("@/server/auth", () => ({ getViewer: async () => h.viewer }));
vi.mock("@/db/client", async (importOriginal) => ({ ...(await importOriginal<object>()), getDb: () => h.db }));

const account = await import("../../app/api/admin/accounts/[id]/route");

describe("an admin managing accounts", () => {
  let scratch: Awaited<ReturnType<typeof migratedScratchDb>>;
  let admin: Person, coach: Person, athlete: Person, fresh: Person;

  beforeAll(async () => {
    scratch = await migratedScratchDb();
    h.db = scratch.db;
    admin = await addPerson(scratch.db, "pat@acc.test", "Pat Ellery", "admin");
    coach = await addPerson(scratch.db, "rowan@acc.test", "Rowan Hale", "coach");
    athlete = await addPerson(scratch.db, "tomas@acc.test", "Tomas Brenner", "athlete", coach.id);
    fresh = await addPerson(scratch.db, "new@acc.test", "Nia New", "coach");
    await createTemplate(scratch.db, coach, { title: "Held", source: "day A\n  squat 3x5\n" });
  });
  afterAll(async () => {
    await scratch?.drop();
  });

  const patch = async (viewer: Person | null, id: string, body: unknown) => {
    h.viewer = viewer;
    const res = await account.PATCH(request("PATCH", `/api/admin/accounts/${id}`, body), idParams(id));
    return { status: res.status, body: await res.json() };
  };

  it("is for admins only", async () => {
    expect((await patch(null, athlete.id, { disabled: true })).status).toBe(401);
    expect((await patch(coach, athlete.id, { disabled: true })).status).toBe(403);
    expect((await viewerForSession(scratch.db, { id: athlete.id, signedInAt: Date.now() }))?.id).toBe(athlete.id);
  });

  it("disables an account, which ends its sessions at once, and enables it again", async () => {
    const off = await patch(admin, athlete.id, { disabled: true });
    expect(off).toMatchObject({ status: 200, body: { account: { id: athlete.id, disabled: true, role: "athlete" } } });
    expect(await viewerForSession(scratch.db, { id: athlete.id, signedInAt: Date.now() })).toBeNull();
    // Asking twice keeps the first time it was disabled.
    const first = (await scratch.db.selectFrom("users").select("disabled_at").where("id", "=", athlete.id).executeTakeFirstOrThrow()).disabled_at;
    await patch(admin, athlete.id, { disabled: true });
    expect((await scratch.db.selectFrom("users").select("disabled_at").where("id", "=", athlete.id).executeTakeFirstOrThrow()).disabled_at).toEqual(first);
    expect((await patch(admin, athlete.id, { disabled: false })).body.account.disabled).toBe(false);
    expect((await viewerForSession(scratch.db, { id: athlete.id, signedInAt: Date.now() }))?.id).toBe(athlete.id);
  });

  it("changes a role only when nothing of the old role is left, and says what is", async () => {
    const busyCoach = await patch(admin, coach.id, { role: "athlete" });
    expect(busyCoach.status).toBe(409);
    expect(busyCoach.body.error.message).toBe("Rowan Hale still has 1 athlete and 1 template as a coach, so the role cannot change yet.");
    const linked = await patch(admin, athlete.id, { role: "coach" });
    expect(linked.status).toBe(409);
    expect(linked.body.error.fields.role).toBe("Still has a coach");

    const moved = await patch(admin, fresh.id, { role: "athlete" });
    expect(moved).toMatchObject({ status: 200, body: { account: { role: "athlete", disabled: false } } });
    // The next request already sees the new role.
    expect((await viewerForSession(scratch.db, { id: fresh.id, signedInAt: Date.now() }))?.role).toBe("athlete");
  });

  it("never changes the admin's own account, and answers bad input with a message", async () => {
    const self = await patch(admin, admin.id, { disabled: true });
    expect(self.status).toBe(409);
    expect(self.body.error.message).toMatch(/own account/);
    expect((await patch(admin, "not-a-uuid", { disabled: true })).status).toBe(404);
    expect((await patch(admin, "7d0c6a4e-1111-4a4a-9a9a-123456789abc", { disabled: true })).status).toBe(404);
    for (const body of [{}, { role: "king" }, { disabled: "yes" }, { disabled: true, colour: "red" }]) {
      const r = await patch(admin, athlete.id, body);
      expect(r.status).toBe(422);
      expect(r.body.error.message.length).toBeGreaterThan(5);
    }
  });
});
