import { describe, expect, it } from "vitest";
import { CATALOGUE } from "../exercises/catalogue";
import { exerciseMatcher } from "./exerciseMatch";
import { CSV_MAX_BYTES, CSV_MAX_ROWS, describeCsvProblem, MAXES_CSV_EXAMPLE, parseMaxesCsv } from "./maxesCsv";

const resolve = exerciseMatcher(CATALOGUE.flatMap((e) => [e.name, ...e.aliases].map((name) => ({ name, exercise: e.name }))));
const rules = { latestDate: "2027-01-10" };
const parse = (text: string) => parseMaxesCsv(text, resolve, rules);

describe("maxes CSV", () => {
  it("reads the downloadable example without a problem", () => {
    const r = parse(MAXES_CSV_EXAMPLE);
    expect(r.problems).toEqual([]);
    expect(r.ok).toBe(true);
    expect(r.rows.map((x) => x.max?.exerciseKey)).toEqual(["back-squat", "bench-press", "deadlift", "overhead-press"]);
    expect(r.rows[3].max).toMatchObject({ kind: "tm", source: "estimated", note: "from a 5-rep set", value: 57.5 });
  });

  it("numbers rows by their line in the file, counting the header, blank lines and line breaks inside quotes", () => {
    const text = 'exercise,value,unit,date,note\r\nsquat,140,kg,2027-01-04,\r\n\r\nbench,100,kg,2027-01-04,"two\r\nlines"\r\ndeadlift,abc,kg,2027-01-04,\r\n';
    const r = parse(text);
    expect(r.rows.map((x) => x.line)).toEqual([2, 4, 6]);
    expect(r.rows[1].max?.note).toBe("two\r\nlines");
    expect(r.problems).toEqual([{ line: 6, field: "value", message: "“abc” is not a number" }]);
  });

  it("returns every row with its own problems and marks the file not ok when any row is bad", () => {
    const r = parse("exercise,value,unit,date\nsquat,140,kg,2027-01-04\nbench pres,100,kg,2027-01-04\nrdl,120,st,2099-01-01\n");
    expect(r.ok).toBe(false);
    expect(r.rows).toHaveLength(3);
    expect(r.rows[0].max).not.toBeNull();
    expect(r.rows[1]).toMatchObject({ line: 3, max: null, cells: { exercise: "bench pres" } });
    expect(r.rows[1].problems).toEqual([expect.objectContaining({ field: "exercise", suggestions: expect.arrayContaining(["bench press"]) })]);
    expect(r.rows[2].problems.map((p) => p.field)).toEqual(["unit", "date"]);
    expect(describeCsvProblem(r.rows[2].problems[1])).toBe("Line 4, date: 2099-01-01 is in the future; enter the day it was measured");
  });

  it("takes columns in any order and case, semicolons, a byte-order mark and optional columns left out", () => {
    const r = parse("\uFEFFDate;Unit;Value;Exercise\n2027-01-02;lb;315;Deadlift\n2027-01-03;kg;102,5;OHP\n");
    expect(r.problems).toEqual([]);
    expect(r.rows.map((x) => [x.max?.exercise, x.max?.value, x.max?.unit, x.max?.kind, x.max?.source])).toEqual([
      ["deadlift", 315, "lb", "1rm", "tested"],
      ["overhead press", 102.5, "kg", "1rm", "tested"],
    ]);
  });

  it("requires a header and says which columns it lacks", () => {
    expect(parse("squat,140,kg,2027-01-04\n").fileProblems[0].message).toBe("the first line must be the header, e.g. exercise,value,unit,date");
    expect(parse("exercise,value,date\nsquat,140,2027-01-04\n").fileProblems).toEqual([{ line: 1, field: "file", message: "the header is missing the column unit" }]);
    expect(parse("exercise,value,unit,date,colour\nsquat,140,kg,2027-01-04,red\n").fileProblems[0].message).toMatch(/^unknown column “colour”/);
    expect(parse("exercise,value,unit,date,unit\n").fileProblems[0].message).toBe("the column unit appears twice in the header");
  });

  it("refuses an empty file and a header with nothing below it", () => {
    expect(parse("  \n").fileProblems[0].message).toMatch(/the file is empty/);
    expect(parse("exercise,value,unit,date\n\n").fileProblems[0].message).toBe("the file has a header but no maxes below it");
    expect(parse("exercise,value,unit,date\n").ok).toBe(false);
  });

  it("flags a line with more values than columns, but not trailing empty cells", () => {
    const r = parse("exercise,value,unit,date\nsquat,140,kg,2027-01-04,,\nbench,100,kg,2027-01-04,oops\n");
    expect(r.rows[0].problems).toEqual([]);
    expect(r.rows[1].problems).toEqual([{ line: 3, field: "row", message: "this line has 5 values but the header has 4 columns" }]);
  });

  it("reports an unclosed quote on its line", () => {
    const r = parse('exercise,value,unit,date\nsquat,140,kg,2027-01-04\n"bench,100,kg,2027-01-04\n');
    expect(r.ok).toBe(false);
    expect(r.problems.some((p) => p.line === 3 && p.field === "row" && /never closed/.test(p.message))).toBe(true);
  });

  it("stops at the row limit with a message saying how to fix it", () => {
    const line = "squat,140,kg,2027-01-04\n";
    const atLimit = parse("exercise,value,unit,date\n" + line.repeat(CSV_MAX_ROWS));
    expect(atLimit.ok).toBe(true);
    expect(atLimit.rows).toHaveLength(CSV_MAX_ROWS);
    const over = parse("exercise,value,unit,date\n" + line.repeat(CSV_MAX_ROWS + 1));
    expect(over.ok).toBe(false);
    expect(over.fileProblems[0].message).toBe("the file has more than 2,000 rows; split it into smaller files");
  });

  it("refuses a file over the size limit before reading it", () => {
    const big = "exercise,value,unit,date,note\n" + `squat,140,kg,2027-01-04,${"x".repeat(400)}\n`.repeat(700);
    expect(new TextEncoder().encode(big).length).toBeGreaterThan(CSV_MAX_BYTES);
    const r = parse(big);
    expect(r.rows).toEqual([]);
    expect(r.fileProblems[0].message).toMatch(/the limit is 256 KB/);
  });
});
