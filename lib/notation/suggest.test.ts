import fc from "fast-check";
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
  // Levenshtein distance is never less than the difference in length (each extra character costs
  // one insertion or deletion; textbook property), so nearest may skip such names unmeasured.
  it("finds what measuring every candidate in full finds", () => {
    const word = fc.string({ unit: fc.constantFrom("a", "b", "c", " ", "-"), maxLength: 12 });
    fc.assert(
      fc.property(word, fc.array(word, { maxLength: 12 }), (w, names) => {
        for (const n of names) expect(editDistance(w, n)).toBeGreaterThanOrEqual(Math.abs(w.length - n.length));
        const budget = Math.max(2, Math.floor(w.length / 3));
        const full = names
          .map((c) => ({ c, d: editDistance(w.toLowerCase(), c.toLowerCase()) }))
          .filter((x) => x.d <= budget)
          .sort((x, y) => x.d - y.d || x.c.localeCompare(y.c))
          .slice(0, 3)
          .map((x) => x.c);
        expect(nearest(w, names)).toEqual(full);
      }),
      { numRuns: 500 },
    );
  });
});

describe("didYouMean", () => {
  it("phrases one or several suggestions", () => {
    expect(didYouMean("kgs", ["kg", "lb"])).toBe(" — did you mean kg?");
    expect(didYouMean("ab", ["aa", "ac"])).toBe(" — did you mean aa or ac?");
    expect(didYouMean("zzzz", ["kg"])).toBe("");
  });
});
