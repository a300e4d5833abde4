import { describe, expect, it } from "vitest";
import { AUTOREG_THRESHOLD, proposeMax, roundMax } from "./autoRegulate";
import { best } from "./fixtures";

const current = { value: 100, measuredOn: "2027-01-01", kind: "1rm" as const };

describe("auto-regulation proposals", () => {
  it("proposes the median of the last three session bests when it is more than 5 % off", () => {
    const p = proposeMax({ bests: [best("2027-01-04", 120), best("2027-01-11", 107), best("2027-01-18", 108.2), best("2026-12-20", 150)], current, unit: "kg" });
    expect(p).not.toBeNull();
    expect(p!.estimate).toBeCloseTo(108.2, 6);
    expect(p!.value).toBe(108);
    expect(p!.change).toBeCloseTo(0.082, 6);
    expect(p!.basis.map((b) => b.date)).toEqual(["2027-01-04", "2027-01-11", "2027-01-18"]);
  });

  it("proposes a lower max when the sessions are well below it", () => {
    const p = proposeMax({ bests: [best("2027-01-04", 90), best("2027-01-11", 92), best("2027-01-18", 91)], current, unit: "kg" });
    expect(p?.value).toBe(91);
    expect(p!.change).toBeLessThan(-AUTOREG_THRESHOLD);
  });

  it("stays quiet within 5 %, with fewer than three sessions, or for a training max", () => {
    expect(proposeMax({ bests: [best("2027-01-04", 104), best("2027-01-11", 105), best("2027-01-18", 103)], current, unit: "kg" })).toBeNull();
    expect(proposeMax({ bests: [best("2027-01-04", 120), best("2027-01-11", 120)], current, unit: "kg" })).toBeNull();
    expect(proposeMax({ bests: [best("2027-01-04", 120), best("2027-01-11", 120), best("2027-01-18", 120)], current: { ...current, kind: "tm" }, unit: "kg" })).toBeNull();
  });

  it("only reads sessions from the day the current max was measured", () => {
    expect(proposeMax({ bests: [best("2026-12-20", 120), best("2027-01-11", 120), best("2027-01-18", 120)], current, unit: "kg" })).toBeNull();
  });

  it("rounds to 0.5 kg or 1 lb", () => {
    expect(roundMax(108.26, "kg")).toBe(108.5);
    expect(roundMax(238.4, "lb")).toBe(238);
  });
});
