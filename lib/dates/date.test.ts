import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { addDays as dfAddDays, format, getISODay } from "date-fns";
import { addDays, fromDayNumber, isDateString, isoWeekdayNumber, nextOnOrAfter, toDayNumber, weekdayOf } from "./date";

// date-fns works in local time; building the Date from parts keeps it on the same calendar day.
const local = (s: string) => {
  const [y, m, d] = s.split("-").map(Number);
  return new Date(y, m - 1, d);
};

describe("date-only arithmetic", () => {
  it("accepts real calendar dates and rejects impossible ones", () => {
    // Gregorian leap rule: 2028 is a leap year, 2027 and 2100 are not (ISO 8601 calendar).
    expect(isDateString("2028-02-29")).toBe(true);
    expect(isDateString("2027-02-29")).toBe(false);
    expect(isDateString("2100-02-29")).toBe(false);
    expect(isDateString("2000-02-29")).toBe(true);
    expect(isDateString("2027-13-01")).toBe(false);
    expect(isDateString("2027-1-4")).toBe(false);
    expect(isDateString("04/01/2027")).toBe(false);
  });

  it("counts days from the Unix epoch and back", () => {
    expect(toDayNumber("1970-01-01")).toBe(0);
    expect(fromDayNumber(toDayNumber("2027-01-04"))).toBe("2027-01-04");
  });

  it("adds days across month, year and leap-day boundaries like date-fns", () => {
    // Reference: date-fns addDays on local calendar dates.
    fc.assert(
      fc.property(fc.integer({ min: toDayNumber("1990-01-01"), max: toDayNumber("2090-12-31") }), fc.integer({ min: -800, max: 800 }), (day, n) => {
        const s = fromDayNumber(day);
        expect(addDays(s, n)).toBe(format(dfAddDays(local(s), n), "yyyy-MM-dd"));
      }),
    );
  });

  it("names weekdays as date-fns numbers them (ISO Monday = 1)", () => {
    fc.assert(
      fc.property(fc.integer({ min: toDayNumber("1990-01-01"), max: toDayNumber("2090-12-31") }), (day) => {
        const s = fromDayNumber(day);
        expect(isoWeekdayNumber(s)).toBe(getISODay(local(s)));
      }),
    );
    expect(weekdayOf("2027-01-04")).toBe("mon");
  });

  it("moves forward to the requested weekday, staying put when already on it", () => {
    expect(nextOnOrAfter("2027-01-04", "mon")).toBe("2027-01-04");
    expect(nextOnOrAfter("2027-01-06", "mon")).toBe("2027-01-11");
    expect(nextOnOrAfter("2027-01-06", "thu")).toBe("2027-01-07");
  });

  it("does not drift when the process time zone observes daylight saving", () => {
    const saved = process.env.TZ;
    try {
      for (const tz of ["Europe/Berlin", "America/Los_Angeles", "Pacific/Kiritimati"]) {
        process.env.TZ = tz;
        // 2027-03-28 (EU) and 2027-03-14 (US) are clock changes; UTC day counts ignore them.
        for (let n = 0; n < 30; n++) {
          expect(addDays("2027-03-10", n)).toBe(format(dfAddDays(local("2027-03-10"), n), "yyyy-MM-dd"));
        }
        expect(weekdayOf("2027-03-28")).toBe("sun");
      }
    } finally {
      if (saved === undefined) delete process.env.TZ;
      else process.env.TZ = saved;
    }
  });
});
