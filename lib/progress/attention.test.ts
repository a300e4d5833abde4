import { describe, expect, it } from "vitest";
import { attentionFor, isoMonday } from "./attention";
import { best, set } from "./fixtures";

// 2027-02-03 is a Wednesday in 2027-W05 (Monday 2027-02-01; ISO 8601, 2027-W01-1 is 2027-01-04).
const TODAY = "2027-02-03";

describe("what the coach's roster shows", () => {
  it("finds the Monday of the ISO week", () => {
    expect(isoMonday(TODAY)).toBe("2027-02-01");
    // ISO 8601: 2027-01-01 is 2026-W53-5, so its Monday is 2026-12-28.
    expect(isoMonday("2027-01-01")).toBe("2026-12-28");
  });

  it("counts planned and logged sessions this week and in the four weeks before", () => {
    const sessions = [
      { date: "2027-02-01", logged: true },
      { date: "2027-02-03", logged: false }, // today: not missed yet
      { date: "2027-02-05", logged: false },
      { date: "2027-01-04", logged: true }, // first day of the four weeks before
      { date: "2027-01-27", logged: false }, // missed
      { date: "2027-01-03", logged: false }, // before the window: not counted
    ];
    const a = attentionFor({ sessions, sets: [], bests: [], today: TODAY });
    expect(a.thisWeek).toEqual({ planned: 3, logged: 1 });
    expect(a.lastFourWeeks).toEqual({ planned: 2, logged: 1 });
    expect(a.missed).toBe(1);
    expect(a.lastSession).toBe("2027-02-01");
    expect(a.flags).toEqual(["missed"]);
  });

  it("flags two sets far off target in the last two weeks, and stalled lifts", () => {
    const sets = [set({ date: "2027-02-01", reps: 3 }), set({ date: "2027-01-28", reps: 2 }), set({ date: "2027-01-10", reps: 1 })];
    const bests = [best("2027-01-04", 140), best("2027-01-20", 135), best("2027-02-01", 139)];
    const a = attentionFor({ sessions: [], sets, bests, today: TODAY });
    expect(a.offTargetSets).toBe(2);
    expect(a.flags).toEqual(["off-target", "stalled"]);
    expect(a.lastSession).toBeNull();
  });
});
