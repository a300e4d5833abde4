import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { formatProgramme } from "./format";
import { withoutLines } from "./fuzz-cases";
import { parseProgramme } from "./index";

describe("formatProgramme", () => {
  it("normalises spacing, keyword case, number style and indentation", () => {
    const src = 'TITLE:   Spring  \nUnits: KG\n\n\n\nBLOCK  Base 4WEEKS  DELOAD W4\nDay Upper  Monday\nA1   bench press 3X5  @75.0%   +2.50KG/week \u201Celbows in\u201D\n    {pull-up|chin-up} 3x6-10 BW ROTATE 2wk\n Warm-Up "bike"\n';
    expect(formatProgramme(src)).toBe(
      'title: Spring\nunits: kg\n\nblock Base 4w deload w4\nday Upper mon\n  A1 bench press 3x5 @75% +2.5kg/wk "elbows in"\n  {pull-up | chin-up} 3x6-10 bw rotate 2w\n  warmup "bike"\n',
    );
  });
  it("writes rests, ramps, timed sets and substitutes canonically", () => {
    expect(formatProgramme("day A\n  row 3x1min rest 2:30 ramp 50x8/70x5 or a ,b pause 1.0s")).toBe("day A\n  row 3x1m rest 2m30s ramp 50x8/70x5% or a, b pause 1s\n");
  });
  it("keeps comments, lining up a comment between exercises with them", () => {
    const src = "# top\nday A # first day\n# inside\n  squat 3x5   # heavy\n";
    expect(formatProgramme(src)).toBe("# top\nday A # first day\n  # inside\n  squat 3x5 # heavy\n");
  });
  it("leaves lines with a syntax error or an invalid value as written", () => {
    const src = "day A\n    bench   press\n  squat  3x8-6   80KGS\n";
    expect(formatProgramme(src)).toBe("day A\n    bench   press\n  squat 3x8-6 80KGS\n");
  });
  it("is idempotent and keeps the meaning of every template", () => {
    const dir = join(fileURLToPath(new URL(".", import.meta.url)), "../../templates");
    for (const f of readdirSync(dir).filter((x) => x.endsWith(".iq"))) {
      const src = readFileSync(join(dir, f), "utf8");
      const once = formatProgramme(src);
      expect(formatProgramme(once)).toBe(once);
      expect(withoutLines(parseProgramme(once).programme)).toEqual(withoutLines(parseProgramme(src).programme));
    }
  });
  it("returns an empty text for an empty or blank programme", () => {
    expect(formatProgramme("")).toBe("");
    expect(formatProgramme("\n \n\t\n")).toBe("");
  });
});
