import { TreeFragment, type Tree } from "@lezer/common";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
// The parser as the editor configures it (highlighting props, small buffers for reparsing).
import { parser } from "../../grammar/index";
import { programmeText } from "./fuzz-cases";
import { buildProgramme, LineCache, parseProgramme } from "./index";

const KNOWN = ["back squat", "bench press", "barbell row", "pull-up", "chin-up"];
const INSERTS = ["", "x", "\n", "{", "}", "@", " ", "day ", '"', "3x5", "block B 2w\n", "#", "|", "or ", "%", "75"];

/** One edit as an editor applies it: reparse reusing the unchanged parts of the old tree. */
function edit(text: string, tree: Tree, at: number, remove: number, insert: string): { text: string; tree: Tree } {
  const from = text.length === 0 ? 0 : at % (text.length + 1);
  const to = Math.min(text.length, from + remove);
  const next = text.slice(0, from) + insert + text.slice(to);
  const fragments = TreeFragment.applyChanges(TreeFragment.addTree(tree), [{ fromA: from, toA: to, fromB: from, toB: from + insert.length }]);
  return { text: next, tree: parser.parse(next, fragments) };
}

// The editor hands the workbench its incrementally reparsed tree instead of the text being parsed again;
// what the coach sees must not depend on which of the two the model was built from.
describe("building from an editor's incrementally reparsed tree", () => {
  it("gives the same model and diagnostics as parsing the text afresh, edit after edit, with or without a line cache", () => {
    const editArb = fc.tuple(fc.nat(), fc.nat({ max: 4 }), fc.constantFrom(...INSERTS));
    fc.assert(
      fc.property(programmeText(), fc.array(editArb, { minLength: 1, maxLength: 12 }), (src, edits) => {
        let doc = { text: src, tree: parser.parse(src) };
        const cache = new LineCache();
        buildProgramme(doc.tree, doc.text, { knownExercises: KNOWN, cache });
        for (const [at, remove, insert] of edits) {
          doc = edit(doc.text, doc.tree, at, remove, insert);
          const fresh = parseProgramme(doc.text, { knownExercises: KNOWN });
          expect(buildProgramme(doc.tree, doc.text, { knownExercises: KNOWN })).toEqual(fresh);
          expect(buildProgramme(doc.tree, doc.text, { knownExercises: KNOWN, cache })).toEqual(fresh);
        }
      }),
      { numRuns: 300 },
    );
  });
  it("follows typing a line character by character at the end of a programme", () => {
    let doc = { text: "day A\n  back squat 3x5 @75%\n", tree: parser.parse("day A\n  back squat 3x5 @75%\n") };
    const cache = new LineCache();
    for (const ch of "  front squat 3x5 @70%") {
      doc = edit(doc.text, doc.tree, doc.text.length, 0, ch);
      const fresh = parseProgramme(doc.text, { knownExercises: KNOWN });
      expect(buildProgramme(doc.tree, doc.text, { knownExercises: KNOWN })).toEqual(fresh);
      expect(buildProgramme(doc.tree, doc.text, { knownExercises: KNOWN, cache })).toEqual(fresh);
    }
  });
});

describe("library check across calls", () => {
  it("uses the names passed this time, even when a caller changed the same array in place", () => {
    const known = ["bench press"];
    const src = "day A\n  zercher squat 3x5";
    expect(parseProgramme(src, { knownExercises: known }).diagnostics).toHaveLength(1);
    known.push("zercher squat");
    expect(parseProgramme(src, { knownExercises: known }).diagnostics).toEqual([]);
    known.splice(1, 1, "zercher squats");
    expect(parseProgramme(src, { knownExercises: known }).diagnostics.map((d) => d.message)).toEqual(["unknown exercise 'zercher squat' — did you mean zercher squats?"]);
  });
});
