/**
 * Maxes from a CSV file: a header line naming the columns, then one max per
 * line. Every line is checked with the same rules as a max typed into the form
 * (./maxEntry.ts), and every problem carries the line of the file it is on and
 * the column at fault. Nothing here writes anything; the caller stores the rows
 * only when the whole file is clean.
 *
 * Columns (any order, case ignored): exercise, value, unit, date — required —
 * and kind, source, note — optional. Commas, semicolons or tabs separate
 * values (RFC 4180 quoting); a UTF-8 byte-order mark is ignored.
 *
 * @example
 * const r = parseMaxesCsv("exercise,value,unit,date\nsquat,140,kg,2027-01-04\n", resolve, { latestDate: "2027-01-10" });
 * r.ok; // true
 * r.rows[0].line; // 2
 * r.rows[0].max?.exerciseKey; // "back-squat"
 */
import Papa from "papaparse";
import type { ExerciseResolver } from "./exerciseMatch";
import { checkMax, type CheckedMax, MAX_FIELDS, type MaxDraft, type MaxField, type MaxRules } from "./maxEntry";

export const CSV_MAX_BYTES = 256 * 1024;
export const CSV_MAX_ROWS = 2_000;
export const CSV_REQUIRED = ["exercise", "value", "unit", "date"] as const;
export const CSV_OPTIONAL = ["kind", "source", "note"] as const;

/** The example offered for download beside the upload; the unit tests keep it importable. */
export const MAXES_CSV_EXAMPLE = [
  "exercise,value,unit,date,kind,source,note",
  "back squat,140,kg,2026-11-20,1rm,tested,meet day",
  "bench press,97.5,kg,2026-11-20,1rm,tested,",
  "deadlift,180,kg,2026-11-20,1rm,tested,",
  "overhead press,57.5,kg,2026-10-02,tm,estimated,from a 5-rep set",
  "",
].join("\n");

/** A problem on one line (`field` is the column) or with the whole file (`line` 0 and `field` "file"). */
export type CsvProblem = { line: number; field: MaxField | "file" | "row"; message: string; suggestions?: string[] };

export type CsvRow = {
  /** The line of the file the row starts on, counting the header as line 1. */
  line: number;
  /** The cells as written, by column. */
  cells: Partial<Record<MaxField, string>>;
  /** The checked max; null when the row has a problem. */
  max: CheckedMax | null;
  problems: CsvProblem[];
};

export type CsvResult = {
  ok: boolean;
  rows: CsvRow[];
  /** Problems with the file as a whole (size, header, too many rows). */
  fileProblems: CsvProblem[];
  /** Every problem, file first, then by line. */
  problems: CsvProblem[];
};

const KNOWN = new Set<string>(MAX_FIELDS);
/** Headers written a little differently that plainly mean a known column. */
const HEADER_ALIASES: Record<string, MaxField> = { units: "unit", weight: "value", max: "value", measured: "date", "measured on": "date", type: "kind", notes: "note" };

function fileProblem(message: string): CsvProblem {
  return { line: 0, field: "file", message };
}

function done(rows: CsvRow[], fileProblems: CsvProblem[]): CsvResult {
  const problems = [...fileProblems, ...rows.flatMap((r) => r.problems)];
  return { ok: problems.length === 0 && rows.length > 0, rows, fileProblems, problems };
}

/** `fatal` when the rows below cannot be read at all (a required column is missing). */
type Header = { columns: (MaxField | null)[]; problems: CsvProblem[]; fatal: boolean };

function readHeader(cells: string[]): Header {
  const problems: CsvProblem[] = [];
  const columns: (MaxField | null)[] = [];
  const seen = new Set<MaxField>();
  for (const raw of cells) {
    const name = raw.trim().toLowerCase().replace(/\s+/g, " ");
    const field = (KNOWN.has(name) ? name : HEADER_ALIASES[name]) as MaxField | undefined;
    if (name === "") columns.push(null);
    else if (!field) {
      problems.push({ line: 1, field: "file", message: `unknown column “${raw.trim()}”; the columns are ${[...CSV_REQUIRED, ...CSV_OPTIONAL].join(", ")}` });
      columns.push(null);
    } else if (seen.has(field)) {
      problems.push({ line: 1, field: "file", message: `the column ${field} appears twice in the header` });
      columns.push(null);
    } else {
      seen.add(field);
      columns.push(field);
    }
  }
  const missing = CSV_REQUIRED.filter((c) => !seen.has(c));
  if (missing.length === 0) return { columns, problems, fatal: false };
  // A first line of numbers is a file without a header; one message says so instead of one per cell.
  if (cells.some((c) => /^\d/.test(c.trim()))) {
    return { columns, problems: [{ line: 1, field: "file", message: `the first line must be the header, e.g. ${CSV_REQUIRED.join(",")}` }], fatal: true };
  }
  problems.push({ line: 1, field: "file", message: `the header is missing the column${missing.length > 1 ? "s" : ""} ${missing.join(", ")}` });
  return { columns, problems, fatal: true };
}

