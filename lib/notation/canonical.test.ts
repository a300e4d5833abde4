import { describe, expect, it } from "vitest";
import { canonicalSetting, canonicalToken, singleSpaced } from "./canonical";

describe("canonicalToken", () => {
  it("lower-cases keywords and weekdays and upper-cases labels", () => {
    expect(canonicalToken("RestKw", "Rest", "REST")).toBe("rest");
    expect(canonicalToken("WarmupKw", "Warmup", "Warm-Up")).toBe("warmup");
    expect(canonicalToken("Weekday", "Day", "Thursday")).toBe("thu");
    expect(canonicalToken("Label", "Exercise", "b2")).toBe("B2");
  });
  it("prints values without trailing zeros and with one spelling per unit", () => {
    expect(canonicalToken("SetsReps", "Exercise", "03X08-10")).toBe("3x8-10");
    expect(canonicalToken("SetsReps", "Exercise", "3x90sec")).toBe("3x90s");
    expect(canonicalToken("Intensity", "Exercise", "@RPE8.50")).toBe("@rpe8.5");
    expect(canonicalToken("Quantity", "Load", "80.0KG")).toBe("80kg");
    expect(canonicalToken("Bodyweight", "Load", "BW+10.0kg")).toBe("bw+10kg");
    expect(canonicalToken("Progression", "Exercise", "+1reps/week")).toBe("+1rep/wk");
    expect(canonicalToken("Weeks", "Block", "6weeks")).toBe("6w");
  });
  it("leaves invalid values exactly as written", () => {
    expect(canonicalToken("Quantity", "Load", "80KGS")).toBe("80KGS");
    expect(canonicalToken("Intensity", "Exercise", "@RPE11")).toBe("@RPE11");
    expect(canonicalToken("Quantity", "Tempo", "311")).toBe("311");
  });
  it("joins the words of a name with single spaces and keeps their case", () => {
    expect(canonicalToken("ExerciseName", "Exercise", "Bench \t\u00a0 Press")).toBe("Bench Press");
    expect(canonicalToken("DayName", "Day", "Upper  A")).toBe("Upper A");
  });
  it("puts closed cues in straight quotes and leaves an unclosed cue alone", () => {
    expect(canonicalToken("Cue", "Exercise", "“ chest up ”")).toBe('"chest up"');
    expect(canonicalToken("Cue", "Exercise", '"open  ')).toBe('"open');
  });
});

describe("singleSpaced", () => {
  it("leaves other Unicode spaces inside a word alone", () => {
    expect(singleSpaced("a\u2009b  c")).toBe("a\u2009b c");
  });
});

describe("canonicalSetting", () => {
  it("lower-cases known units and models and tidies numbers, keeping text as written", () => {
    expect(canonicalSetting("units", " KG ")).toBe("kg");
    expect(canonicalSetting("model", "NSCA")).toBe("nsca");
    expect(canonicalSetting("round", "2.50")).toBe("2.5");
    expect(canonicalSetting("title", " Big Lifts ")).toBe("Big Lifts");
    expect(canonicalSetting("units", "kgs")).toBe("kgs");
  });
});
