import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { endOfISOWeek, format, getISOWeeksInYear, setISOWeek, startOfISOWeek } from "date-fns";
import { calendarQuery, calendarView, parseIsoWeek, parseMonth } from "./view";

const ymd = (d: Date) => format(d, "yyyy-MM-dd");

describe("calendar view from search params", () => {
  it("shows the month holding today when nothing is asked", () => {
    const v = calendarView({}, "2027-01-06");
    expect(v).toMatchObject({ kind: "month", title: "January 2027", from: "2026-12-28", to: "2027-01-31", fellBack: false });
    expect(v.prev).toEqual({ month: "2026-12" });
    expect(v.next).toEqual({ month: "2027-02" });
    expect(v.other).toEqual({ week: "2027-W01" });
  });

  it("shows one ISO week from Monday to Sunday with its neighbours", () => {
    // ISO 8601: 2027-W01-1 is 2027-01-04; the week before is 2026-W53 (REFERENCE-VALUES).
    const v = calendarView({ week: "2027-W01" }, "2027-03-01");
    expect(v).toMatchObject({ kind: "week", from: "2027-01-04", to: "2027-01-10", fellBack: false });
    expect(v.title).toBe("2027-W01 · 4 Jan – 10 Jan 2027");
    expect(v.prev).toEqual({ week: "2026-W53" });
    expect(v.next).toEqual({ week: "2027-W02" });
    expect(v.current).toEqual({ week: "2027-W09" });
  });

  it("goes from a week to the month of its Thursday and back to the same week", () => {
    // ISO 8601 dates a week by its Thursday: 2026-W53 (28 Dec – 3 Jan) belongs to December 2026.
    const week = calendarView({ week: "2026-W53" }, "2027-01-06");
    expect(week.other).toEqual({ month: "2026-12" });
    expect(week.title).toBe("2026-W53 · 28 Dec 2026 – 3 Jan 2027");
    const month = calendarView({ month: "2027-02" }, "2027-01-06");
    expect(month.other).toEqual({ week: "2027-W05" });
  });

  it("falls back to today's period for params it cannot read", () => {
    for (const month of ["2027-13", "27-01", "2027-1", "nonsense", "0000-01"]) {
      expect(calendarView({ month }, "2027-01-06")).toMatchObject({ kind: "month", title: "January 2027", fellBack: true });
    }
    for (const week of ["2027-W53", "2027-W00", "2027W01", "2027-W1"]) {
      expect(calendarView({ week }, "2027-01-06")).toMatchObject({ kind: "week", from: "2027-01-04", fellBack: true });
    }
  });

  it("accepts week 53 only in years that have one, like date-fns", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1990, max: 2090 }), fc.integer({ min: 1, max: 53 }), (year, week) => {
        const label = `${year}-W${String(week).padStart(2, "0")}`;
        // Reference: date-fns getISOWeeksInYear and setISOWeek (ISO 8601 week-numbering years).
        const jan4 = new Date(year, 0, 4);
        const valid = week <= getISOWeeksInYear(jan4);
        expect(parseIsoWeek(label)).toBe(valid ? ymd(startOfISOWeek(setISOWeek(jan4, week))) : null);
        if (valid) expect(calendarView({ week: label }, "2027-01-06").to).toBe(ymd(endOfISOWeek(setISOWeek(jan4, week))));
      }),
      { numRuns: 500 },
    );
  });

  it("reads months and writes query strings", () => {
    expect(parseMonth("2027-12")).toEqual({ year: 2027, month: 12 });
    expect(parseMonth(undefined)).toBeNull();
    expect(calendarQuery({ month: "2027-01" })).toBe("?month=2027-01");
    expect(calendarQuery({ week: "2027-W01" })).toBe("?week=2027-W01");
    expect(calendarQuery({})).toBe("");
  });
});
