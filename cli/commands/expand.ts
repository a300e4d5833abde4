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
import { readFile } from "node:fs/promises";
import { parseProgramme } from "../../lib/notation/index";
import { WEEKDAYS, type Weekday } from "../../lib/notation/model";
import { parseAthleteProfile, type AthleteProfile } from "../../lib/athlete/profile";
import { isDateString } from "../../lib/dates/date";
import { expandProgramme, type ExpandDiagnostic, type Session, type SetOut } from "../../lib/load/index";

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
  const files: string[] = [];
  const opts = new Map<string, string>();
  let json = false;
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    if (a === "--json") json = true;
    else if (a.startsWith("--")) {
      const eq = a.indexOf("=");
      const key = eq > 0 ? a.slice(2, eq) : a.slice(2);
      if (!["athlete", "start", "days", "weeks"].includes(key)) return `unknown option --${key}`;
      const value = eq > 0 ? a.slice(eq + 1) : argv[++i];
      if (value === undefined || value === "") return `--${key} needs a value`;
      opts.set(key, value);
    } else files.push(a);
  }
  if (files.length !== 1) return files.length === 0 ? "a programme FILE is required" : `one programme FILE at a time (got ${files.length})`;
  const athlete = opts.get("athlete");
  if (!athlete) return "--athlete PROFILE.json is required";
  const start = opts.get("start");
  if (!start) return "--start YYYY-MM-DD is required";
  if (!isDateString(start)) return `--start: "${start}" is not a date written YYYY-MM-DD`;
  const out: Args = { file: files[0], athlete, start, json };
  const days = opts.get("days");
  if (days !== undefined) {
    const list = days.split(",").map((d) => d.trim().toLowerCase().slice(0, 3));
    const bad = days.split(",").find((d, i) => !(WEEKDAYS as readonly string[]).includes(list[i]) || !/^[a-z]+$/i.test(d.trim()));
    if (bad !== undefined) return `--days: "${bad.trim()}" is not a weekday (use mon,tue,wed,thu,fri,sat,sun)`;
    out.days = list as Weekday[];
  }
  const weeks = opts.get("weeks");
  if (weeks !== undefined) {
    if (!/^\d+$/.test(weeks) || Number(weeks) < 1) return `--weeks: "${weeks}" is not a whole number of weeks`;
    out.weeks = Number(weeks);
  }
  return out;
}

export async function readText(file: string): Promise<string | null> {
  try {
    return await readFile(file, "utf8");
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    const why = code === "ENOENT" ? "no such file" : code === "EISDIR" ? "is a directory" : code === "EACCES" ? "permission denied" : "cannot be read";
    console.error(`${file}: ${why}`);
    return null;
  }
}

export async function loadProfile(file: string): Promise<AthleteProfile | null> {
  const text = await readText(file);
  if (text === null) return null;
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (e) {
    console.error(`${file}: not valid JSON (${e instanceof Error ? e.message : String(e)})`);
    return null;
  }
  const r = parseAthleteProfile(json);
  if (!r.ok) {
    for (const err of r.errors) console.error(`${file}: ${err}`);
    return null;
  }
  return r.profile;
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

function diagnosticLine(file: string, d: ExpandDiagnostic): string {
  return `${file}${d.line !== null ? `:${d.line}:1` : ""}: ${d.severity}: ${d.message}`;
}

export async function run(argv: string[]): Promise<number> {
  const args = parseArgs(argv);
  if (typeof args === "string") {
    console.error(`iq expand: ${args}\n${USAGE}`);
    return 2;
  }
  const source = await readText(args.file);
  if (source === null) return 2;
  const athlete = await loadProfile(args.athlete);
  if (athlete === null) return 2;

  const { programme, diagnostics } = parseProgramme(source);
  for (const d of diagnostics) console.error(`${args.file}:${d.line}:${d.column}: ${d.severity}: ${d.message}`);
  if (diagnostics.some((d) => d.severity === "error")) return 1;

  const result = expandProgramme(programme, athlete, { start: args.start, days: args.days, weeks: args.weeks });
  for (const d of result.diagnostics) console.error(diagnosticLine(args.file, d));
  const text = args.json
    ? JSON.stringify({ athlete: athlete.name, units: athlete.units, sessions: result.sessions, diagnostics: result.diagnostics }, null, 2)
    : formatTable(result.sessions, athlete);
  await print(text);
  return result.diagnostics.some((d) => d.severity === "error") ? 1 : 0;
}
