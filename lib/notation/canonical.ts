/**
 * Canonical spelling of single tokens, used by the formatter. Each function
 * returns the raw text unchanged when the token is not valid, so formatting
 * never alters what an invalid token means (it stays reported as it was).
 *
 * @example
 * canonicalToken("Intensity", "Exercise", "@RPE8.50"); // "@rpe8.5"
 */
import { WEEKDAY_SPELLINGS } from "../../grammar/tokens.js";
import {
  durationText, readCue, readBodyweight, readDeloadWeek, readDuration, readIntensity, readMass, readProgression, readRamp, readSetsReps, readWeeks,
  type Read,
} from "./values";
import type { Mass } from "./model";

/** Number text without trailing zeros; raw text when the number would print in exponent form. */
function num(n: number, raw: string): string {
  const s = String(n);
  return s.includes("e") ? raw : s;
}

const mass = (m: Mass): string => `${num(m.value, "")}${m.unit}`;

function valid<T>(read: Read<T>): T | null {
  return read.problems.some((p) => p.severity === "error") ? null : read.value;
}

const KEYWORDS: Record<string, string> = {
  BlockKw: "block", DayKw: "day", WarmupKw: "warmup", DeloadKw: "deload", RampKw: "ramp", PauseKw: "pause",
  TempoKw: "tempo", RestKw: "rest", RotateKw: "rotate", OrKw: "or",
};

function setsReps(raw: string): string {
  const v = valid(readSetsReps(raw));
  if (!v) return raw.replace(/[X×]/, "x");
  if (v.reps.kind === "time") {
    const s = v.reps.seconds;
    const t = s >= 60 && s % 60 === 0 ? `${s / 60}m` : `${num(s, "")}s`;
    return t.includes("e") ? raw : `${v.sets}x${t}`;
  }
  const r = v.reps;
  return `${v.sets}x${r.min}${r.max !== r.min ? `-${r.max}` : ""}${r.amrap ? "+" : ""}`;
}

function intensity(raw: string): string {
  const v = valid(readIntensity(raw));
  if (!v) return raw;
  const n = num(v.value, "");
  if (!n) return raw;
  return v.kind === "percent" ? `@${n}%` : v.kind === "rir" ? `@${n}rir` : `@rpe${n}`;
}

function quantity(parent: string, raw: string): string {
  switch (parent) {
    case "Load": {
      const m = valid(readMass(raw));
      return m && num(m.value, "") ? mass(m) : raw;
    }
    case "Pause":
    case "Rest": {
      const s = valid(readDuration(raw, parent));
      return s !== null && !String(s).includes("e") ? durationText(s) : raw;
    }
    case "Tempo":
      return /^[0-9x]{4}$/i.test(raw) ? raw.toLowerCase() : raw;
  }
  return raw;
}

function other(name: string, raw: string): string {
  switch (name) {
    case "Bodyweight": {
      const b = valid(readBodyweight(raw));
      if (!b || b.kind !== "bodyweight") return raw;
      return b.plus ? (num(b.plus.value, "") ? `bw+${mass(b.plus)}` : raw) : "bw";
    }
    case "RampSteps": {
      const steps = valid(readRamp(raw));
      if (!steps || steps.some((s) => String(s.percent).includes("e"))) return raw;
      return `${steps.map((s) => `${s.percent}${s.reps !== null ? `x${s.reps}` : ""}`).join("/")}%`;
    }
    case "Progression": {
      const p = valid(readProgression(raw));
      if (!p) return raw;
      const amount = p.kind === "load" ? mass(p.mass) : p.kind === "percent" ? `${num(p.value, "")}%` : `${p.value}rep`;
      return amount.startsWith("e") || amount.includes("e+") ? raw : `+${amount}/wk`;
    }
    case "Weeks": {
      const w = valid(readWeeks(raw, "weeks"));
      return w !== null && !String(w).includes("e") ? `${w}w` : raw;
    }
    case "DeloadWeek": {
      const w = valid(readDeloadWeek(raw));
      return w !== null && !String(w).includes("e") ? `w${w}` : raw;
    }
    case "Weekday":
      return (WEEKDAY_SPELLINGS as Record<string, string>)[raw.toLowerCase()] ?? raw;
    case "Label":
      return raw.toUpperCase();
  }
  return raw;
}

// Only the characters the notation itself skips; other Unicode spaces can be part of a word.
const SPACE_RUNS = /[ \t\r\u00a0]+/g;

/**
 * A name token's words joined by single spaces, however the source spaced them.
 *
 * @example
 * singleSpaced("bench \t press"); // "bench press"
 */
export function singleSpaced(raw: string): string {
  // Most names are already single-spaced: check before building a new string (this runs per keystroke).
  for (let i = 0; i < raw.length; i++) {
    const ch = raw.charCodeAt(i);
    if (ch === 9 || ch === 13 || ch === 0xa0 || (ch === 32 && raw.charCodeAt(i + 1) === 32)) return raw.replace(SPACE_RUNS, " ");
  }
  return raw;
}

/** Canonical text of a token named `name` whose parent node is `parent`. */
export function canonicalToken(name: string, parent: string, raw: string): string {
  if (KEYWORDS[name]) return KEYWORDS[name];
  switch (name) {
    case "ExerciseName":
    case "DayName":
    case "BlockName":
      return singleSpaced(raw);
    case "SetsReps":
      return setsReps(raw);
    case "Intensity":
      return intensity(raw);
    case "Quantity":
      return quantity(parent, raw);
    case "Cue": {
      const cue = readCue(raw);
      return cue.closed ? `"${cue.text}"` : raw.trimEnd();
    }
  }
  return other(name, raw);
}

/** Canonical `key: value` for a settings line. */
export function canonicalSetting(key: string, value: string): string {
  const v = value.trim();
  const low = v.toLowerCase();
  if (key === "units" && (low === "kg" || low === "lb")) return low;
  if (key === "model" && /^(brzycki|epley|nsca)$/.test(low)) return low;
  if (key === "round" && /^\d+(\.\d+)?$/.test(v)) return num(Number(v), v);
  return v;
}
