import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  addMonths as dfAddMonths,
  eachDayOfInterval,
  endOfISOWeek,
  endOfMonth,
  format,
  getISODay,
  getISOWeek,
  getISOWeekYear,
  lastDayOfMonth,
  startOfISOWeek,
  startOfMonth,
} from "date-fns";
import { fromDayNumber, toDayNumber } from "../dates";
import { addMonths, lastOfMonth, monthGrid, monthOf, startOfIsoWeek, weekStrip } from "./grid";

// date-fns works in local time; building the Date from parts keeps it on the same calendar day.
const local = (s: string) => {
  const [y, m, d] = s.split("-").map(Number);
  return new Date(y, m - 1, d);
};
const ymd = (d: Date) => format(d, "yyyy-MM-dd");
const anyDay = fc.integer({ min: toDayNumber("1990-01-01"), max: toDayNumber("2090-12-31") }).map(fromDayNumber);
const anyMonth = fc.record({ year: fc.integer({ min: 1990, max: 2090 }), month: fc.integer({ min: 1, max: 12 }) });

describe("month grid", () => {
  it("lays out January 2027 from Monday 28 Dec 2026 (2026-W53) to Sunday 31 Jan 2027", () => {
    // ISO 8601 week dates: 2026-12-28 is 2026-W53-1 and 2027-01-04 is 2027-W01-1 (REFERENCE-VALUES, checked against date-fns below).
    const grid = monthGrid({ year: 2027, month: 1 });
    expect(grid.from).toBe("2026-12-28");
    expect(grid.to).toBe("2027-01-31");
    expect(grid.weeks.map((w) => w.label)).toEqual(["2026-W53", "2027-W01", "2027-W02", "2027-W03", "2027-W04"]);
    expect(grid.weeks[0].days.slice(0, 4).every((d) => !d.inMonth)).toBe(true);
    expect(grid.weeks[0].days[4]).toMatchObject({ date: "2027-01-01", day: 1, weekday: 5, inMonth: true });
  });

  it("needs only four rows when a 28-day February starts on a Monday", () => {
    // 1 Feb 2027 is a Monday and 2027 is not a leap year (Gregorian rule); date-fns agrees on both.
    expect(getISODay(local("2027-02-01"))).toBe(1);
    expect(monthGrid({ year: 2027, month: 2 }).weeks).toHaveLength(4);
  });

  it("runs from the ISO week start of the 1st to the ISO week end of the last day, like date-fns", () => {
    fc.assert(
      fc.property(anyMonth, (ym) => {
        const grid = monthGrid(ym);
        const first = new Date(ym.year, ym.month - 1, 1);
        // Reference: date-fns startOfISOWeek/endOfISOWeek (Monday-first weeks, ISO 8601).
        expect(grid.from).toBe(ymd(startOfISOWeek(startOfMonth(first))));
        expect(grid.to).toBe(ymd(endOfISOWeek(endOfMonth(first))));
        const all = grid.weeks.flatMap((w) => w.days.map((d) => d.date));
        expect(all).toEqual(eachDayOfInterval({ start: local(grid.from), end: local(grid.to) }).map(ymd));
        expect(grid.weeks.length).toBeGreaterThanOrEqual(4);
        expect(grid.weeks.length).toBeLessThanOrEqual(6);
      }),
      { numRuns: 300 },
    );
  });

  it("labels each row with the ISO week and year date-fns gives its Monday", () => {
    fc.assert(
      fc.property(anyMonth, (ym) => {
        for (const w of monthGrid(ym).weeks) {
          const monday = local(w.days[0].date);
          // Reference: date-fns getISOWeekYear/getISOWeek (ISO 8601 week-numbering year).
          expect(w.label).toBe(`${getISOWeekYear(monday)}-W${String(getISOWeek(monday)).padStart(2, "0")}`);
          expect(w.week).toBe(getISOWeek(monday));
          expect(w.days.map((d) => d.weekday)).toEqual([1, 2, 3, 4, 5, 6, 7]);
        }
      }),
      { numRuns: 200 },
    );
  });

  it("flags exactly the days of the month as in the month", () => {
    fc.assert(
      fc.property(anyMonth, (ym) => {
        const grid = monthGrid(ym);
        const inside = grid.weeks.flatMap((w) => w.days.filter((d) => d.inMonth).map((d) => d.date));
        const first = new Date(ym.year, ym.month - 1, 1);
        // Reference: date-fns startOfMonth/lastDayOfMonth.
        expect(inside).toEqual(eachDayOfInterval({ start: first, end: lastDayOfMonth(first) }).map(ymd));
      }),
      { numRuns: 200 },
    );
  });

  it("marks today once when it is on the grid and not at all otherwise", () => {
    const grid = monthGrid({ year: 2027, month: 1 }, "2027-01-04");
    const marked = grid.weeks.flatMap((w) => w.days.filter((d) => d.today).map((d) => d.date));
    expect(marked).toEqual(["2027-01-04"]);
    const leading = monthGrid({ year: 2027, month: 1 }, "2026-12-29");
    expect(leading.weeks[0].days[1]).toMatchObject({ today: true, inMonth: false });
    const far = monthGrid({ year: 2027, month: 1 }, "2027-06-01");
    expect(far.weeks.some((w) => w.days.some((d) => d.today))).toBe(false);
  });

  it("knows the last day of every month, leap Februaries included", () => {
    // Gregorian leap rule: 2028 and 2000 are leap years, 2100 is not; date-fns lastDayOfMonth as reference.
    expect(lastOfMonth({ year: 2028, month: 2 })).toBe("2028-02-29");
    expect(lastOfMonth({ year: 2100, month: 2 })).toBe("2100-02-28");
    fc.assert(
      fc.property(anyMonth, (ym) => {
        expect(lastOfMonth(ym)).toBe(ymd(lastDayOfMonth(new Date(ym.year, ym.month - 1, 1))));
      }),
    );
  });

  it("steps months across year ends like date-fns addMonths", () => {
    expect(addMonths({ year: 2027, month: 1 }, -1)).toEqual({ year: 2026, month: 12 });
    fc.assert(
      fc.property(anyMonth, fc.integer({ min: -40, max: 40 }), (ym, n) => {
        const d = dfAddMonths(new Date(ym.year, ym.month - 1, 1), n);
        expect(addMonths(ym, n)).toEqual({ year: d.getFullYear(), month: d.getMonth() + 1 });
      }),
    );
    expect(monthOf("2027-02-14")).toEqual({ year: 2027, month: 2 });
  });
});

