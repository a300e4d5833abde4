import { describe, expect, it } from "vitest";
import { maxIdentity, repeatedLines } from "./maxRepeats";

const squat = { exerciseKey: "back-squat", date: "2026-11-20", kind: "1rm" as const, value: 140, unit: "kg" as const };

describe("maxIdentity", () => {
  it("is the same for the same measurement written with a different number form", () => {
    expect(maxIdentity(squat)).toBe(maxIdentity({ ...squat, value: Number("140.0") }));
  });

  it("differs when any of exercise, date, kind, value or unit differs", () => {
    const base = maxIdentity(squat);
    for (const change of [{ exerciseKey: "front-squat" }, { date: "2026-11-21" }, { kind: "tm" as const }, { value: 142.5 }, { unit: "lb" as const }]) {
      expect(maxIdentity({ ...squat, ...change })).not.toBe(base);
    }
  });
});

describe("repeatedLines", () => {
  it("names rows already stored and rows repeating an earlier line, and skips rows with problems", () => {
    const rows = [
      { line: 2, max: squat },
      { line: 3, max: { ...squat, exerciseKey: "deadlift", value: 180 } },
      { line: 4, max: null },
      { line: 5, max: { ...squat, exerciseKey: "deadlift", value: 180 } },
    ];
    expect(repeatedLines(rows, new Set([maxIdentity(squat)]))).toEqual([2, 5]);
    expect(repeatedLines(rows, new Set())).toEqual([5]);
  });
});
