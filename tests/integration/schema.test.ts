import { sql } from "kysely";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { migrateToLatest } from "../../db/migrate";
import { DEMO_PEOPLE, seedDemo } from "../../db/seed";
import { createUser, findUserForSignIn } from "../../db/users";
import { createScratchDb } from "../support/scratchDb";

describe("a fresh database", () => {
  let scratch: Awaited<ReturnType<typeof createScratchDb>>;
  beforeAll(async () => {
    scratch = await createScratchDb();
  });
  afterAll(async () => {
    await scratch?.drop();
  });

  it("takes every migration and ends with the users table in place", async () => {
    const applied = await migrateToLatest(scratch.db);
    expect(applied.length).toBeGreaterThan(0);
    const { rows } = await sql<{ table_name: string }>`select table_name from information_schema.tables where table_schema = 'public'`.execute(scratch.db);
    expect(rows.map((r) => r.table_name)).toEqual(expect.arrayContaining(["users", "gyms"]));
  });

  it("applies nothing the second time", async () => {
    expect(await migrateToLatest(scratch.db)).toEqual([]);
  });

  it("rejects a role outside admin, coach and athlete", async () => {
    await expect(
      sql`insert into users (email, name, password_hash, role) values ('x@y.test', 'X', 'h', 'owner')`.execute(scratch.db),
    ).rejects.toThrow(/check constraint/);
  });

  it("seeds the demo once however often the seed runs", async () => {
    const first = await seedDemo(scratch.db);
    const second = await seedDemo(scratch.db);
    expect(first.created).toBe(DEMO_PEOPLE.length);
    expect(second.created).toBe(0);
    const { rows } = await sql<{ n: string }>`select count(*) as n from users where email like '%@larchmere.test'`.execute(scratch.db);
    expect(Number(rows[0].n)).toBe(DEMO_PEOPLE.length);
    const gyms = await sql<{ n: string }>`select count(*) as n from gyms`.execute(scratch.db);
    expect(Number(gyms.rows[0].n)).toBe(1);
    // The coach's shelf: two templates, three versions in all, however often the seed runs.
    const tpl = await sql<{ t: string; v: string }>`select (select count(*) from templates) as t, (select count(*) from template_versions) as v`.execute(scratch.db);
    expect([Number(tpl.rows[0].t), Number(tpl.rows[0].v)]).toEqual([2, 3]);
  });

  it("links the demo athletes to the demo coach", async () => {
    const { rows } = await sql<{ name: string; coach: string | null }>`
      select a.name, c.email as coach from users a left join users c on c.id = a.coach_id where a.role = 'athlete'`.execute(scratch.db);
    expect(rows.length).toBe(3);
    for (const r of rows) expect(r.coach).toBe("coach@larchmere.test");
  });

  it("treats e-mail addresses case-insensitively: one account per address", async () => {
    const a = await createUser(scratch.db, { email: "Sam@Example.test", name: "Sam", passwordHash: "h", role: "coach" });
    const b = await createUser(scratch.db, { email: "sam@example.TEST", name: "Sam again", passwordHash: "h", role: "coach" });
    expect(a).not.toBeNull();
    expect(b).toBeNull();
    const found = await findUserForSignIn(scratch.db, "  SAM@example.test ");
    expect(found?.name).toBe("Sam");
  });
});
