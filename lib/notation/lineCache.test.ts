import { describe, expect, it } from "vitest";
import { parser } from "../../grammar/index";
import { buildProgramme, parseProgramme } from "./index";
import { LineCache, shapeOf } from "./lineCache";

const build = (src: string, cache: LineCache) => buildProgramme(parser.parse(src), src, { cache, knownExercises: ["back squat", "bench press"] });
const fresh = (src: string) => parseProgramme(src, { knownExercises: ["back squat", "bench press"] });

describe("LineCache", () => {
  it("hands back the very exercise of an unchanged line and re-reads the line that changed", () => {
    const cache = new LineCache();
    const a = build("day A\n  back squat 3x5 @75%\n  bench press 3x8", cache).programme.blocks[0].days[0].exercises;
    const b = build("day A\n  back squat 3x5 @75%\n  bench press 3x10", cache).programme.blocks[0].days[0].exercises;
    expect(b[0]).toBe(a[0]);
    expect(b[1]).not.toBe(a[1]);
    expect(b[1].reps).toEqual({ kind: "reps", min: 10, max: 10, amrap: false });
  });
  it("moves a cached line's diagnostics and names to where the line now starts", () => {
    const cache = new LineCache();
    build("day A\n  bnch press 3x8-6", cache);
    // The same line, now after a longer day name: same line number, other offsets.
    const src = "day Heavy\n  bnch press 3x8-6";
    expect(build(src, cache)).toEqual(fresh(src));
  });
  it("tells the same text on another line number apart", () => {
    const cache = new LineCache();
    build("day A\n  back squat 3x5", cache);
    const src = "day A\n\n  back squat 3x5";
    const got = build(src, cache);
    expect(got).toEqual(fresh(src));
    expect(got.programme.blocks[0].days[0].exercises[0].line).toBe(3);
  });
  it("keeps only the lines the latest build used", () => {
    const cache = new LineCache();
    build("day A\n  back squat 3x5\n  bench press 3x8\n  bench press 3x10", cache);
    expect(cache.size).toBe(3);
    build("day A\n  back squat 3x5", cache);
    expect(cache.size).toBe(1);
  });
  it("reads a line again when its text, line number or first error changed", () => {
    const src = "day A\n  back squat 3x5 @75%";
    const node = parser.parse(src).topNode.lastChild!;
    expect(node.name).toBe("Exercise");
    const cache = new LineCache();
    cache.set(node, src, 2, Infinity, { exercise: null, names: [], reports: [] });
    expect(cache.get(node, src, 2, Infinity)).toMatchObject({ exercise: null });
    expect(cache.get(node, src, 3, Infinity)).toBeUndefined();
    expect(cache.get(node, src, 2, node.from + 3)).toBeUndefined();
    const same = "day A\n  back squat 3x6 @75%";
    expect(cache.get(parser.parse(same).topNode.lastChild!, same, 2, Infinity)).toBeUndefined();
  });
  it("describes a line's tree by every node's type and range, in document order", () => {
    const src = "  squat 3x5";
    const node = parser.parse(src).topNode.firstChild!;
    const shape = shapeOf(node);
    const seen: number[] = [];
    parser.parse(src).iterate({ enter: (n) => void (n.from >= node.from && n.to <= node.to && n.type.id !== parser.parse(src).topNode.type.id && seen.push(n.type.id, n.from - node.from, n.to - node.from)) });
    expect(shape).toEqual(seen);
  });
});
