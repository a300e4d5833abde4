/**
 * One max as a person enters it — in a form or on a line of a CSV file — checked
 * field by field. Every problem names its field (exercise, value, unit, date,
 * kind, source, note) so the form or the import preview can mark it.
 *
 * @example
 * const r = checkMax({ exercise: "squat", value: "142.5", unit: "kg", date: "2027-01-04" }, resolve, { latestDate: "2027-01-05" });
 * r.ok && r.max.exerciseKey; // "back-squat"
 */
import { isDateString } from "../dates/date";
import { type ExerciseResolver, unknownExerciseMessage } from "./exerciseMatch";

export type MaxKind = "1rm" | "tm";
export type MaxSource = "tested" | "estimated" | "logs";
export type MassUnit = "kg" | "lb";

export const MAX_FIELDS = ["exercise", "value", "unit", "date", "kind", "source", "note"] as const;
export type MaxField = (typeof MAX_FIELDS)[number];

/** What arrives: text from a file or form, or numbers from JSON; empty optional fields take their defaults. */
export type MaxDraft = {
  exercise?: unknown;
  value?: unknown;
  unit?: unknown;
  date?: unknown;
  kind?: unknown;
  source?: unknown;
  note?: unknown;
};

/** A max ready to store: the exercise under its own name, with the key maxes are looked up by. */
export type CheckedMax = {
  exercise: string;
  exerciseKey: string;
  value: number;
  unit: MassUnit;
  date: string;
  kind: MaxKind;
  source: MaxSource;
  note: string | null;
};

export type MaxCheck = { ok: true; max: CheckedMax } | { ok: false; errors: Partial<Record<MaxField, string>>; suggestions: string[] };

export type MaxRules = {
  /** Dates after this are refused as in the future. */
  latestDate: string;
};

/** The same limits the athlete_maxes table checks, so bad input is refused with a message before the database can refuse it with an error. */
export const MAX_VALUE = 10_000;
export const EXERCISE_MAX_CHARS = 80;
export const NOTE_MAX_CHARS = 500;
/** Older than this is almost certainly a typo in the year. */
export const EARLIEST_DATE = "1950-01-01";

const UNITS: Record<string, MassUnit> = { kg: "kg", kgs: "kg", lb: "lb", lbs: "lb" };
const KINDS: Record<string, MaxKind> = { "1rm": "1rm", tm: "tm" };
const SOURCES: Record<string, MaxSource> = { tested: "tested", estimated: "estimated", logs: "logs" };

/** Trimmed text; null when the value is neither text nor a number (a JSON object, say). */
function text(v: unknown): string | null {
  if (v === undefined || v === null) return "";
  return typeof v === "string" ? v.trim() : typeof v === "number" && Number.isFinite(v) ? String(v) : null;
}

/** "142.5", "142,5" (a decimal comma, as spreadsheets in many locales write it) or a JSON number. */
function parseValue(v: unknown): { value: number } | { error: string } {
  if (typeof v === "number") {
    if (!Number.isFinite(v)) return { error: "must be a number" };
    return checkRange(v);
  }
  const s = text(v);
  if (s === null) return { error: "must be a number" };
  if (s === "") return { error: "enter the max, e.g. 142.5" };
  if (/^\d+(\.\d+)?\s*(kg|kgs|lb|lbs)$/i.test(s)) return { error: `“${s}” is not a plain number; put the unit in the unit column` };
  const normal = /^\d+,\d+$/.test(s) ? s.replace(",", ".") : s;
  if (!/^\d+(\.\d+)?$/.test(normal)) return { error: `“${s}” is not a number` };
  return checkRange(Number(normal));
}

function checkRange(n: number): { value: number } | { error: string } {
  if (n <= 0) return { error: "must be greater than 0" };
  if (n > MAX_VALUE) return { error: `must be at most ${MAX_VALUE}` };
  // Three decimals is finer than any plate; more is a paste accident.
  if (Math.abs(n * 1000 - Math.round(n * 1000)) > 1e-6) return { error: "use at most three decimals" };
  return { value: n };
}

function pick<T>(table: Record<string, T>, raw: unknown, fallback: T | null, expected: string): { value: T } | { error: string } {
  const s = text(raw);
  if (s === null) return { error: `expected ${expected}` };
  if (s === "") return fallback === null ? { error: `enter ${expected}` } : { value: fallback };
  const hit = table[s.toLowerCase()];
  return hit === undefined ? { error: `“${s}” is not one of ${expected}` } : { value: hit };
}

/**
 * Checks one max. Kind defaults to 1rm and source to tested; the unit has no
 * default, because a number without its unit is a 2.2× mistake waiting to happen.
 */
export function checkMax(draft: MaxDraft, resolve: ExerciseResolver, rules: MaxRules): MaxCheck {
  const errors: Partial<Record<MaxField, string>> = {};
  let suggestions: string[] = [];

  const name = text(draft.exercise);
  let exercise = "";
  let exerciseKey = "";
  if (name === null) errors.exercise = "expected the exercise's name as text";
  else if (name === "") errors.exercise = "enter the exercise";
  else if (name.length > EXERCISE_MAX_CHARS) errors.exercise = `keep the name to ${EXERCISE_MAX_CHARS} characters`;
  else {
    const m = resolve(name);
    if (m.ok) ({ exercise, key: exerciseKey } = m);
    else {
      suggestions = m.suggestions;
      errors.exercise = unknownExerciseMessage(name, m.suggestions);
    }
  }

  const value = parseValue(draft.value);
  if ("error" in value) errors.value = value.error;
  const unit = pick(UNITS, draft.unit, null, "kg or lb");
  if ("error" in unit) errors.unit = unit.error;
  const kind = pick(KINDS, draft.kind, "1rm", "1rm (a one-rep max) or tm (a training max)");
  if ("error" in kind) errors.kind = kind.error;
  const source = pick(SOURCES, draft.source, "tested", "tested, estimated or logs");
  if ("error" in source) errors.source = source.error;

  const date = text(draft.date);
  if (date === null) errors.date = "expected a date written YYYY-MM-DD";
  else if (date === "") errors.date = "enter the day it was measured, as YYYY-MM-DD";
  else if (!isDateString(date)) errors.date = `“${date}” is not a date written YYYY-MM-DD`;
  else if (date > rules.latestDate) errors.date = `${date} is in the future; enter the day it was measured`;
  else if (date < EARLIEST_DATE) errors.date = `${date} is before ${EARLIEST_DATE.slice(0, 4)}; check the year`;

  const note = text(draft.note);
  if (note === null) errors.note = "expected text";
  else if (note.length > NOTE_MAX_CHARS) errors.note = `keep the note to ${NOTE_MAX_CHARS} characters`;

  if (Object.keys(errors).length > 0 || "error" in value || "error" in unit || "error" in kind || "error" in source || date === null || note === null) {
    return { ok: false, errors, suggestions };
  }
  return {
    ok: true,
    max: { exercise, exerciseKey, value: value.value, unit: unit.value, date, kind: kind.value, source: source.value, note: note === "" ? null : note },
  };
}
