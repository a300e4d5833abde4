/**
 * Readers for the small value tokens of the notation (`3x6-8`, `@rpe8.5`, `80kg`,
 * `2m30s`, `50x8/70x5/85x2%`, `+2.5kg/wk`…). Each reader returns the value it could
 * make out and any problems, positioned relative to the start of the token, so the
 * caller can turn them into diagnostics without re-scanning the text.
 *
 * @example
 * readSetsReps("4x8-6").problems[0].message; // "rep range 8-6 runs backwards"
 */
import type { Intensity, Load, Mass, Progression, RampStep, Reps, Severity, Unit } from "./model";
import { didYouMean } from "./suggest";

export interface Problem {
  offset: number;
  length: number;
  severity: Severity;
  message: string;
}
export interface Read<T> {
  value: T | null;
  problems: Problem[];
}

const NUMBER = /^\d+(?:\.\d+)?$/;
const MASS_UNITS = ["kg", "lb"] as const;
const TIME_UNITS: Record<string, number> = {
  s: 1, sec: 1, secs: 1, second: 1, seconds: 1,
  m: 60, min: 60, mins: 60, minute: 60, minutes: 60,
};
const WEEK_UNITS = new Set(["w", "wk", "wks", "week", "weeks"]);

function fail<T>(offset: number, length: number, message: string, severity: Severity = "error"): Read<T> {
  return { value: null, problems: [{ offset, length, severity, message }] };
}
const err = (offset: number, length: number, message: string): Problem => ({ offset, length, severity: "error", message });
const warn = (offset: number, length: number, message: string): Problem => ({ offset, length, severity: "warning", message });

/** Canonical number text: `2.50` → `2.5`, `08` → `8`. */
export function numberText(n: number): string {
  return String(n);
}

/** `80kg`, `175lb` (case-insensitive). `what` names the thing for messages. */
export function readMass(text: string, what = "load", offset = 0): Read<Mass> {
  const m = /^(\d+(?:\.\d+)?)(.*)$/.exec(text);
  if (!m) return fail(offset, text.length, `can't read ${what} '${text}' — write it like 80kg or 175lb`);
  const value = Number(m[1]);
  const unit = m[2].toLowerCase();
  const unitAt = offset + m[1].length;
  if (unit === "") return fail(offset, text.length, `${what} ${m[1]} needs a unit: ${m[1]}kg or ${m[1]}lb`);
  if (unit === "%") return fail(offset, text.length, `a share of 1RM is written with @: @${m[1]}%`);
  if (unit !== "kg" && unit !== "lb") {
    const hint = didYouMean(unit, MASS_UNITS) || " — use kg or lb";
    return fail(unitAt, m[2].length, `unknown unit '${m[2]}'${hint}`);
  }
  if (value === 0) return fail(offset, text.length, `a ${what} of 0 ${unit} — leave the ${what} out instead`);
  return { value: { value, unit: unit as Unit }, problems: [] };
}

/** `30s`, `2m`, `2m30s`, `1.5min`, `2:30`. Result in seconds. */
export function readDuration(text: string, what: string, offset = 0): Read<number> {
  const clock = /^(\d+):([0-5]\d)$/.exec(text);
  if (clock) return { value: Number(clock[1]) * 60 + Number(clock[2]), problems: [] };
  const parts = /^(\d+(?:\.\d+)?)([a-z]*)(?:(\d+(?:\.\d+)?)([a-z]*))?$/i.exec(text);
  if (!parts) return fail(offset, text.length, `can't read ${what} '${text}' — write it like 90s, 2m or 2m30s`);
  if (parts[2] === "") return fail(offset, text.length, `${what} ${parts[1]} needs a unit: ${parts[1]}s or ${parts[1]}m`);
  let seconds = 0;
  let at = offset;
  for (const [num, unit] of [[parts[1], parts[2]], [parts[3], parts[4]]] as const) {
    if (num === undefined) break;
    const factor = TIME_UNITS[unit.toLowerCase()];
    if (factor === undefined) {
      const hint = didYouMean(unit.toLowerCase(), ["s", "m", "min", "sec"]) || " — use s or m";
      return fail(at + num.length, unit.length, `unknown unit '${unit}'${hint}`);
    }
    seconds += Number(num) * factor;
    at += num.length + unit.length;
  }
  if (seconds === 0) return fail(offset, text.length, `${what} of 0 seconds — leave it out instead`);
  return { value: seconds, problems: [] };
}

/** Canonical duration text: whole minutes as `3m`, up to two minutes in seconds (`90s`), else `2m30s`. */
export function durationText(seconds: number): string {
  if (!Number.isInteger(seconds) || (seconds <= 120 && seconds % 60 !== 0)) return `${numberText(seconds)}s`;
  const m = Math.floor(seconds / 60);
  const s = seconds % 60;
  return s === 0 ? `${m}m` : `${m}m${s}s`;
}

