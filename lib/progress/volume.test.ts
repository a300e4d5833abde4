import { describe, expect, it } from "vitest";
import { set } from "./fixtures";
import { weeklyVolume } from "./volume";

describe("weekly volume", () => {
  it("sums reps × load of done work sets per ISO week", () => {
    const weeks = weeklyVolume(
      [
        set({ date: "2027-01-04", reps: 5, load: 100 }),
        set({ date: "2027-01-10", reps: 5, load: 100 }), // Sunday: same ISO week (ISO 8601 weeks run Monday–Sunday)
        set({ date: "2027-01-04", kind: "warmup", reps: 8, load: 40 }),
        set({ date: "2027-01-04", done: false }),
      ],
      "kg",
    );
    expect(weeks).toEqual([{ week: "2027-W01", monday: "2027-01-04", volume: 1000, sets: 2, reps: 10 }]);
  });

  it("puts the first days of January in the previous year's last week", () => {
    // ISO 8601: 2027-01-01 is 2026-W53-5 (REFERENCE-VALUES, computed and checked against two libraries).
    expect(weeklyVolume([set({ date: "2027-01-01" })], "kg")[0].week).toBe("2026-W53");
  });

  it("fills weeks without training with zero and converts units", () => {
    const weeks = weeklyVolume([set({ date: "2027-01-04", load: 100, unit: "lb" }), set({ date: "2027-01-20", load: 100, unit: "kg" })], "kg");
    expect(weeks.map((w) => w.week)).toEqual(["2027-W01", "2027-W02", "2027-W03"]);
    expect(weeks[1].volume).toBe(0);
    // 1 lb = 0.45359237 kg (NIST SP 811): 5 × 100 lb = 226.80 kg.
    expect(weeks[0].volume).toBeCloseTo(226.8, 2);
  });
});
