import { describe, expect, it } from "vitest";
import { effortText, rirOf, rirToRpe, rpeToRir } from "./effort";

describe("effort targets", () => {
  it("maps RPE 10, 9, 8, 7 to 0, 1, 2, 3 reps in reserve", () => {
    // Zourdos MC et al. (2016) J Strength Cond Res 30(1):267–275.
    expect([10, 9, 8, 7].map(rpeToRir)).toEqual([0, 1, 2, 3]);
  });

  it("maps half points to half reps", () => {
    // Zourdos et al. 2016: 9.5 ≈ 0–1 RIR, 8.5 ≈ 1–2 RIR (half points from memory).
    expect(rpeToRir(9.5)).toBe(0.5);
    expect(rpeToRir(8.5)).toBe(1.5);
  });

  it("round-trips RIR and RPE", () => {
    for (let rir = 0; rir <= 6; rir += 0.5) expect(rpeToRir(rirToRpe(rir))).toBe(rir);
  });

  it("reads the RIR target from either effort notation and none from a percentage", () => {
    expect(rirOf({ kind: "rpe", value: 8 })).toBe(2);
    expect(rirOf({ kind: "rir", value: 1 })).toBe(1);
    expect(rirOf({ kind: "percent", value: 80 })).toBeNull();
    expect(rirOf(null)).toBeNull();
  });

  it("writes the target as a coach would read it, including percent steps", () => {
    expect(effortText({ kind: "percent", value: 75 }, 5)).toBe("80% 1RM");
    expect(effortText({ kind: "rpe", value: 8.5 })).toBe("RPE 8.5");
    expect(effortText({ kind: "rir", value: 2 })).toBe("2 RIR");
  });
});
