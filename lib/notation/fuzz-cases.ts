/**
 * Generated programmes for property tests and `npm run fuzz`: plausible lines
 * built from the notation's pieces, then optionally mutated character by character,
 * and the invariants every input must keep.
 *
 * @example
 * fc.assert(fc.property(programmeText(), (src) => checkInvariants(src) === null));
 */
import fc from "fast-check";
import { formatProgramme } from "./format";
import { parseProgramme } from "./index";
import { programmeSchema, type Programme } from "./model";
import { SourceText } from "./source";

const word = fc.constantFrom("bench", "press", "squat", "row", "pull-up", "45-degree", "pause", "rest", "or", "Day", "block", "mon", "a1", "bw", "ramp", "w4", "é", "constructor", "__proto__");
const num = fc.constantFrom("0", "1", "2", "3", "5", "8", "10", "2.5", "75", "110", "111", "007");
const name = fc.array(word, { minLength: 1, maxLength: 3 }).map((w) => w.join(" "));

const setsReps = fc.oneof(
  fc.tuple(num, num).map(([s, r]) => `${s}x${r}`),
  fc.tuple(num, num, num).map(([s, a, b]) => `${s}x${a}-${b}`),
  fc.tuple(num, num).map(([s, r]) => `${s}X${r}+`),
  fc.tuple(num, num, fc.constantFrom("s", "m", "sec", "kg", "q")).map(([s, r, u]) => `${s}x${r}${u}`),
);
const option = fc.oneof(
  fc.tuple(num, fc.constantFrom("%", "rir", "RIR", "", "rpe")).map(([n, u]) => `@${n}${u}`),
  num.map((n) => `@rpe${n}`),
  fc.tuple(num, fc.constantFrom("kg", "lb", "kgs", "", "%", "LB")).map(([n, u]) => `${n}${u}`),
  fc.constantFrom("bw", "bw+10kg", "BW+5", "bw+2.5lb"),
  fc.array(fc.tuple(num, fc.option(num)), { minLength: 1, maxLength: 4 }).map((s) => `ramp ${s.map(([p, r]) => (r ? `${p}x${r}` : p)).join("/")}%`),
  fc.tuple(fc.constantFrom("pause", "rest"), num, fc.constantFrom("s", "m", "min", "", "h")).map(([k, n, u]) => `${k} ${n}${u}`),
  fc.constantFrom("rest 2:30", "rest 2m30s", "tempo 3110", "tempo 31x0", "tempo 311", "rotate 2w", "rotate 0w", "rotate 3"),
  fc.tuple(num, fc.constantFrom("kg", "%", "rep", "reps", "lb", "kgs")).map(([n, u]) => `+${n}${u}/wk`),
  fc.constantFrom("+1rep", "+2.5kg/mo"),
  fc.array(name, { minLength: 1, maxLength: 3 }).map((n) => `or ${n.join(", ")}`),
  fc.constantFrom('"keep the back flat"', "“smart”", '"unclosed', '"a # b"'),
);
const exercise = fc.tuple(
  fc.option(fc.constantFrom("A1", "b2", "C3")),
  fc.oneof({ weight: 4, arbitrary: name }, { weight: 1, arbitrary: fc.array(name, { minLength: 1, maxLength: 3 }).map((v) => `{${v.join(" | ")}}`) }),
  setsReps,
  fc.array(option, { maxLength: 5 }),
  fc.constantFrom("", "", "  ", "\t"),
).map(([l, n, s, o, indent]) => `${indent}${l ? `${l} ` : ""}${n} ${s}${o.length ? ` ${o.join(" ")}` : ""}`);

