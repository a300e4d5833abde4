/**
 * `iq expand FILE --athlete PROFILE.json --start YYYY-MM-DD [--days mon,wed,fri] [--weeks N] [--json]`
 *
 * Expands a programme for one athlete into dated sessions: a readable table, or with --json
 * `{ athlete, units, sessions, diagnostics }`. Exit 0 on success; 1 when the programme has
 * notation errors (printed as FILE:LINE:COL: severity: message) or a load could not be worked
 * for an error reason; 2 for a bad command line, an unreadable file or an invalid profile.
 *
 * @example
 * // npm run -s iq -- expand templates/upper-lower.iq --athlete lib/load/fixtures/kg-gym.json --start 2027-01-04 --json
 */
import type { Weekday } from "../../lib/notation/model";
import type { AthleteProfile } from "../../lib/athlete/profile";
import { expandProgramme, type Session, type SetOut } from "../../lib/load/index";
import { diagnosticLine, parseDays, parseProgrammeOptions, readProgrammeFor } from "./programmeInput";

const USAGE = "usage: iq expand FILE --athlete PROFILE.json --start YYYY-MM-DD [--days mon,wed,fri] [--weeks N] [--json]";

interface Args {
  file: string;
  athlete: string;
  start: string;
  days?: Weekday[];
  weeks?: number;
  json: boolean;
}

/** Parse the command line; a string is the one-line reason it is wrong. */
export function parseArgs(argv: string[]): Args | string {
  const parsed = parseProgrammeOptions(argv, ["weeks"], ["json"]);
  if (typeof parsed === "string") return parsed;
  const { base, opts, flags } = parsed;
  const out: Args = { ...base, json: flags.has("json") };
  const days = opts.get("days");
  if (days !== undefined) {
    const list = parseDays(days);
    if (typeof list === "string") return list;
    out.days = list;
  }
  const weeks = opts.get("weeks");
  if (weeks !== undefined) {
    if (!/^\d+$/.test(weeks) || Number(weeks) < 1) return `--weeks: "${weeks}" is not a whole number of weeks`;
    out.weeks = Number(weeks);
  }
  return out;
}

const n = (x: number) => String(Math.round(x * 1000) / 1000);
const duration = (seconds: number) => (seconds >= 60 && seconds % 60 === 0 ? `${seconds / 60}m` : `${n(seconds)}s`);

function repsText(s: SetOut): string {
  if (s.seconds !== null) return duration(s.seconds);
  if (s.amrap) return `${s.repsMin}+`;
  return s.repsMin === s.repsMax ? `${s.repsMin}` : `${s.repsMin}-${s.repsMax}`;
}

function loadText(s: SetOut, units: string): string {
  if (s.bodyweight) return s.load ? `bw+${n(s.load)} ${units}` : "bw";
  if (s.load === null) return "—";
  return `${n(s.load)} ${units}` + (s.perSide && s.perSide.length ? `  [${s.perSide.map(n).join(" ")}]` : s.perSide ? "  [empty bar]" : "");
}

function setLines(sets: SetOut[], units: string, indent: string): string[] {
  const lines: string[] = [];
  let i = 0;
  while (i < sets.length) {
    const key = (s: SetOut) => `${s.kind}|${repsText(s)}|${loadText(s, units)}`;
    let j = i;
    while (j < sets.length && key(sets[j]) === key(sets[i])) j++;
    const s = sets[i];
    lines.push(`${indent}${s.kind === "warmup" ? "warm-up" : "work   "}  ${j - i} × ${repsText(s).padEnd(6)} ${loadText(s, units)}`);
    i = j;
  }
  return lines;
}

/** The readable table: one heading per session, one line per run of identical sets. */
export function formatTable(sessions: Session[], athlete: AthleteProfile): string {
  const out: string[] = [`${athlete.name} (${athlete.units})`];
  for (const s of sessions) {
    out.push("", `${s.date} ${s.weekday} ${s.isoWeek}  ${s.block} week ${s.week}${s.deload ? " (deload)" : ""}  —  ${s.day}`);
    for (const w of s.warmupNotes) out.push(`  warm-up: ${w}`);
    for (const ex of s.exercises) {
      const extras = [ex.effort, ex.restSeconds !== null ? `rest ${duration(ex.restSeconds)}` : null, ex.tempo ? `tempo ${ex.tempo}` : null, ex.pauseSeconds !== null ? `pause ${n(ex.pauseSeconds)}s` : null].filter(Boolean);
      out.push(`  ${ex.label ? ex.label + " " : ""}${ex.name}${extras.length ? "  (" + extras.join(", ") + ")" : ""}${ex.cue ? `  "${ex.cue}"` : ""}`);
      if (ex.loadNote) out.push(`      note: ${ex.loadNote}`);
      out.push(...setLines(ex.sets, s.units, "      "));
      for (const sub of ex.substitutes) {
        const first = sub.sets.find((x) => x.kind === "work");
        out.push(`      or ${sub.name}: ${first ? loadText(first, s.units) : "—"}${sub.loadNote ? ` (${sub.loadNote})` : ""}`);
      }
    }
  }
  return out.join("\n");
}

/**
 * Write to stdout and wait until it is flushed: the dispatcher exits right after `run`
 * returns, which would cut a large JSON document short on a pipe.
 */
function print(text: string): Promise<void> {
  if (process.stdout.write === undefined || !process.stdout.writable) {
    console.log(text);
    return Promise.resolve();
  }
  return new Promise((resolve) => {
    process.stdout.write(text + "\n", () => resolve());
  });
}

export async function run(argv: string[]): Promise<number> {
  const args = parseArgs(argv);
  if (typeof args === "string") {
    console.error(`iq expand: ${args}\n${USAGE}`);
    return 2;
  }
  const input = await readProgrammeFor(args.file, args.athlete);
  if (typeof input === "number") return input;
  const { programme, athlete } = input;

  const result = expandProgramme(programme, athlete, { start: args.start, days: args.days, weeks: args.weeks });
  for (const d of result.diagnostics) console.error(diagnosticLine(args.file, d));
  const text = args.json
    ? JSON.stringify({ athlete: athlete.name, units: athlete.units, sessions: result.sessions, diagnostics: result.diagnostics }, null, 2)
    : formatTable(result.sessions, athlete);
  await print(text);
  return result.diagnostics.some((d) => d.severity === "error") ? 1 : 0;
}
