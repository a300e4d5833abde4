import { describe, expect, it } from "vitest";
import { parser } from "../../grammar/parser.js";
import { firstErrorFrom, lineNodes } from "./lines";
import { SourceText } from "./source";

const names = (src: string) => lineNodes(parser.parse(src), new SourceText(src)).map((n) => `${n.name}@${src.slice(n.from, n.to).trim()}`);

describe("lineNodes", () => {
  it("gives one node per line for a clean programme", () => {
    expect(names("units: kg\nday A\n  squat 3x5")).toEqual(["Meta@units: kg", "Day@day A", "Exercise@squat 3x5"]);
  });
  it("re-reads lines swallowed by a broken neighbour on their own", () => {
    const got = names("{\nday B mon\n  row 3x8");
    expect(got).toContain("Day@day B mon");
    expect(got).toContain("Exercise@row 3x8");
  });
  it("keeps positions of re-read nodes in document coordinates", () => {
    const src = "{\nday B mon";
    const day = lineNodes(parser.parse(src), new SourceText(src)).find((n) => n.name === "Day");
    expect(day && src.slice(day.from, day.to)).toBe("day B mon");
  });
});

describe("firstErrorFrom", () => {
  it("finds the first error inside a line, or none", () => {
    const src = "squat 3x5 heavy 80kg\nrow 3x8";
    const [bad, good] = lineNodes(parser.parse(src), new SourceText(src));
    expect(firstErrorFrom(bad)).toBe(10);
    expect(firstErrorFrom(good)).toBe(Infinity);
  });
});
