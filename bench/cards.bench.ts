/**
 * Card rendering speed: one A6 session card, and a four-week pack of 20 cards (the push, pull,
 * legs template for a pound gym), each once warm (fonts loaded and parsed, JIT warm).
 * Target: the 20-card pack ≤ 1.5 s warm.
 */
import { readFileSync } from "node:fs";
import { performance } from "node:perf_hooks";
import { parseAthleteProfile } from "../lib/athlete/profile";
import { expandProgramme } from "../lib/load/index";
import { parseProgramme } from "../lib/notation/index";
import { renderCards, type CardSession } from "../pdf/render";

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

async function time(runs: number, f: () => Promise<unknown>): Promise<number> {
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const a = performance.now();
    await f();
    t.push(performance.now() - a);
  }
  return median(t);
}

export default async function bench(): Promise<void> {
  const parsed = parseAthleteProfile(JSON.parse(readFileSync("lib/load/fixtures/lb-gym.json", "utf8")));
  if (!parsed.ok) throw new Error(parsed.errors.join("; "));
  const athlete = parsed.profile;
  const { programme } = parseProgramme(readFileSync("templates/push-pull-legs.iq", "utf8"));
  const sessions = expandProgramme(programme, athlete, { start: "2027-01-04", weeks: 4 }).sessions.slice(0, 20);
  const pack: CardSession[] = sessions.map((session, i) => ({ session, id: `00000000-0000-4000-8000-${String(i).padStart(12, "0")}` }));
  const base = "https://ironquill.test";
  const one = () => renderCards({ athlete: athlete.name, size: "a6", baseUrl: base, sessions: pack.slice(0, 1) });
  const twenty = () => renderCards({ athlete: athlete.name, size: "a6", baseUrl: base, sessions: pack });

  const coldStart = performance.now();
  await one();
  const cold = performance.now() - coldStart;
  for (let i = 0; i < 3; i++) await one();
  const single = await time(9, one);
  await twenty();
  const packMs = await time(5, twenty);
  const bytes = (await twenty()).length;

  const rows = [
    ["case", "median", "target", "ok"],
    ["first card (cold: fonts, layout engine)", `${cold.toFixed(0)} ms`, "(reported)", ""],
    ["1 A6 card, warm", `${single.toFixed(0)} ms`, "(reported)", ""],
    [`${pack.length}-card A6 pack, warm (${(bytes / 1024).toFixed(0)} KiB)`, `${packMs.toFixed(0)} ms`, "≤ 1500 ms", packMs <= 1500 ? "yes" : "NO"],
  ];
  const w = rows[0].map((_, c) => Math.max(...rows.map((row) => row[c].length)));
  for (const row of rows) console.log(row.map((cell, c) => cell.padEnd(w[c])).join("  "));
}
