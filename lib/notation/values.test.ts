import { describe, expect, it } from "vitest";
import {
  durationText, readBodyweight, readCue, readDeloadWeek, readDuration, readIntensity, readMass, readProgression, readRamp,
  readSetsReps, readTempo, readWeeks,
} from "./values";

const messages = (r: { problems: { message: string }[] }) => r.problems.map((p) => p.message);

describe("readSetsReps", () => {
  it("reads fixed reps, ranges, AMRAP and timed sets", () => {
    expect(readSetsReps("3x5").value).toEqual({ sets: 3, reps: { kind: "reps", min: 5, max: 5, amrap: false } });
    expect(readSetsReps("4X6-8").value).toEqual({ sets: 4, reps: { kind: "reps", min: 6, max: 8, amrap: false } });
    expect(readSetsReps("3x10+").value?.reps).toEqual({ kind: "reps", min: 10, max: 10, amrap: true });
    expect(readSetsReps("3x30s").value?.reps).toEqual({ kind: "time", seconds: 30 });
    expect(readSetsReps("2×1min").value?.reps).toEqual({ kind: "time", seconds: 60 });
  });
  it("says a backwards rep range runs backwards, pointing at the range", () => {
    const r = readSetsReps("3x8-6");
    expect(messages(r)).toEqual(["rep range 8-6 runs backwards"]);
    expect(r.problems[0]).toMatchObject({ offset: 2, length: 3, severity: "error" });
  });
  it("rejects 0 sets and 0 reps", () => {
    expect(messages(readSetsReps("0x5"))).toEqual(["0 sets — an exercise needs at least 1 set"]);
    expect(messages(readSetsReps("3x0"))[0]).toMatch(/0 reps/);
  });
  it("explains a load written where reps belong", () => {
    expect(messages(readSetsReps("3x80kg"))[0]).toMatch(/is a load/);
  });
});

describe("readIntensity", () => {
  it("reads %1RM, RIR and RPE with half points", () => {
    expect(readIntensity("@75%").value).toEqual({ kind: "percent", value: 75 });
    expect(readIntensity("@2RIR").value).toEqual({ kind: "rir", value: 2 });
    expect(readIntensity("@rpe8.5").value).toEqual({ kind: "rpe", value: 8.5 });
  });
  it("rejects 1RM shares over 110%, RIR over 10 and RPE outside 1–10", () => {
    expect(messages(readIntensity("@111%"))[0]).toMatch(/over 110%/);
    expect(readIntensity("@110%").problems).toEqual([]);
    expect(messages(readIntensity("@11rir"))[0]).toMatch(/more than 10/);
    expect(messages(readIntensity("@rpe11"))[0]).toBe("RPE 11 is outside the 1–10 scale");
    expect(messages(readIntensity("@rpe0"))[0]).toBe("RPE 0 is outside the 1–10 scale");
  });
  it("warns about very light RPE and RPE off the half-point grid", () => {
    // Zourdos et al. 2016, J Strength Cond Res 30(1): the RIR-based scale is anchored from 5 to 10 in half points.
    expect(readIntensity("@rpe4").problems[0].severity).toBe("warning");
    expect(messages(readIntensity("@rpe8.3"))[0]).toMatch(/half points/);
  });
  it("suggests the right spelling for common slips", () => {
    expect(messages(readIntensity("@8rpe"))[0]).toBe("write RPE with the number last: @rpe8");
    expect(messages(readIntensity("@75"))[0]).toMatch(/@75%/);
  });
});

describe("readMass and readBodyweight", () => {
  it("reads kg and lb in any case", () => {
    expect(readMass("80KG").value).toEqual({ value: 80, unit: "kg" });
    expect(readMass("175lb").value).toEqual({ value: 175, unit: "lb" });
  });
  it("suggests the nearest unit for an unknown one, pointing at the unit", () => {
    const r = readMass("80kgs");
    expect(messages(r)).toEqual(["unknown unit 'kgs' — did you mean kg?"]);
    expect(r.problems[0]).toMatchObject({ offset: 2, length: 3 });
  });
  it("asks for a unit and for @ on a percentage", () => {
    expect(messages(readMass("80"))[0]).toMatch(/needs a unit/);
    expect(messages(readMass("80%"))[0]).toMatch(/@80%/);
  });
  it("reads bodyweight with and without added load", () => {
    expect(readBodyweight("bw").value).toEqual({ kind: "bodyweight", plus: null });
    expect(readBodyweight("BW+10kg").value).toEqual({ kind: "bodyweight", plus: { value: 10, unit: "kg" } });
    expect(readBodyweight("bw+10").problems[0].offset).toBe(3);
  });
});

