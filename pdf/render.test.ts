import { readFileSync } from "node:fs";
import { beforeAll, describe, expect, it } from "vitest";
import { PDFParse } from "pdf-parse";
import { parseAthleteProfile, type AthleteProfile } from "../lib/athlete/profile";
import { expandProgramme } from "../lib/load/index";
import type { Session } from "../lib/load/types";
import { parseProgramme } from "../lib/notation/index";
import { cardView } from "./model";
import { renderCards, sessionLogUrl } from "./render";
import type { CardSize } from "./sizes";

// The one PDF reader of this process: pdf-parse (pdf.js underneath).
async function readPdf(pdf: Buffer): Promise<{ pages: string[]; text: string; sizes: { width: number; height: number }[]; links: string[][] }> {
  const parser = new PDFParse({ data: new Uint8Array(pdf) });
  try {
    const text = await parser.getText();
    const info = await parser.getInfo({ parsePageInfo: true });
    return {
      pages: text.pages.map((p) => p.text),
      text: text.text,
      sizes: info.pages.map((p) => ({ width: p.width, height: p.height })),
      links: info.pages.map((p) => p.links.map((l) => l.url)),
    };
  } finally {
    await parser.destroy();
  }
}

/** Extracted text with runs of white space made single, so a wrapped line still matches. */
const flat = (s: string) => s.replace(/\s+/g, " ");

function profileFrom(file: string): AthleteProfile {
  const r = parseAthleteProfile(JSON.parse(readFileSync(file, "utf8")));
  if (!r.ok) throw new Error(r.errors.join("; "));
  return r.profile;
}

function expand(iq: string, profile: AthleteProfile, start: string, weeks?: number): Session[] {
  const { programme, diagnostics } = parseProgramme(readFileSync(iq, "utf8"));
  expect(diagnostics.filter((d) => d.severity === "error")).toEqual([]);
  return expandProgramme(programme, profile, { start, ...(weeks ? { weeks } : {}) }).sessions;
}

/** Plates per side, heaviest first, taking each plate as often as it fits (common practice, no source). */
function perSide(total: number, bar: number, plates: number[]): string {
  let rest = (total - bar) / 2;
  const out: number[] = [];
  for (const p of plates) {
    while (rest >= p - 1e-9) {
      out.push(p);
      rest -= p;
    }
  }
  expect(rest).toBeCloseTo(0, 6);
  return out.join(" · ");
}

const roundTo = (x: number, step: number) => Math.round(x / step) * step;

const BASE = "https://ironquill.test";
const IDS = ["5b7e2a3c-1d4f-4a6b-9c8d-0e1f2a3b4c5d", "8c1d2e3f-4a5b-4c6d-8e9f-0a1b2c3d4e5f"];

