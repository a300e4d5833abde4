import { describe, expect, it } from "vitest";
import { best } from "./fixtures";
import { stalledExercises } from "./stall";

const TODAY = "2027-03-01";

describe("stalled lifts", () => {
  it("calls a lift stalled when three weeks of sessions never beat the earlier best", () => {
    const stalls = stalledExercises([best("2027-01-25", 140), best("2027-02-15", 138), best("2027-02-22", 140)], TODAY);
    expect(stalls).toEqual([{ exerciseKey: "back-squat", exercise: "back squat", best: 140, since: "2027-01-25" }]);
  });

  it("does not call it stalled once a session in the window beats the earlier best", () => {
    expect(stalledExercises([best("2027-01-25", 140), best("2027-02-15", 138), best("2027-02-22", 141)], TODAY)).toEqual([]);
  });

  it("needs history before the window and two sessions inside it", () => {
    expect(stalledExercises([best("2027-02-15", 138), best("2027-02-22", 130)], TODAY)).toEqual([]);
    expect(stalledExercises([best("2027-01-25", 140), best("2027-02-22", 130)], TODAY)).toEqual([]);
  });
});
