import { describe, expect, it } from "vitest";
import { parser } from "../../grammar/parser.js";
import { BuildContext } from "./context";

describe("BuildContext", () => {
  it("joins name words with single spaces whatever the source spacing", () => {
    const src = "bench    press 3x5";
    const ctx = new BuildContext(src);
    const name = parser.parse(src).topNode.firstChild!.getChild("ExerciseName")!;
    ctx.enterLine(name.parent!);
    expect(ctx.words(name)).toBe("bench press");
  });
  it("does not trust tokens after the first syntax error of a line", () => {
    const src = "squat 3x5 heavy 80kg";
    const ctx = new BuildContext(src);
    const line = parser.parse(src).topNode.firstChild!;
    ctx.enterLine(line);
    expect(ctx.child(line, "SetsReps")).not.toBeNull();
    expect(ctx.child(line, "Load")).toBeNull();
  });
  it("positions reader problems relative to their node", () => {
    const ctx = new BuildContext("ab 80kgs");
    ctx.take({ from: 3 }, { value: null, problems: [{ offset: 2, length: 3, severity: "error", message: "m" }] });
    expect(ctx.diagnostics[0]).toMatchObject({ from: 5, to: 8, column: 6 });
  });
});
