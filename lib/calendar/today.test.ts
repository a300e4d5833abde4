import { describe, expect, it } from "vitest";
import { calendarDateIn, todayFor } from "./today";

describe("today in the person's time zone", () => {
  it("is still yesterday on the US west coast when UTC has passed midnight", () => {
    // IANA tz database: America/Los_Angeles is UTC−8 in January (PST), so 02:00 UTC on the 5th is 18:00 on the 4th.
    expect(calendarDateIn("America/Los_Angeles", new Date("2027-01-05T02:00:00Z"))).toBe("2027-01-04");
    // IANA tz database: Pacific/Kiritimati is UTC+14 all year, so 11:00 UTC on the 4th is 01:00 on the 5th.
    expect(calendarDateIn("Pacific/Kiritimati", new Date("2027-01-04T11:00:00Z"))).toBe("2027-01-05");
    expect(calendarDateIn("UTC", new Date("2027-01-04T23:59:59Z"))).toBe("2027-01-04");
  });

  it("follows summer time", () => {
    // IANA tz database: Europe/Berlin is UTC+2 in July (CEST), so 22:30 UTC on 1 July is 00:30 on 2 July.
    expect(calendarDateIn("Europe/Berlin", new Date("2027-07-01T22:30:00Z"))).toBe("2027-07-02");
    // …and UTC+1 in January (CET), so 22:30 UTC stays on the same day.
    expect(calendarDateIn("Europe/Berlin", new Date("2027-01-01T22:30:00Z"))).toBe("2027-01-01");
  });

  it("falls back to the UTC day for a missing or unknown zone", () => {
    expect(calendarDateIn("Not/AZone", new Date("2027-01-05T02:00:00Z"))).toBeNull();
    expect(todayFor("Not/AZone", new Date("2027-01-05T02:00:00Z"))).toBe("2027-01-05");
    expect(todayFor(undefined, new Date("2027-01-05T02:00:00Z"))).toBe("2027-01-05");
    expect(todayFor("America/Los_Angeles", new Date("2027-01-05T02:00:00Z"))).toBe("2027-01-04");
  });
});
