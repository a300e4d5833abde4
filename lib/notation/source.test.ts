import { describe, expect, it } from "vitest";
import { SourceText } from "./source";

describe("SourceText", () => {
  it("maps offsets to 1-based lines and columns", () => {
    const src = new SourceText("ab\ncd\n\nef");
    expect(src.lineOf(0)).toBe(1);
    expect(src.lineOf(2)).toBe(1); // the newline belongs to its line
    expect(src.lineOf(3)).toBe(2);
    expect(src.lineOf(6)).toBe(3);
    expect(src.lineOf(8)).toBe(4);
    const d = src.diagnostic(4, 5, "error", "x");
    expect([d.line, d.column, d.length]).toEqual([2, 2, 1]);
  });
  it("clamps ranges that stick out of the document", () => {
    const d = new SourceText("abc").diagnostic(2, 99, "warning", "x");
    expect([d.from, d.to, d.length]).toEqual([2, 3, 1]);
    const e = new SourceText("abc").diagnostic(-5, -1, "warning", "x");
    expect([e.from, e.to, e.column]).toEqual([0, 0, 1]);
  });
});
