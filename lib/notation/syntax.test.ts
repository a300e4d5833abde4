import { describe, expect, it } from "vitest";
import { parseProgramme } from "./index";

const first = (src: string) => parseProgramme(src).diagnostics.find((d) => d.severity === "error");

describe("syntax errors", () => {
  it("name a missing sets×reps after the exercise name", () => {
    expect(first("day A\n  bench press")?.message).toBe("'bench press' needs sets×reps after the name, e.g. bench press 3x8");
  });
  it("explain sets×reps written with spaces", () => {
    expect(first("day A\n  bench 3 x 5")?.message).toBe("write sets×reps without spaces: 3x5");
  });
  it("show the unexpected word and what may follow sets×reps", () => {
    const d = first("day A\n  squat 3x5 heavy");
    expect(d?.message).toMatch(/^can't read 'heavy' here — after sets×reps come options/);
    expect([d?.line, d?.column, d?.length]).toEqual([2, 13, 5]);
  });
  it("explain the shape of a warm-up line", () => {
    expect(first("day A\n  warmup bike")?.message).toMatch(/warmup "5 min bike/);
  });
  it("report one error per line", () => {
    const r = parseProgramme("day A\n  squat 3x5 } } }");
    expect(r.diagnostics.filter((d) => d.line === 2)).toHaveLength(1);
  });
  it("explain a stray brace on its own line", () => {
    expect(first("}\nday A")?.message).toMatch(/^stray '}'/);
  });
});