describe("week strip", () => {
  it("starts every date's week on the Monday date-fns startOfISOWeek gives", () => {
    fc.assert(
      fc.property(anyDay, (date) => {
        // Reference: date-fns startOfISOWeek / endOfISOWeek.
        expect(startOfIsoWeek(date)).toBe(ymd(startOfISOWeek(local(date))));
        const strip = weekStrip(date);
        expect(strip.from).toBe(ymd(startOfISOWeek(local(date))));
        expect(strip.to).toBe(ymd(endOfISOWeek(local(date))));
        expect(strip.days.map((d) => d.date)).toEqual(eachDayOfInterval({ start: local(strip.from), end: local(strip.to) }).map(ymd));
        expect([strip.year, strip.week]).toEqual([getISOWeekYear(local(date)), getISOWeek(local(date))]);
      }),
      { numRuns: 1000 },
    );
  });

  it("puts Friday 1 January 2027 in 2026-W53", () => {
    // ISO 8601: 2027-01-01 is 2026-W53-5 (REFERENCE-VALUES).
    const strip = weekStrip("2027-01-01", "2027-01-01");
    expect(strip.label).toBe("2026-W53");
    expect(strip.days[4]).toMatchObject({ date: "2027-01-01", today: true, inMonth: true });
  });
});
