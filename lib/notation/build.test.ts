import { describe, expect, it } from "vitest";
import { parseProgramme } from "./index";

const errors = (src: string) => parseProgramme(src).diagnostics.filter((d) => d.severity === "error").map((d) => d.message);
const warnings = (src: string) => parseProgramme(src).diagnostics.filter((d) => d.severity === "warning").map((d) => d.message);

describe("blocks and days", () => {
  it("reads block length, deload weeks and day weekdays", () => {
    const { programme, diagnostics } = parseProgramme("block Accumulate 4w deload w4\nday Upper A MON\n  squat 3x5\nday Lower thursday\n  row 3x8");
    expect(diagnostics).toEqual([]);
    const b = programme.blocks[0];
    expect([b.line, b.name, b.weeks, b.deloadWeeks]).toEqual([1, "Accumulate", 4, [4]]);
    expect(b.days.map((d) => [d.name, d.weekday, d.line])).toEqual([["Upper A", "mon", 2], ["Lower", "thu", 4]]);
  });
  it("puts days before any block into an implicit block as long as weeks:", () => {
    const { programme } = parseProgramme("weeks: 6\nday A\n  squat 3x5\nblock Next 2w\nday B\n  row 3x8");
    expect(programme.blocks.map((b) => [b.line, b.name, b.weeks])).toEqual([[null, "Main", 6], [4, "Next", 2]]);
    expect(parseProgramme("day A\n  squat 3x5").programme.blocks[0].weeks).toBe(1);
  });
  it("warns when weeks: has no implicit block to size", () => {
    expect(warnings("weeks: 3\nblock B 2w\nday A\n  squat 3x5")).toEqual(["weeks: only sets the length of days written before the first block line"]);
  });
  it("reads several deload weeks and rejects one outside the block", () => {
    expect(parseProgramme("block B 8w deload w4, w8\nday A\n  squat 3x5").programme.blocks[0].deloadWeeks).toEqual([4, 8]);
    expect(errors("block B 4w deload w2 w5\nday A\n  squat 3x5")).toEqual(["deload week 5 is outside this 4-week block"]);
  });
  it("requires a block length", () => {
    expect(errors("block Intro\nday A\n  squat 3x5")).toEqual(["block 'Intro' needs a length in weeks, e.g. block Intro 4w"]);
  });
  it("rejects a weekday used twice in one block but allows it in the next block", () => {
    expect(errors("block A 1w\nday X mon\n  a 1x1\nday Y mon\n  b 1x1")).toEqual(["mon is already taken by day 'X' (line 2) in this block"]);
    expect(errors("block A 1w\nday X mon\n  a 1x1\nblock B 1w\nday Y mon\n  b 1x1")).toEqual([]);
  });
  it("names unnamed days by position and collects warm-ups", () => {
    const d = parseProgramme('day\n  warmup "bike"\n  warmup “skips”\n  squat 3x5').programme.blocks[0].days[0];
    expect([d.name, d.warmups]).toEqual(["Day 1", ["bike", "skips"]]);
  });
  it("reports exercise lines with no day above them once, and keeps them", () => {
    const r = parseProgramme("squat 3x5\nrow 3x8");
    expect(r.diagnostics.map((d) => d.message)).toEqual(["this line needs a day above it, e.g. day Full body"]);
    expect(r.programme.blocks[0].days[0].exercises).toHaveLength(2);
  });
});

describe("library check", () => {
  it("warns about names outside the library with the nearest ones, ignoring case", () => {
    const r = parseProgramme("day A\n  Bench Press 3x5\n  bnch press 3x5 or {x} \n  {pull-up | chinup} 3x5 rotate 2w", { knownExercises: ["bench press", "chin-up", "pull-up"] });
    const msgs = r.diagnostics.filter((d) => d.severity === "warning").map((d) => d.message);
    expect(msgs).toContain("unknown exercise 'bnch press' — did you mean bench press?");
    expect(msgs).toContain("unknown exercise 'chinup' — did you mean chin-up?");
    expect(msgs.some((m) => m.includes("'Bench Press'"))).toBe(false);
  });
  it("matches library names regardless of case, hyphens and apostrophes", () => {
    const r = parseProgramme("day A\n  Chest-Supported Row 3x10\n  farmers walk 3x30s", { knownExercises: ["chest supported row", "farmer's walk"] });
    expect(r.diagnostics).toEqual([]);
  });

  it("says so when nothing in the library is close", () => {
    const r = parseProgramme("day A\n  zercher carry 3x5 or sled push", { knownExercises: ["bench press"] });
    expect(r.diagnostics.map((d) => d.message)).toEqual([
      "unknown exercise 'zercher carry' — it is not in the exercise library",
      "unknown exercise 'sled push' — it is not in the exercise library",
    ]);
  });
  it("warns on every line that uses an unknown name, not only the first", () => {
    const r = parseProgramme("day A\n  bnch press 3x5\nday B\n  bnch  press 3x5\n  bnch press 3x8", { knownExercises: ["bench press"] });
    expect(r.diagnostics.map((d) => [d.line, d.message])).toEqual([
      [2, "unknown exercise 'bnch press' — did you mean bench press?"],
      [4, "unknown exercise 'bnch press' — did you mean bench press?"],
      [5, "unknown exercise 'bnch press' — did you mean bench press?"],
    ]);
  });
});

describe("positions", () => {
  it("points at the offending text with 1-based line and column", () => {
    const [d] = parseProgramme("day A\n  squat 3x8-6").diagnostics;
    expect([d.line, d.column, d.length, d.from]).toEqual([2, 11, 3, 16]);
  });
  it("keeps reading after a broken line and leaves the broken line out", () => {
    const r = parseProgramme("day A\n  bench press\n  squat 3x5\n{\nday B\n  row 3x8");
    expect(r.programme.blocks[0].days.map((d) => [d.name, d.exercises.map((e) => e.variations[0])])).toEqual([["A", ["squat"]], ["B", ["row"]]]);
    expect(r.diagnostics.map((d) => d.line)).toEqual([2, 4]);
  });
});
