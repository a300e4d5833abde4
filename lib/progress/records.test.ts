import { describe, expect, it } from "vitest";
import { best } from "./fixtures";
import { markPersonalBests } from "./records";

describe("personal bests", () => {
  it("flags a session best that beats every earlier one, but not the first", () => {
    const marked = markPersonalBests([best("2027-01-18", 115), best("2027-01-04", 110), best("2027-01-11", 108), best("2027-01-25", 115)]);
    expect(marked.map((m) => [m.date, m.pb])).toEqual([
      ["2027-01-04", false],
      ["2027-01-11", false],
      ["2027-01-18", true],
      ["2027-01-25", false],
    ]);
  });

  it("tracks each exercise on its own", () => {
    const marked = markPersonalBests([best("2027-01-04", 110), best("2027-01-05", 80, { exerciseKey: "bench-press" }), best("2027-01-11", 85, { exerciseKey: "bench-press" })]);
    expect(marked.filter((m) => m.pb).map((m) => m.exerciseKey)).toEqual(["bench-press"]);
  });
});
