import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { checkInvariants, mutatedText, programmeText } from "./fuzz-cases";

function holds(src: string): void {
  const problem = checkInvariants(src);
  if (problem) throw new Error(problem);
}

// A share of the `npm run fuzz` run (which does 100k+ cases) on every test run.
describe("generated programmes", () => {
  it("keep every invariant: no throw, in-document diagnostics, stable and faithful formatting", () => {
    fc.assert(fc.property(programmeText(), holds), { numRuns: 1000 });
  });
  it("keep every invariant after random character edits", () => {
    fc.assert(fc.property(mutatedText(), holds), { numRuns: 1000 });
  });
  it("keep every invariant for arbitrary unicode text", () => {
    fc.assert(fc.property(fc.string({ unit: "grapheme", maxLength: 200 }), holds), { numRuns: 500 });
  });
  it("accept a clean programme", () => {
    expect(checkInvariants("day A\n  squat 3x5 @75%\n")).toBeNull();
  });
});
