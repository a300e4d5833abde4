import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { getISODay, getISOWeek, getISOWeekYear } from "date-fns";
import { fromIsoWeek, isoWeek, isoWeekDateLabel, isoWeekLabel } from "./isoWeek";
import { fromDayNumber, toDayNumber } from "./date";

const local = (s: string) => {
  const [y, m, d] = s.split("-").map(Number);
  return new Date(y, m - 1, d);
};

describe("ISO 8601 week dates", () => {
  it("puts 1 January 2027 in the last week of 2026", () => {
    // ISO 8601: week 01 holds the year's first Thursday; checked against date-fns.
    expect(isoWeekDateLabel("2027-01-01")).toBe("2026-W53-5");
    expect(getISOWeekYear(local("2027-01-01"))).toBe(2026);
    expect(getISOWeek(local("2027-01-01"))).toBe(53);
  });

  it("starts 2026-W53 on 28 December 2026", () => {
    // ISO 8601; date-fns agrees.
    expect(isoWeekDateLabel("2026-12-28")).toBe("2026-W53-1");
    expect(getISOWeek(local("2026-12-28"))).toBe(53);
  });

  it("starts 2027-W01 on Monday 4 January 2027", () => {
    // ISO 8601: week 01 is the week containing 4 January.
    expect(fromIsoWeek(2027, 1, 1)).toBe("2027-01-04");
    expect(isoWeekLabel("2027-01-04")).toBe("2027-W01");
  });

  it("agrees with date-fns on every date over a century", () => {
    fc.assert(
      fc.property(fc.integer({ min: toDayNumber("1980-01-01"), max: toDayNumber("2090-12-31") }), (day) => {
        const s = fromDayNumber(day);
        const w = isoWeek(s);
        const d = local(s);
        expect([w.year, w.week, w.day]).toEqual([getISOWeekYear(d), getISOWeek(d), getISODay(d)]);
      }),
      { numRuns: 2000 },
    );
  });

  it("turns a week date back into the same calendar date", () => {
    fc.assert(
      fc.property(fc.integer({ min: toDayNumber("1980-01-01"), max: toDayNumber("2090-12-31") }), (day) => {
        const s = fromDayNumber(day);
        const w = isoWeek(s);
        expect(fromIsoWeek(w.year, w.week, w.day)).toBe(s);
      }),
    );
  });
});
