import { describe, expect, it } from "vitest";
import { addDays as dfAddDays, format, nextMonday, nextThursday } from "date-fns";
import { blockWeekdays, scheduleWeeks } from "./schedule";

const local = (s: string) => {
  const [y, m, d] = s.split("-").map(Number);
  return new Date(y, m - 1, d);
};
const ymd = (d: Date) => format(d, "yyyy-MM-dd");

describe("scheduling days on the calendar", () => {
  it("starts week k at start + 7(k − 1) days, across blocks", () => {
    const blocks = [{ weeks: 2, days: [{ weekday: "mon" as const }] }, { weeks: 2, days: [{ weekday: "mon" as const }] }];
    const { slots } = scheduleWeeks(blocks, "2027-01-04");
    // date-fns addDays as the external reference.
    expect(slots.map((s) => s.date)).toEqual([0, 1, 2, 3].map((k) => ymd(dfAddDays(local("2027-01-04"), 7 * k))));
    expect(slots.map((s) => [s.blockIndex, s.weekOfBlock, s.weekInProgramme])).toEqual([[0, 1, 1], [0, 2, 2], [1, 1, 3], [1, 2, 4]]);
  });

  it("puts a tagged day on its weekday inside a week that starts mid-week", () => {
    // Start Wednesday 2027-01-06: the week runs Wed–Tue, so Thursday is the 7th and Monday the 11th.
    const { slots } = scheduleWeeks([{ weeks: 1, days: [{ weekday: "thu" }, { weekday: "mon" }] }], "2027-01-06");
    expect(slots.map((s) => s.date)).toEqual([ymd(nextThursday(local("2027-01-06"))), ymd(nextMonday(local("2027-01-06")))]);
  });

  it("gives untagged days the listed weekdays in order", () => {
    const days = [{ weekday: null }, { weekday: "sat" as const }, { weekday: null }];
    expect(blockWeekdays(days, ["tue", "fri"]).weekdays).toEqual(["tue", "sat", "fri"]);
    const { slots } = scheduleWeeks([{ weeks: 1, days }], "2027-01-04", ["tue", "fri"]);
    expect(slots.map((s) => s.date)).toEqual(["2027-01-05", "2027-01-09", "2027-01-08"]);
  });

  it("spreads untagged days over the week when no list is given", () => {
    expect(blockWeekdays([{ weekday: null }, { weekday: null }, { weekday: null }], undefined).weekdays).toEqual(["mon", "wed", "fri"]);
  });

  it("notes when the weekday list is shorter than the untagged days", () => {
    const { notes, slots } = scheduleWeeks([{ weeks: 1, days: [{ weekday: null }, { weekday: null }] }], "2027-01-04", ["wed"]);
    expect(notes).toHaveLength(1);
    expect(slots.map((s) => s.weekday)).toEqual(["wed", "thu"]);
  });

  it("stops after the requested number of weeks", () => {
    const { slots } = scheduleWeeks([{ weeks: 4, days: [{ weekday: "mon" }] }, { weeks: 4, days: [{ weekday: "fri" }] }], "2027-01-04", undefined, 5);
    expect(slots).toHaveLength(5);
    expect(slots[4].date).toBe("2027-02-05");
  });

  it("skips blocks with no weeks and refuses dates past 9999", () => {
    expect(scheduleWeeks([{ weeks: 0, days: [{ weekday: "mon" }] }], "2027-01-04").slots).toEqual([]);
    const r = scheduleWeeks([{ weeks: 3, days: [{ weekday: "mon" }] }], "9999-12-20");
    expect(r.slots).toHaveLength(1);
    expect(r.notes[0].message).toMatch(/9999/);
  });
});
