import { describe, expect, it } from "vitest";
import { parseProgramme } from "./index";
import type { Exercise } from "./model";

function exercise(line: string): { ex: Exercise | undefined; messages: string[] } {
  const r = parseProgramme(`day A\n  ${line}`);
  return { ex: r.programme.blocks[0]?.days[0]?.exercises[0], messages: r.diagnostics.map((d) => `${d.severity}: ${d.message}`) };
}

describe("exercise lines", () => {
  it("read the owner's example line as written", () => {
    const { ex, messages } = exercise("incline press 3x6-8 @2rir ramp 60/75/90%");
    expect(messages).toEqual([]);
    expect(ex).toMatchObject({
      variations: ["incline press"], sets: 3, reps: { kind: "reps", min: 6, max: 8, amrap: false }, intensity: { kind: "rir", value: 2 },
      ramp: [{ percent: 60, reps: null }, { percent: 75, reps: null }, { percent: 90, reps: null }],
    });
  });
  it("read every option", () => {
    const { ex, messages } = exercise('a1 pause squat 4x5 @75% ramp 50x8/70x5% pause 2s tempo 31X0 rest 2m30s +2.5kg/wk +1rep/wk or box squat, front squat "sit back"');
    expect(messages).toEqual([]);
    expect(ex).toEqual({
      line: 2, label: "A1", variations: ["pause squat"], rotateWeeks: null, sets: 4, reps: { kind: "reps", min: 5, max: 5, amrap: false },
      intensity: { kind: "percent", value: 75 }, load: null, ramp: [{ percent: 50, reps: 8 }, { percent: 70, reps: 5 }], pauseSeconds: 2,
      tempo: "31x0", restSeconds: 150, progression: [{ kind: "load", mass: { value: 2.5, unit: "kg" } }, { kind: "reps", value: 1 }],
      substitutes: ["box squat", "front squat"], cue: "sit back",
    });
  });
  it("read loads and bodyweight", () => {
    expect(exercise("curl 3x12 12.5kg").ex?.load).toEqual({ kind: "fixed", mass: { value: 12.5, unit: "kg" } });
    expect(exercise("dip 3x8 bw+20lb").ex?.load).toEqual({ kind: "bodyweight", plus: { value: 20, unit: "lb" } });
  });
  it("read variations with rotation", () => {
    const { ex, messages } = exercise("{pull-up | chin-up} 3x6-10 bw rotate 2w");
    expect(messages).toEqual([]);
    expect([ex?.variations, ex?.rotateWeeks]).toEqual([["pull-up", "chin-up"], 2]);
  });
  it("reject rotate without variations and variations without rotate", () => {
    expect(exercise("row 3x8 rotate 2w").messages).toEqual(["error: rotate needs at least two variations written as {a | b}"]);
    expect(exercise("{row | pulldown} 3x8").messages).toEqual(["error: variations need rotate Nw to say when to switch, e.g. rotate 2w"]);
  });
  it("reject a repeated option and a repeated kind of progression", () => {
    expect(exercise("row 3x8 rest 2m rest 3m").messages).toEqual(["error: this line already has a rest — keep one"]);
    expect(exercise("row 3x8 +1kg/wk +2kg/wk").messages).toEqual(["error: this line already has a load progression — combine them into one"]);
  });
  it("reject adding reps to a timed set", () => {
    expect(exercise("plank 3x30s +1rep/wk").messages[0]).toMatch(/timed set has no reps/);
  });
  it("warn about a ramp with nothing to count from", () => {
    expect(exercise("row 3x8 ramp 50/70%").messages[0]).toMatch(/^warning: a ramp is counted from the working load/);
  });
  it("report an unclosed cue but keep its text", () => {
    const { ex, messages } = exercise('row 3x8 "squeeze');
    expect(messages).toEqual(["error: this cue is missing its closing quote"]);
    expect(ex?.cue).toBe("squeeze");
  });
  it("leave out a line whose sets×reps cannot be read", () => {
    const { ex, messages } = exercise("row 3x8-");
    expect(ex).toBeUndefined();
    expect(messages[0]).toMatch(/can't read reps '8-'/);
    expect(exercise("row 3xlots").messages).toEqual(["error: can't read sets×reps '3xlots' — write 3x8, 3x6-8, 3x10+ or 3x30s"]);
  });
});