describe("readDuration and durationText", () => {
  it("reads seconds, minutes, mixed and clock forms", () => {
    expect(readDuration("90s", "rest").value).toBe(90);
    expect(readDuration("3m", "rest").value).toBe(180);
    expect(readDuration("2m30s", "rest").value).toBe(150);
    expect(readDuration("2:30", "rest").value).toBe(150);
    expect(readDuration("1.5min", "rest").value).toBe(90);
  });
  it("asks for a unit and names unknown ones", () => {
    expect(messages(readDuration("3", "rest"))[0]).toBe("rest 3 needs a unit: 3s or 3m");
    expect(messages(readDuration("3h", "rest"))[0]).toMatch(/unknown unit 'h'/);
  });
  it("prints whole minutes as m, up to two minutes in seconds, else m and s", () => {
    expect([durationText(180), durationText(90), durationText(150), durationText(45)]).toEqual(["3m", "90s", "2m30s", "45s"]);
    for (const s of [1, 59, 60, 61, 119, 120, 121, 3600]) expect(readDuration(durationText(s), "rest").value).toBe(s);
  });
});

describe("readTempo, readWeeks, readDeloadWeek", () => {
  it("accepts four digits or x only", () => {
    expect(readTempo("31X0").value).toBe("31x0");
    expect(messages(readTempo("311"))[0]).toMatch(/four digits/);
  });
  it("counts block lengths and rotations in weeks, at least 1", () => {
    expect(readWeeks("4w", "a block").value).toBe(4);
    expect(readWeeks("6weeks", "a block").value).toBe(6);
    expect(messages(readWeeks("0w", "a block"))[0]).toMatch(/0 weeks/);
    expect(messages(readWeeks("3", "rotate"))[0]).toBe("rotate is counted in weeks: write 3w");
    expect(readDeloadWeek("w4").value).toBe(4);
    expect(readDeloadWeek("w0").value).toBeNull();
  });
});

describe("readRamp", () => {
  it("reads percentages with and without reps per step", () => {
    expect(readRamp("60/75/90%").value).toEqual([{ percent: 60, reps: null }, { percent: 75, reps: null }, { percent: 90, reps: null }]);
    expect(readRamp("50x8/70x5/85x2%").value).toEqual([{ percent: 50, reps: 8 }, { percent: 70, reps: 5 }, { percent: 85, reps: 2 }]);
  });
  it("rejects steps at or above the working load and warns when steps fall", () => {
    expect(readRamp("60/100%").problems[0].severity).toBe("error");
    expect(readRamp("80/60%").problems[0].severity).toBe("warning");
    expect(readRamp("60//80%").value).toBeNull();
  });
});

describe("readProgression", () => {
  it("reads load, percent and rep steps per week", () => {
    expect(readProgression("+2.5kg/wk").value).toEqual({ kind: "load", mass: { value: 2.5, unit: "kg" } });
    expect(readProgression("+5%/week").value).toEqual({ kind: "percent", value: 5 });
    expect(readProgression("+1reps/w").value).toEqual({ kind: "reps", value: 1 });
  });
  it("explains a missing period, another period and unknown units", () => {
    expect(messages(readProgression("+1rep"))[0]).toBe("progression '+1rep' needs a period: +1rep/wk");
    expect(messages(readProgression("+2kg/mo"))[0]).toMatch(/per week/);
    expect(messages(readProgression("+2kgs/wk"))[0]).toBe("unknown unit 'kgs' — did you mean kg?");
  });
});

describe("readCue", () => {
  it("reads straight and typographic quotes and notices a missing close", () => {
    expect(readCue('"  brace  "')).toEqual({ text: "brace", closed: true });
    expect(readCue("“smart”")).toEqual({ text: "smart", closed: true });
    expect(readCue('"open”')).toEqual({ text: "open”", closed: false });
  });
});
