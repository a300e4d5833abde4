import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { spawnSync } from "node:child_process";
import { PDFParse } from "pdf-parse";
import { parseArgs, run } from "./cards";

const KG = "lib/load/fixtures/kg-gym.json";
const TEMPLATE = "templates/upper-lower.iq";

let out: string[];
let err: string[];
beforeEach(() => {
  out = [];
  err = [];
  vi.spyOn(console, "log").mockImplementation((...a: unknown[]) => void out.push(a.join(" ")));
  vi.spyOn(console, "error").mockImplementation((...a: unknown[]) => void err.push(a.join(" ")));
});
afterEach(() => vi.restoreAllMocks());

const dir = () => mkdtempSync(join(tmpdir(), "iq-cards-"));

describe("iq cards command line", () => {
  it("reads options in either --key value or --key=value form, A6 unless told", () => {
    expect(parseArgs(["p.iq", "--athlete=a.json", "--start", "2027-01-04", "--week", "2", "--out", "c.pdf"])).toEqual({ file: "p.iq", athlete: "a.json", start: "2027-01-04", week: 2, size: "a6", out: "c.pdf" });
    expect(parseArgs(["p.iq", "--athlete", "a.json", "--start", "2027-01-04", "--size", "Letter", "--days", "mon,thu", "--out", "-"])).toMatchObject({ size: "letter", days: ["mon", "thu"], out: "-" });
  });

  it("explains a bad command line in one line naming the option", () => {
    const base = ["p.iq", "--athlete", "a.json", "--start", "2027-01-04"];
    expect(parseArgs(base)).toMatch(/^--out FILE.pdf is required/);
    expect(parseArgs([...base, "--out", "c.pdf", "--size", "a4"])).toBe('--size: "a4" is not one of a6, a5, letter');
    expect(parseArgs([...base, "--out", "c.pdf", "--week", "0"])).toMatch(/^--week: "0"/);
    expect(parseArgs([...base, "--out", "c.pdf", "--days", "mon,someday"])).toMatch(/^--days: "someday"/);
    expect(parseArgs(["p.iq", "--athlete", "a.json", "--start", "2027-13-01", "--out", "c.pdf"])).toMatch(/^--start: "2027-13-01" is not a date/);
    expect(parseArgs(["p.iq", "--colour", "red"])).toBe("unknown option --colour");
  });

  it("writes one A5 card per session of the chosen week, with the athlete's loads", async () => {
    const file = join(dir(), "cards.pdf");
    expect(await run([TEMPLATE, "--athlete", KG, "--start", "2027-01-04", "--week", "2", "--size", "a5", "--out", file])).toBe(0);
    expect(out).toEqual([`${file}: 4 cards for Ana Kovač, A5`]);
    const parser = new PDFParse({ data: new Uint8Array(readFileSync(file)) });
    try {
      const text = (await parser.getText()).text.replace(/\s+/g, " ");
      const info = await parser.getInfo({ parsePageInfo: true });
      // ISO 216 A5: 148 × 210 mm at 72/25.4 pt per mm.
      for (const p of info.pages) {
        expect(p.width).toBeCloseTo((148 * 72) / 25.4, 1);
        expect(p.height).toBeCloseTo((210 * 72) / 25.4, 1);
      }
      // Programme week 2 starts a week after --start; ISO 8601 puts 11 Jan 2027 in week 2.
      expect(text).toContain("Ana Kovač · Upper heavy · Mon 11 Jan 2027");
      expect(text).toContain("2027-W02");
      expect(text).not.toContain("Mon 4 Jan 2027");
      // 75 % of a 120 kg back squat plus the template's +2.5 kg a week = 92.5 kg; (92.5 − 20) / 2 = 36.25 = 25 + 10 + 1.25 a side.
      expect(text).toContain("4 × 5 92.5 kg 25 · 10 · 1.25 a side");
      // The command line has no stored session, so no code to scan.
      expect(info.pages.flatMap((p) => p.links)).toEqual([]);
    } finally {
      await parser.destroy();
    }
  });

  it("names a week the programme does not have and exits 2 without writing", async () => {
    const file = join(dir(), "cards.pdf");
    expect(await run([TEMPLATE, "--athlete", KG, "--start", "2027-01-04", "--week", "9", "--out", file])).toBe(2);
    expect(err.at(-1)).toBe("iq cards: --week: the programme has 4 weeks, so there is no week 9");
    expect(() => readFileSync(file)).toThrow();
  });

  it("says in one line when the output cannot be written, exit 2", async () => {
    const file = join(dir(), "no", "such", "folder", "cards.pdf");
    expect(await run([TEMPLATE, "--athlete", KG, "--start", "2027-01-04", "--week", "1", "--out", file])).toBe(2);
    expect(err.at(-1)).toBe(`${file}: no such folder`);
  });

  it("prints notation errors as FILE:LINE:COL and exits 1", async () => {
    const d = dir();
    const bad = join(d, "broken.iq");
    writeFileSync(bad, "day A mon\n  bench press 3x5 @@@\n");
    expect(await run([bad, "--athlete", KG, "--start", "2027-01-04", "--out", join(d, "c.pdf")])).toBe(1);
    expect(err[0]).toMatch(new RegExp(`^${bad.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}:2:\\d+: error: `));
  });

  it("writes the PDF to stdout with --out -, end to end", () => {
    const r = spawnSync(process.execPath, ["--import", "tsx", "cli/iq.ts", "cards", TEMPLATE, "--athlete", KG, "--start", "2027-01-04", "--week", "1", "--out", "-"], { maxBuffer: 1 << 26 });
    expect(r.status).toBe(0);
    expect(r.stdout.subarray(0, 5).toString("latin1")).toBe("%PDF-");
    expect(r.stdout.subarray(-6).toString("latin1")).toMatch(/%%EOF\s*$/);
  });
});