describe("session cards (pdf)", () => {
  const tomas = profileFrom("pdf/fixtures/tomas-kg.json");
  const week = expand("pdf/fixtures/eight-exercises.iq", tomas, "2026-12-07", 1);
  let a6: Awaited<ReturnType<typeof readPdf>>;

  beforeAll(async () => {
    a6 = await readPdf(await renderCards({ athlete: tomas.name, size: "a6", baseUrl: BASE, sessions: week.map((session, i) => ({ session, id: IDS[i] })) }));
  });

  it("prints the athlete, the dates and the ISO week of each session", () => {
    expect(week.map((s) => s.date)).toEqual(["2026-12-07", "2026-12-10"]);
    const text = flat(a6.text);
    expect(text).toContain("Tomas Brenner · Day A · Mon 7 Dec 2026");
    expect(text).toContain("Tomas Brenner · Day B · Thu 10 Dec 2026");
    // ISO 8601: 2026-01-01 is a Thursday, so week 1 starts on Mon 29 Dec 2025 and 7 Dec 2026 is 343 days (49 weeks) later.
    expect(text).toContain("2026-W50");
    expect(text).toContain("Base · week 1");
  });

  it("prints worked loads and the plates for each side of the bar", () => {
    const text = flat(a6.text);
    const plates = [25, 20, 15, 10, 5, 2.5, 1.25];
    // 75 % of a 140 kg back squat.
    const squat = 0.75 * 140;
    expect(text).toContain(`5 × 5 ${squat} kg ${perSide(squat, 20, plates)} a side`);
    // Brzycki 1993, JOPERD 64(1): 5 reps + 2 in reserve = 7 to failure, 1RM × (37 − 7)/36, rounded to 2.5 kg.
    const bench = roundTo((100 * (37 - 7)) / 36, 2.5);
    expect(text).toContain(`4 × 5–7 ${bench} kg ${perSide(bench, 20, plates)} a side`);
    // 75 % of a 180 kg deadlift.
    const deadlift = 0.75 * 180;
    expect(text).toContain(`3 × 5 ${deadlift} kg ${perSide(deadlift, 20, plates)} a side`);
    // Warm-up ramp: 40 % of the first working load, rounded to 2.5 kg, for 8 reps (lib/load/README.md; common practice, no source).
    const ramp = roundTo(0.4 * squat, 2.5);
    expect(text).toContain(`${ramp} × 8 (${perSide(ramp, 20, plates)})`);
    expect(text).toContain("4 × 5–8 BW + 5 kg");
    expect(text).toMatch(/or good morning: 3 × 8 · \d+(\.\d+)? kg/);
    expect(text).toContain("tempo 3110");
    expect(text).toContain("“elbows under the bar”");
  });

  it("lets a long session flow onto a second A6 page without losing or repeating anything", () => {
    const dayA = week[0];
    expect(dayA.exercises.length).toBe(8);
    const dayAPages = a6.pages.filter((p) => flat(p).includes("Day A · Mon 7 Dec 2026"));
    expect(dayAPages.length).toBeGreaterThanOrEqual(2);
    expect(flat(dayAPages.at(-1)!)).toContain(`page ${dayAPages.length} of ${dayAPages.length}`);
    const all = flat(dayAPages.join("\n"));
    for (const ex of cardView(dayA, { athlete: tomas.name }).exercises) {
      expect(all, ex.name).toContain(ex.name);
      for (const w of ex.work) {
        const line = `${w.count} × ${w.reps}${w.load ? ` ${w.load}` : ""}`;
        expect(all.split(line).length - 1, `${ex.name}: ${line}`).toBe(1);
      }
    }
  });

  it("carries the caution on every page", () => {
    for (const page of a6.pages) expect(flat(page)).toContain("Train safe. Loads are estimates from the maxes on file.");
  });

  it("links each card's QR code to that session's logging page", () => {
    const firstOfDayB = a6.pages.findIndex((p) => flat(p).includes("Day B · Thu 10 Dec 2026"));
    expect(a6.links[0]).toEqual([`${BASE}/athlete/sessions/${IDS[0]}/log`]);
    expect(a6.links[firstOfDayB]).toEqual([`${BASE}/athlete/sessions/${IDS[1]}/log`]);
    // Continuation pages carry no second code.
    expect(a6.links[1]).toEqual([]);
  });

  it("draws no QR code without a session id or a base address", async () => {
    const read = await readPdf(await renderCards({ athlete: tomas.name, sessions: [{ session: week[1] }], baseUrl: BASE }));
    expect(read.links.flat()).toEqual([]);
    expect(sessionLogUrl(`${BASE}/`, "x")).toBe(`${BASE}/athlete/sessions/x/log`);
  });

  // ISO 216: A6 is 105 × 148 mm and A5 148 × 210 mm; US Letter (ANSI/ASME Y14.1) is 8.5 × 11 in; 1 pt = 1/72 in = 25.4/72 mm.
  const MM = 72 / 25.4;
  const expected: Record<CardSize, [number, number]> = { a6: [105 * MM, 148 * MM], a5: [148 * MM, 210 * MM], letter: [8.5 * 72, 11 * 72] };
  for (const size of ["a6", "a5", "letter"] as const) {
    it(`makes ${size} pages of the standard size in points`, async () => {
      const read = size === "a6" ? a6 : await readPdf(await renderCards({ athlete: tomas.name, size, sessions: [{ session: week[1] }] }));
      for (const page of read.sizes) {
        expect(page.width).toBeCloseTo(expected[size][0], 1);
        expect(page.height).toBeCloseTo(expected[size][1], 1);
      }
    });
  }

  it("refuses to print nothing", async () => {
    await expect(renderCards({ athlete: "X", sessions: [] })).rejects.toThrow(/no sessions/);
  });
});

describe("a four-week pack", () => {
  let sessions: Session[];
  let read: Awaited<ReturnType<typeof readPdf>>;
  const sam = profileFrom("lib/load/fixtures/lb-gym.json");

  beforeAll(async () => {
    sessions = expand("templates/push-pull-legs.iq", sam, "2027-01-04", 4).slice(0, 20);
    read = await readPdf(await renderCards({ athlete: sam.name, size: "a6", sessions: sessions.map((session) => ({ session })) }));
  });

  it("renders 20 sessions, one card each, in pounds", () => {
    expect(sessions).toHaveLength(20);
    expect(read.pages.length).toBeGreaterThanOrEqual(20);
    const text = flat(read.text);
    for (const s of sessions) expect(text).toContain(`${s.day} · `);
    const firstDates = new Set(read.pages.map((p) => /Sam Ortega · [^·]+ · (\w{3} \d+ \w{3} \d{4})/.exec(flat(p))?.[1]));
    expect(firstDates.size).toBe(20);
    // Epley 1985: 6 reps + 2 in reserve = 8 to failure, 1RM / (1 + 8/30), rounded to 5 lb, on a 45 lb bar.
    const bench = roundTo(225 / (1 + 8 / 30), 5);
    expect(text).toContain(`4 × 6–8 ${bench} lb ${perSide(bench, 45, [45, 35, 25, 10, 5, 2.5])} a side`);
    expect(text).not.toMatch(/\d kg\b/);
  });
});
