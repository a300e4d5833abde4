import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { spawnSync } from "node:child_process";
import { parseArgs, run } from "./expand";

const KG = "lib/load/fixtures/kg-gym.json";
const LB = "lib/load/fixtures/lb-gym.json";
const TEMPLATE = "templates/upper-lower.iq";

let out: string[];
let err: string[];
beforeEach(() => {
  out = [];
  err = [];
  vi.spyOn(console, "log").mockImplementation((...a: unknown[]) => void out.push(a.join(" ")));
  vi.spyOn(process.stdout, "write").mockImplementation(((chunk: string, ...rest: unknown[]) => {
    out.push(String(chunk));
    const done = rest.find((r) => typeof r === "function") as (() => void) | undefined;
    done?.();
    return true;
  }) as typeof process.stdout.write);
  vi.spyOn(console, "error").mockImplementation((...a: unknown[]) => void err.push(a.join(" ")));
});
afterEach(() => vi.restoreAllMocks());

const tmp = (name: string, text: string) => {
  const dir = mkdtempSync(join(tmpdir(), "iq-expand-"));
  const file = join(dir, name);
  writeFileSync(file, text);
  return file;
};

describe("iq expand command line", () => {
  it("reads options in either --key value or --key=value form", () => {
    expect(parseArgs(["p.iq", "--athlete=a.json", "--start", "2027-01-04", "--days", "Mon,thu", "--weeks", "2", "--json"])).toEqual({ file: "p.iq", athlete: "a.json", start: "2027-01-04", days: ["mon", "thu"], weeks: 2, json: true });
  });

  it("explains a bad command line in one line", () => {
    expect(parseArgs(["p.iq", "--athlete", "a.json"])).toBe("--start YYYY-MM-DD is required");
    expect(parseArgs(["p.iq", "--athlete", "a.json", "--start", "2027-02-30"])).toMatch(/not a date/);
    expect(parseArgs(["p.iq", "--athlete", "a.json", "--start", "2027-01-04", "--days", "mon,funday"])).toMatch(/"funday" is not a weekday/);
    expect(parseArgs(["p.iq", "--athlete", "a.json", "--start", "2027-01-04", "--weeks", "0"])).toMatch(/--weeks/);
    expect(parseArgs(["--athlete", "a.json", "--start", "2027-01-04"])).toMatch(/FILE is required/);
    expect(parseArgs(["p.iq", "--colour", "red"])).toBe("unknown option --colour");
  });

  it("prints dated sessions as JSON with worked loads", async () => {
    expect(await run([TEMPLATE, "--athlete", KG, "--start", "2027-01-04", "--weeks", "1", "--json"])).toBe(0);
    const json = JSON.parse(out.join("\n"));
    expect(json).toMatchObject({ athlete: "Ana Kovač", units: "kg" });
    const first = json.sessions[0];
    expect(first).toMatchObject({ date: "2027-01-04", isoWeek: "2027-W01", week: 1, day: "Upper heavy", block: "Accumulate" });
    const bench = first.exercises[0];
    expect(bench).toMatchObject({ name: "bench press", label: "A1", cue: "elbows under the bar" });
    // Brzycki 1993: 80 kg max × (37 − 7)/36 = 66.67 → 67.5 on 1.25 kg change plates.
    const work = bench.sets.filter((s: { kind: string }) => s.kind === "work");
    expect(work).toHaveLength(4);
    expect(work[0]).toMatchObject({ repsMin: 5, repsMax: 7, amrap: false, load: 67.5, bodyweight: false, perSide: [20, 2.5, 1.25], rir: 2, percent1RM: 0.8333 });
    const dates = json.sessions.map((s: { date: string }) => s.date);
    expect(dates).toEqual([...dates].sort());
  });

  it("prints a readable table for a pound gym", async () => {
    expect(await run([TEMPLATE, "--athlete", LB, "--start", "2027-01-04", "--weeks", "1"])).toBe(0);
    const text = out.join("\n");
    expect(text).toContain("Sam Ortega (lb)");
    // 75 % of a 315 lb squat = 236.25 → 235 lb on a 45 lb bar: 95 a side = 45 + 45 + 5.
    expect(text).toMatch(/work {3}\s*4 × 5\s+235 lb {2}\[45 45 5\]/);
  });

  it("names the invalid profile field and exits 2", async () => {
    const bad = tmp("bad.json", JSON.stringify({ name: "X", units: "kg", bar: 20, plates: [20, -5] }));
    expect(await run([TEMPLATE, "--athlete", bad, "--start", "2027-01-04"])).toBe(2);
    expect(err).toEqual([`${bad}: plates[1]: must be greater than 0`]);
  });

  it("says in one line when a file cannot be read, exit 2", async () => {
    expect(await run(["no/such.iq", "--athlete", KG, "--start", "2027-01-04"])).toBe(2);
    expect(err).toEqual(["no/such.iq: no such file"]);
    const notJson = tmp("p.json", "{ name: ");
    expect(await run([TEMPLATE, "--athlete", notJson, "--start", "2027-01-04"])).toBe(2);
    expect(err[1]).toMatch(/not valid JSON/);
  });

  it("prints notation errors as FILE:LINE:COL and exits 1", async () => {
    const file = tmp("broken.iq", "day A mon\n  bench press 3x5 @@@\n");
    expect(await run([file, "--athlete", KG, "--start", "2027-01-04"])).toBe(1);
    expect(err.length).toBeGreaterThan(0);
    for (const line of err) expect(line).toMatch(new RegExp(`^${file.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}:\\d+:\\d+: (error|warning|info): .+`));
    expect(out).toEqual([]);
  });

  it("writes the whole JSON document through a pipe, end to end", () => {
    const r = spawnSync(process.execPath, ["--import", "tsx", "cli/iq.ts", "expand", "templates/push-pull-legs.iq", "--athlete", KG, "--start", "2027-01-04", "--json"], { encoding: "utf8", maxBuffer: 1 << 26 });
    expect(r.status).toBe(0);
    expect(r.stdout.length).toBeGreaterThan(65_536);
    expect(() => JSON.parse(r.stdout)).not.toThrow();
  });

  it("never answers bad input with a stack trace, end to end", () => {
    const r = spawnSync(process.execPath, ["--import", "tsx", "cli/iq.ts", "expand", TEMPLATE, "--athlete", "missing.json", "--start", "x"], { encoding: "utf8" });
    expect(r.status).toBe(2);
    expect(r.stderr).not.toMatch(/\n\s+at /);
    expect(r.stderr.split("\n")[0]).toMatch(/^iq expand: --start/);
  });
});
