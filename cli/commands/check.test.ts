import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterEach, describe, expect, it, vi } from "vitest";
import { run as check } from "./check";
import { run as fmt } from "./fmt";

function capture() {
  const out: string[] = [];
  const err: string[] = [];
  vi.spyOn(console, "log").mockImplementation((m: string) => void out.push(m));
  vi.spyOn(console, "error").mockImplementation((m: string) => void err.push(m));
  vi.spyOn(process.stdout, "write").mockImplementation((m: string | Uint8Array) => (out.push(String(m)), true));
  return { out, err };
}
afterEach(() => vi.restoreAllMocks());

const dir = mkdtempSync(join(tmpdir(), "iq-cli-"));
const file = (name: string, text: string) => {
  const p = join(dir, name);
  writeFileSync(p, text);
  return p;
};

describe("iq check", () => {
  it("prints FILE:LINE:COL: severity: message and exits 1 on an error", async () => {
    const p = file("bad.iq", "day A\n  squat 3x8-6\n");
    const { out } = capture();
    expect(await check([p])).toBe(1);
    expect(out).toEqual([`${p}:2:11: error: rep range 8-6 runs backwards`]);
  });
  it("exits 0 when there are only warnings", async () => {
    const p = file("warn.iq", "colour: red\nday A\n  squat 3x5\n");
    const { out } = capture();
    expect(await check([p])).toBe(0);
    expect(out[0]).toMatch(/:1:1: warning: unknown setting 'colour'/);
  });
  it("prints one line and exits 2 for an unreadable file", async () => {
    const { err } = capture();
    expect(await check([join(dir, "missing.iq")])).toBe(2);
    expect(err).toEqual([`${join(dir, "missing.iq")}: no such file`]);
    expect(await check([dir])).toBe(2);
  });
});

describe("iq fmt", () => {
  it("prints the canonical form, or rewrites the file with --write", async () => {
    const p = file("fmt.iq", "DAY A\nsquat 3X5\n");
    const { out } = capture();
    expect(await fmt([p])).toBe(0);
    expect(out.join("")).toBe("day A\n  squat 3x5\n");
    expect(await fmt([p, "--write"])).toBe(0);
    expect(readFileSync(p, "utf8")).toBe("day A\n  squat 3x5\n");
  });
  it("exits 2 with usage when no file is given", async () => {
    const { err } = capture();
    expect(await fmt([])).toBe(2);
    expect(err[0]).toMatch(/usage/);
  });
});