/** Lines start after the previous record's end; blank lines in between are skipped. */
function lineCounter(text: string) {
  let pos = 0;
  let line = 1;
  return (from: number): number => {
    let start = from;
    while (start < text.length && (text[start] === "\n" || text[start] === "\r")) start++;
    for (; pos < start; pos++) if (text[pos] === "\n") line++;
    return line;
  };
}

function isBlank(cells: string[]): boolean {
  return cells.every((c) => c.trim() === "");
}

/**
 * Reads and checks the whole file. `ok` is true only when there is at least
 * one row and no problem anywhere: an import is all or nothing.
 */
export function parseMaxesCsv(input: string, resolve: ExerciseResolver, rules: MaxRules): CsvResult {
  const bytes = new TextEncoder().encode(input).length;
  if (bytes > CSV_MAX_BYTES) {
    return done([], [fileProblem(`the file is ${Math.ceil(bytes / 1024)} KB; the limit is ${CSV_MAX_BYTES / 1024} KB — split it into smaller files`)]);
  }
  const text = input.replace(/^\uFEFF/, "");
  if (text.trim() === "") return done([], [fileProblem(`the file is empty; start with the header line ${CSV_REQUIRED.join(",")}`)]);

  const rows: CsvRow[] = [];
  const fileProblems: CsvProblem[] = [];
  const lineAt = lineCounter(text);
  // Held in an object: the parser's callback fills it in, which flow analysis cannot see through.
  const state: { header: Header | null; previousEnd: number } = { header: null, previousEnd: 0 };

  Papa.parse<string[]>(text, {
    delimitersToGuess: [",", ";", "\t"],
    step: (result, parser) => {
      const start = state.previousEnd;
      state.previousEnd = result.meta.cursor;
      const cells = result.data;
      if (isBlank(cells)) return;
      const line = lineAt(start);
      const header = state.header;
      if (header === null) {
        state.header = readHeader(cells);
        fileProblems.push(...state.header.problems);
        if (state.header.fatal) parser.abort();
        return;
      }
      if (rows.length >= CSV_MAX_ROWS) {
        fileProblems.push(fileProblem(`the file has more than ${CSV_MAX_ROWS.toLocaleString("en")} rows; split it into smaller files`));
        parser.abort();
        return;
      }
      rows.push(checkRow(line, cells, header, result.errors, resolve, rules));
    },
  });

  if (state.header === null) fileProblems.push(fileProblem("the file has no header line"));
  else if (rows.length === 0 && fileProblems.length === 0) fileProblems.push(fileProblem("the file has a header but no maxes below it"));
  return done(rows, fileProblems);
}

function checkRow(line: number, cells: string[], header: Header, parseErrors: Papa.ParseError[], resolve: ExerciseResolver, rules: MaxRules): CsvRow {
  const draft: Record<string, string> = {};
  header.columns.forEach((field, i) => {
    if (field && i < cells.length) draft[field] = cells[i];
  });
  const problems: CsvProblem[] = [];
  for (const e of parseErrors) {
    // A one-column line leaves nothing to guess the separator from; the missing columns are reported instead.
    if (e.code === "UndetectableDelimiter") continue;
    problems.push({ line, field: "row", message: e.code === "MissingQuotes" ? "a quoted value is never closed (a \" is missing)" : e.message });
  }
  // Extra cells that are empty are the trailing commas spreadsheets like to add.
  const extra = cells.slice(header.columns.length).filter((c) => c.trim() !== "");
  if (extra.length > 0) problems.push({ line, field: "row", message: `this line has ${cells.length} values but the header has ${header.columns.length} columns` });

  const checked = checkMax(draft as MaxDraft, resolve, rules);
  if (!checked.ok) {
    for (const field of MAX_FIELDS) {
      const message = checked.errors[field];
      if (message) problems.push({ line, field, message, ...(field === "exercise" && checked.suggestions.length ? { suggestions: checked.suggestions } : {}) });
    }
  }
  return { line, cells: draft as Partial<Record<MaxField, string>>, max: checked.ok && problems.length === 0 ? checked.max : null, problems };
}

/**
 * "Line 4, date: 2099-01-01 is in the future; …" — one problem as a person reads it.
 * @example describeCsvProblem({ line: 3, field: "value", message: "“abc” is not a number" }); // "Line 3, value: “abc” is not a number"
 */
export function describeCsvProblem(p: CsvProblem): string {
  if (p.field === "file") return p.line > 0 ? `Line ${p.line}: ${p.message}` : `File: ${p.message}`;
  return p.field === "row" ? `Line ${p.line}: ${p.message}` : `Line ${p.line}, ${p.field}: ${p.message}`;
}