/** `3x5`, `4x6-8`, `3x10+`, `3x30s`. */
export function readSetsReps(text: string): Read<{ sets: number; reps: Reps }> {
  const m = /^(\d+)[x×](.*)$/i.exec(text);
  if (!m) return fail(0, text.length, `can't read '${text}' — write sets×reps like 3x8, 3x6-8, 3x10+ or 3x30s`);
  const sets = Number(m[1]);
  const rest = m[2];
  const at = m[1].length + 1;
  const problems: Problem[] = [];
  if (sets === 0) problems.push(err(0, m[1].length, "0 sets — an exercise needs at least 1 set"));
  else if (sets > 20) problems.push(warn(0, m[1].length, `${sets} sets is unusually many — check the number`));
  const range = /^(\d+)(?:-(\d+))?(\+)?$/.exec(rest);
  if (range) {
    const min = Number(range[1]);
    const max = range[2] === undefined ? min : Number(range[2]);
    if (min === 0 || max === 0) problems.push(err(at, rest.length, "0 reps — a set needs at least 1 rep"));
    else if (max < min) problems.push(err(at, rest.length, `rep range ${min}-${max} runs backwards`));
    else if (max > 100) problems.push(warn(at, rest.length, `${max} reps is unusually many — check the number`));
    return { value: { sets, reps: { kind: "reps", min, max, amrap: range[3] === "+" } }, problems };
  }
  const timed = /^(\d+(?:\.\d+)?)([a-z]+)$/i.exec(rest);
  if (timed) {
    const seconds = readDuration(rest, "a timed set", at);
    if (seconds.value === null) {
      const unit = timed[2].toLowerCase();
      if (MASS_UNITS.includes(unit as Unit))
        return fail(at, rest.length, `'${rest}' is a load — write the load after the sets, e.g. ${m[1]}x${timed[1]} ${rest}`);
      return { value: null, problems: [...problems, ...seconds.problems] };
    }
    return { value: { sets, reps: { kind: "time", seconds: seconds.value } }, problems };
  }
  return fail(at, rest.length, `can't read reps '${rest}' — write 8, 6-8, 10+ or a time like 30s`);
}

/** `@75%`, `@2rir`, `@rpe8`, `@rpe8.5`. */
export function readIntensity(text: string): Read<Intensity> {
  const body = text.slice(1).toLowerCase();
  const len = text.length;
  const pct = /^(\d+(?:\.\d+)?)%$/.exec(body);
  if (pct) {
    const value = Number(pct[1]);
    if (value === 0) return fail(0, len, "@0% — a share of 1RM must be above 0");
    if (value > 110) return fail(0, len, `@${pct[1]}% is over 110% of 1RM — check the number`);
    return { value: { kind: "percent", value }, problems: [] };
  }
  const rir = /^(\d+(?:\.\d+)?)rir$/.exec(body);
  if (rir) {
    const value = Number(rir[1]);
    if (value > 10) return fail(0, len, `${rir[1]} reps in reserve is more than 10 — use a load or a lower RIR`);
    return { value: { kind: "rir", value }, problems: [] };
  }
  const rpe = /^rpe(\d+(?:\.\d+)?)$/.exec(body);
  if (rpe) {
    const value = Number(rpe[1]);
    if (value < 1 || value > 10) return fail(0, len, `RPE ${rpe[1]} is outside the 1–10 scale`);
    const problems: Problem[] = [];
    if (value < 5) problems.push(warn(0, len, `RPE ${rpe[1]} is very light — effort scales are usually used from 5 to 10`));
    if (!Number.isInteger(value * 2)) problems.push(warn(0, len, `RPE is rated in half points — ${rpe[1]} will be read as is`));
    return { value: { kind: "rpe", value }, problems };
  }
  const flipped = /^(\d+(?:\.\d+)?)rpe$/.exec(body);
  if (flipped) return fail(0, len, `write RPE with the number last: @rpe${flipped[1]}`);
  if (NUMBER.test(body)) return fail(0, len, `@${body}: add % for a share of 1RM (@${body}%), or write @2rir / @rpe8`);
  if (body === "") return fail(0, len, "write the intensity right after @, e.g. @75%, @2rir or @rpe8");
  return fail(0, len, `can't read intensity '${text}' — write @75%, @2rir or @rpe8`);
}

/** `bw`, `bw+10kg`. */
export function readBodyweight(text: string): Read<Load> {
  if (text.length <= 2) return { value: { kind: "bodyweight", plus: null }, problems: [] };
  const plus = readMass(text.slice(3), "added load", 3);
  if (plus.value === null) return { value: null, problems: plus.problems };
  return { value: { kind: "bodyweight", plus: plus.value }, problems: [] };
}

