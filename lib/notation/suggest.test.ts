import { describe, expect, it } from "vitest";
import { didYouMean, editDistance, nearest } from "./suggest";

describe("editDistance", () => {
  // Levenshtein V.I. (1966) Binary codes capable of correcting deletions, insertions and reversals;
  // "kitten" → "sitting" = 3 is the textbook example.
  it("counts the classic kitten/sitting example as 3 edits", () => {
    expect(editDistance("kitten", "sitting")).toBe(3);
  });
  it("is symmetric and zero only for equal strings", () => {
    expect(editDistance("flaw", "lawn")).toBe(editDistance("lawn", "flaw"));
    expect(editDistance("abc", "abc")).toBe(0);
    expect(editDistance("", "abc")).toBe(3);
  });
});

describe("nearest", () => {
  it("finds a unit one letter away, ignoring case", () => {
    expect(nearest("KGS", ["kg", "lb"])).toEqual(["kg"]);
  });
  it("returns nothing when every candidate is far away", () => {
    expect(nearest("parsecs", ["kg", "lb"])).toEqual([]);
  });
  it("orders exercise names by closeness", () => {
    expect(nearest("bench pres", ["back squat", "bench press", "bench dip"])).toEqual(["bench press"]);
  });
});

describe("didYouMean", () => {
  it("phrases one or several suggestions", () => {
    expect(didYouMean("kgs", ["kg", "lb"])).toBe(" — did you mean kg?");
    expect(didYouMean("ab", ["aa", "ac"])).toBe(" — did you mean aa or ac?");
    expect(didYouMean("zzzz", ["kg"])).toBe("");
  });
});