const line = fc.oneof(
  { weight: 8, arbitrary: exercise },
  { weight: 2, arbitrary: fc.tuple(name, fc.option(fc.constantFrom("mon", "Tue", "thursday", "sun"))).map(([n, d]) => `day ${n}${d ? ` ${d}` : ""}`) },
  { weight: 1, arbitrary: fc.tuple(name, num, fc.constantFrom("w", "weeks", ""), fc.constantFrom("", " deload w4", " deload w1, w9", " deload w2 w2")).map(([n, w, u, d]) => `block ${n} ${w}${u}${d}`) },
  { weight: 1, arbitrary: fc.tuple(fc.constantFrom("title", "units", "round", "model", "weeks", "level", "colour", "Title", "__proto__"), fc.constantFrom("kg", "lb", "kgs", "2.5", "brzycki", "epley", "nsca", "x", "4", "")).map(([k, v]) => `${k}: ${v}`) },
  { weight: 1, arbitrary: fc.constantFrom('  warmup "bike 5 min"', "warmup bike", "# a comment", "", "   ", "}", "{", "day", "block", "@", "+", ",") },
);

/** A programme made of plausible (often slightly wrong) lines. */
export function programmeText(): fc.Arbitrary<string> {
  return fc.tuple(fc.array(line, { maxLength: 14 }), fc.constantFrom("\n", "\r\n")).map(([lines, nl]) => lines.join(nl));
}

const MUTATION_CHARS = ["x", "@", "%", "-", "+", "/", "{", "}", "|", ",", '"', "“", "#", ":", "\n", " ", "0", "9", "w", "k", "\r", "\t", "\u00a0", "é"];

/** A programme with random characters inserted, deleted or replaced. */
export function mutatedText(): fc.Arbitrary<string> {
  const edit = fc.tuple(fc.nat(), fc.constantFrom("insert", "delete", "replace"), fc.constantFrom(...MUTATION_CHARS));
  return fc.tuple(programmeText(), fc.array(edit, { minLength: 1, maxLength: 6 })).map(([src, edits]) => {
    let s = src;
    for (const [at, kind, ch] of edits) {
      const i = s.length === 0 ? 0 : at % (s.length + 1);
      if (kind === "insert") s = s.slice(0, i) + ch + s.slice(i);
      else if (kind === "delete") s = s.slice(0, i) + s.slice(i + 1);
      else s = s.slice(0, i) + ch + s.slice(i + 1);
    }
    return s;
  });
}

/** The model with line numbers removed: formatting may move lines, never meaning. */
export function withoutLines(p: Programme): unknown {
  return JSON.parse(JSON.stringify(p, (k, v) => (k === "line" ? undefined : v)));
}

function sameJson(a: unknown, b: unknown): boolean {
  return JSON.stringify(a) === JSON.stringify(b);
}

/**
 * Check every invariant for one input; null when all hold, otherwise a description.
 * Invariants: no exception, a model that passes the schema, diagnostics inside the
 * document with consistent line/column, formatting idempotent and meaning-preserving.
 */
export function checkInvariants(src: string): string | null {
  let parsed;
  try {
    parsed = parseProgramme(src);
  } catch (e) {
    return `parseProgramme threw: ${String(e)}`;
  }
  const schema = programmeSchema.safeParse(parsed.programme);
  if (!schema.success) return `model fails its schema: ${schema.error.message}`;
  const text = new SourceText(src);
  for (const d of parsed.diagnostics) {
    if (!(d.from >= 0 && d.from <= d.to && d.to <= src.length && d.length === d.to - d.from)) return `diagnostic out of range: ${JSON.stringify(d)}`;
    const line = text.lineOf(d.from);
    if (d.line !== line || d.column !== d.from - text.lineStarts[line - 1] + 1) return `diagnostic line/column inconsistent: ${JSON.stringify(d)}`;
    if (!d.message) return "diagnostic without message";
  }
  let once: string;
  let twice: string;
  try {
    once = formatProgramme(src);
    twice = formatProgramme(once);
  } catch (e) {
    return `formatProgramme threw: ${String(e)}`;
  }
  if (once !== twice) return `fmt not idempotent:\n${JSON.stringify(once)}\n${JSON.stringify(twice)}`;
  const after = parseProgramme(once).programme;
  if (!sameJson(withoutLines(after), withoutLines(parsed.programme)))
    return `fmt changed the meaning:\n${JSON.stringify(once)}\n${JSON.stringify(withoutLines(parsed.programme))}\n${JSON.stringify(withoutLines(after))}`;
  return null;
}