/** Tempo: four characters, each a digit or `x` (explosive). Stored lower-case. */
export function readTempo(text: string): Read<string> {
  if (/^[0-9x]{4}$/i.test(text)) return { value: text.toLowerCase(), problems: [] };
  return fail(0, text.length, `tempo '${text}' needs four digits (lowering, pause, lifting, pause), e.g. 3110; x means explosive`);
}

/** `4w`, `6weeks`: a whole number of weeks, at least 1. */
export function readWeeks(text: string, what: string): Read<number> {
  const m = /^(\d+)([a-z]*)$/i.exec(text);
  if (!m || !WEEK_UNITS.has(m[2].toLowerCase())) {
    const n = m ? m[1] : "4";
    return fail(0, text.length, `${what} is counted in weeks: write ${n}w`);
  }
  const n = Number(m[1]);
  if (n === 0) return fail(0, text.length, `${what} of 0 weeks — it needs at least 1`);
  return { value: n, problems: [] };
}

/** `w4` in a deload list. */
export function readDeloadWeek(text: string): Read<number> {
  const n = Number(text.slice(1));
  if (n === 0) return fail(0, text.length, "weeks are counted from w1");
  return { value: n, problems: [] };
}

/** `60/75/90%` or with reps per step `50x8/70x5/85x2%`; `%` may close the list or follow each step. */
export function readRamp(text: string): Read<RampStep[]> {
  const steps: RampStep[] = [];
  const problems: Problem[] = [];
  let at = 0;
  const pieces = text.split("/");
  for (let i = 0; i < pieces.length; i++) {
    const piece = pieces[i];
    const m = /^(\d+(?:\.\d+)?)%?(?:[x×](\d+))?%?$/i.exec(piece);
    if (!m) return fail(at, Math.max(piece.length, 1), `can't read warm-up step '${piece}' — write steps like 60/75/90% or 50x8/70x5/85x2%`);
    const percent = Number(m[1]);
    const reps = m[2] === undefined ? null : Number(m[2]);
    if (percent === 0 || percent >= 100) problems.push(err(at, piece.length, `warm-up step ${m[1]}% must be between 0 and 100% of the working load`));
    if (reps === 0) problems.push(err(at, piece.length, "a warm-up step needs at least 1 rep"));
    if (steps.length > 0 && percent <= steps[steps.length - 1].percent)
      problems.push(warn(at, piece.length, `warm-up steps should rise: ${m[1]}% after ${steps[steps.length - 1].percent}%`));
    steps.push({ percent, reps });
    at += piece.length + 1;
  }
  return { value: steps, problems };
}

/** `+2.5kg/wk`, `+5%/wk`, `+1rep/wk`. */
export function readProgression(text: string): Read<Progression> {
  const m = /^\+(\d+(?:\.\d+)?)?([a-z%]*)(?:\/(.*))?$/i.exec(text);
  const shape = "write a weekly step like +2.5kg/wk, +5%/wk or +1rep/wk";
  if (!m || m[1] === undefined) return fail(0, text.length, `can't read progression '${text}' — ${shape}`);
  const amount = Number(m[1]);
  const unit = m[2].toLowerCase();
  const unitAt = 1 + m[1].length;
  if (m[3] === undefined) return fail(0, text.length, `progression '${text}' needs a period: ${text}/wk`);
  if (!WEEK_UNITS.has(m[3].toLowerCase()))
    return fail(unitAt + m[2].length + 1, m[3].length, `progressions are per week: write /wk instead of /${m[3]}`);
  if (amount === 0) return fail(0, text.length, "a progression of 0 changes nothing — leave it out");
  if (unit === "kg" || unit === "lb") return { value: { kind: "load", mass: { value: amount, unit } }, problems: [] };
  if (unit === "%") return { value: { kind: "percent", value: amount }, problems: [] };
  if (unit === "rep" || unit === "reps") {
    if (!Number.isInteger(amount)) return fail(1, m[1].length, "reps grow by whole numbers");
    return { value: { kind: "reps", value: amount }, problems: [] };
  }
  if (unit === "") return fail(0, text.length, `progression +${m[1]} needs a unit: kg, lb, % or rep`);
  const hint = didYouMean(unit, ["kg", "lb", "%", "rep"]) || " — use kg, lb, % or rep";
  return fail(unitAt, m[2].length, `unknown unit '${m[2]}'${hint}`);
}

/** A quoted cue: `"text"` or with typographic quotes `“text”`; the closing quote may be missing. */
export function readCue(raw: string): { text: string; closed: boolean } {
  const closed = raw.length >= 2 && (raw.startsWith('"') ? raw.endsWith('"') : /["”]$/.test(raw));
  return { text: raw.slice(1, closed ? -1 : undefined).trim(), closed };
}
