/**
 * `iq cards FILE --athlete PROFILE.json --start YYYY-MM-DD [--week N] [--days mon,wed,fri] [--size a6|a5|letter] --out cards.pdf`
 *
 * Prints the programme worked out for one athlete as session cards, one card per session,
 * in the same profile format as `iq expand`. `--week N` keeps programme week N only; without
 * it every week is printed. `--out -` writes the PDF to stdout. Cards made here carry no QR
 * code: a session only gets a logging page (and so a code to scan) once it is assigned in
 * the web app. Exit 0 on success; 1 when the programme has notation errors or a load could
 * not be worked for an error reason; 2 for a bad command line, an unreadable file, an invalid
 * profile or a week the programme does not have.
 *
 * @example
 * // npm run -s iq -- cards templates/upper-lower.iq --athlete lib/load/fixtures/kg-gym.json --start 2027-01-04 --week 1 --size a5 --out cards.pdf
 */
import { writeFile } from "node:fs/promises";
import type { Weekday } from "../../lib/notation/model";
import { expandProgramme } from "../../lib/load/index";
import { CARD_SIZES, isCardSize, type CardSize } from "../../pdf/sizes";
import { diagnosticLine, parseDays, parseProgrammeOptions, readProgrammeFor } from "./programmeInput";

const USAGE = "usage: iq cards FILE --athlete PROFILE.json --start YYYY-MM-DD [--week N] [--days mon,wed,fri] [--size a6|a5|letter] --out cards.pdf";

export interface CardsArgs {
  file: string;
  athlete: string;
  start: string;
  week?: number;
  days?: Weekday[];
  size: CardSize;
  out: string;
}

/** Parse the command line; a string is the one-line reason it is wrong. */
export function parseArgs(argv: string[]): CardsArgs | string {
  const parsed = parseProgrammeOptions(argv, ["week", "size", "out"]);
  if (typeof parsed === "string") return parsed;
  const { base, opts } = parsed;
  const out = opts.get("out");
  if (!out) return "--out FILE.pdf is required (or --out - for stdout)";
  const size = (opts.get("size") ?? "a6").toLowerCase();
  if (!isCardSize(size)) return `--size: "${opts.get("size")}" is not one of ${CARD_SIZES.join(", ")}`;
  const args: CardsArgs = { ...base, size, out };
  const week = opts.get("week");
  if (week !== undefined) {
    if (!/^\d+$/.test(week) || Number(week) < 1) return `--week: "${week}" is not a programme week (1, 2, …)`;
    args.week = Number(week);
  }
  const days = opts.get("days");
  if (days !== undefined) {
    const list = parseDays(days);
    if (typeof list === "string") return list;
    args.days = list;
  }
  return args;
}

function writeStdout(data: Buffer): Promise<void> {
  return new Promise((resolve, reject) => process.stdout.write(data, (err) => (err ? reject(err) : resolve())));
}

export async function run(argv: string[]): Promise<number> {
  const args = parseArgs(argv);
  if (typeof args === "string") {
    console.error(`iq cards: ${args}\n${USAGE}`);
    return 2;
  }
  const input = await readProgrammeFor(args.file, args.athlete);
  if (typeof input === "number") return input;
  const { programme, athlete } = input;

  const result = expandProgramme(programme, athlete, { start: args.start, ...(args.days ? { days: args.days } : {}) });
  for (const d of result.diagnostics) console.error(diagnosticLine(args.file, d));
  if (result.diagnostics.some((d) => d.severity === "error")) return 1;

  const weeks = Math.max(0, ...result.sessions.map((s) => s.weekInProgramme));
  if (args.week !== undefined && args.week > weeks) {
    console.error(`iq cards: --week: the programme has ${weeks} week${weeks === 1 ? "" : "s"}, so there is no week ${args.week}`);
    return 2;
  }
  const sessions = result.sessions.filter((s) => args.week === undefined || s.weekInProgramme === args.week);
  if (sessions.length === 0) {
    console.error(`iq cards: ${args.file}: no sessions to print`);
    return 2;
  }

  // Loaded here rather than at the top so `iq cards --help`-style mistakes answer without starting the PDF engine.
  const { renderCards } = await import("../../pdf/render");
  const pdf = await renderCards({ athlete: athlete.name, size: args.size, sessions: sessions.map((session) => ({ session })) });
  if (args.out === "-") {
    await writeStdout(pdf);
    return 0;
  }
  try {
    await writeFile(args.out, pdf);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    const why = code === "ENOENT" ? "no such folder" : code === "EISDIR" ? "is a directory" : code === "EACCES" ? "permission denied" : "cannot be written";
    console.error(`${args.out}: ${why}`);
    return 2;
  }
  console.log(`${args.out}: ${sessions.length} card${sessions.length === 1 ? "" : "s"} for ${athlete.name}, ${args.size.toUpperCase()}`);
  return 0;
}
