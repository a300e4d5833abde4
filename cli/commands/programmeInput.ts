/**
 * What `iq expand` and `iq cards` both read: a programme FILE worked out for one athlete
 * (`--athlete PROFILE.json --start YYYY-MM-DD [--days mon,wed,fri]`), each command adding
 * options of its own. Problems are printed the way every `iq` command prints them and
 * end in the exit code to stop with.
 *
 * @example
 * const parsed = parseProgrammeOptions(["p.iq", "--athlete", "a.json", "--start", "2027-01-04", "--json"], ["weeks"], ["json"]);
 * // { base: { file: "p.iq", athlete: "a.json", start: "2027-01-04" }, opts: Map {…}, flags: Set { "json" } }
 * const input = await readProgrammeFor("p.iq", "a.json"); // { programme, athlete }, or an exit code
 */
import { parseAthleteProfile, type AthleteProfile } from "../../lib/athlete/profile";
import { isDateString } from "../../lib/dates/date";
import type { ExpandDiagnostic } from "../../lib/load/index";
import { parseProgramme } from "../../lib/notation/index";
import { WEEKDAYS, type Programme, type Weekday } from "../../lib/notation/model";
import { readSource } from "./check";

export interface ProgrammeArgs {
  file: string;
  athlete: string;
  start: string;
}

/**
 * Splits the command line into the one FILE, `--key value` / `--key=value` options
 * (the shared ones and `extra`) and bare `flags`, and checks FILE, --athlete and --start.
 * The command checks its own options from `opts`; a string is the one-line reason the
 * command line is wrong.
 */
export function parseProgrammeOptions(
  argv: string[],
  extra: string[],
  flags: string[] = [],
): { base: ProgrammeArgs; opts: Map<string, string>; flags: Set<string> } | string {
  const known = ["athlete", "start", "days", ...extra];
  const files: string[] = [];
  const opts = new Map<string, string>();
  const set = new Set<string>();
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    if (a.startsWith("--") && flags.includes(a.slice(2))) set.add(a.slice(2));
    else if (a.startsWith("--")) {
      const eq = a.indexOf("=");
      const key = eq > 0 ? a.slice(2, eq) : a.slice(2);
      if (!known.includes(key)) return `unknown option --${key}`;
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
  return { base: { file: files[0], athlete, start }, opts, flags: set };
}

/** `--days mon,Thu,friday` → ["mon", "thu", "fri"]; a string names the first day that is not one. */
export function parseDays(value: string): Weekday[] | string {
  const list = value.split(",").map((d) => d.trim().toLowerCase().slice(0, 3));
  const bad = value.split(",").find((d, i) => !(WEEKDAYS as readonly string[]).includes(list[i]) || !/^[a-z]+$/i.test(d.trim()));
  if (bad !== undefined) return `--days: "${bad.trim()}" is not a weekday (use mon,tue,wed,thu,fri,sat,sun)`;
  return list as Weekday[];
}

/** A readable athlete profile, or null after printing why not (FILE: reason). */
export async function loadProfile(file: string): Promise<AthleteProfile | null> {
  const text = await readSource(file);
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

/**
 * The programme and the athlete's profile, with the notation's diagnostics printed as
 * FILE:LINE:COL; a number is the exit code to stop with (2 unreadable, 1 notation errors).
 */
export async function readProgrammeFor(file: string, profileFile: string): Promise<{ programme: Programme; athlete: AthleteProfile } | number> {
  const source = await readSource(file);
  if (source === null) return 2;
  const athlete = await loadProfile(profileFile);
  if (athlete === null) return 2;
  const { programme, diagnostics } = parseProgramme(source);
  for (const d of diagnostics) console.error(`${file}:${d.line}:${d.column}: ${d.severity}: ${d.message}`);
  if (diagnostics.some((d) => d.severity === "error")) return 1;
  return { programme, athlete };
}

/** An expansion problem as FILE[:LINE:1]: severity: message. */
export function diagnosticLine(file: string, d: ExpandDiagnostic): string {
  return `${file}${d.line !== null ? `:${d.line}:1` : ""}: ${d.severity}: ${d.message}`;
}
