import { describe, expect, it } from "vitest";
import { CATALOGUE } from "../exercises/catalogue";
import { exerciseMatcher } from "./exerciseMatch";
import { checkMax } from "./maxEntry";

const resolve = exerciseMatcher(CATALOGUE.flatMap((e) => [e.name, ...e.aliases].map((name) => ({ name, exercise: e.name }))));
const rules = { latestDate: "2027-01-10" };

describe("checkMax", () => {
  it("accepts a complete max and files it under the exercise's own name", () => {
    const r = checkMax({ exercise: "Bench", value: "102.5", unit: "KG", date: "2027-01-04", kind: "TM", source: "Estimated", note: "  from a triple " }, resolve, rules);
    expect(r).toEqual({
      ok: true,
      max: { exercise: "bench press", exerciseKey: "bench-press", value: 102.5, unit: "kg", date: "2027-01-04", kind: "tm", source: "estimated", note: "from a triple" },
    });
  });

  it("defaults kind to 1rm, source to tested and an empty note to none", () => {
    const r = checkMax({ exercise: "deadlift", value: 200, unit: "lbs", date: "2027-01-10" }, resolve, rules);
    expect(r.ok && [r.max.kind, r.max.source, r.max.note, r.max.unit]).toEqual(["1rm", "tested", null, "lb"]);
  });

  it("reads a decimal comma as spreadsheets in many locales write it", () => {
    const r = checkMax({ exercise: "deadlift", value: "182,5", unit: "kg", date: "2027-01-01" }, resolve, rules);
    expect(r.ok && r.max.value).toBe(182.5);
  });

  it("names every bad field at once", () => {
    const r = checkMax({ exercise: "bench pres", value: "lots", unit: "st", date: "2027-02-30", kind: "5rm", source: "guess", note: "x".repeat(501) }, resolve, rules);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(Object.keys(r.errors).sort()).toEqual(["date", "exercise", "kind", "note", "source", "unit", "value"]);
    expect(r.errors.exercise).toMatch(/did you mean bench press/);
    expect(r.suggestions).toContain("bench press");
    expect(r.errors.value).toBe("“lots” is not a number");
    expect(r.errors.unit).toBe("“st” is not one of kg or lb");
    // 2027 is not a leap year, so February has 28 days (Gregorian calendar rule).
    expect(r.errors.date).toBe("“2027-02-30” is not a date written YYYY-MM-DD");
  });

  it("refuses a date after the latest allowed day, and accepts that day itself", () => {
    expect(checkMax({ exercise: "squat", value: 1, unit: "kg", date: "2027-01-11" }, resolve, rules)).toMatchObject({ ok: false, errors: { date: "2027-01-11 is in the future; enter the day it was measured" } });
    expect(checkMax({ exercise: "squat", value: 1, unit: "kg", date: "2027-01-10" }, resolve, rules).ok).toBe(true);
  });

  it("points out a unit written into the value", () => {
    const r = checkMax({ exercise: "squat", value: "140kg", unit: "kg", date: "2027-01-01" }, resolve, rules);
    expect(r.ok ? "" : r.errors.value).toMatch(/put the unit in the unit column/);
  });

  it("keeps values within what the table stores", () => {
    const at = (value: unknown) => checkMax({ exercise: "squat", value, unit: "kg", date: "2027-01-01" }, resolve, rules);
    expect(at(0)).toMatchObject({ ok: false, errors: { value: "must be greater than 0" } });
    expect(at("-5")).toMatchObject({ ok: false, errors: { value: "“-5” is not a number" } });
    expect(at(10_001)).toMatchObject({ ok: false, errors: { value: "must be at most 10000" } });
    expect(at(10_000).ok).toBe(true);
    expect(at(100.1234)).toMatchObject({ ok: false, errors: { value: "use at most three decimals" } });
  });

  it("asks for the required fields when they are missing, and refuses wrong types", () => {
    const r = checkMax({}, resolve, rules);
    expect(r.ok ? {} : r.errors).toEqual({ exercise: "enter the exercise", value: "enter the max, e.g. 142.5", unit: "enter kg or lb", date: "enter the day it was measured, as YYYY-MM-DD" });
    const typed = checkMax({ exercise: { a: 1 }, value: true, unit: "kg", date: 20270101 }, resolve, rules);
    expect(typed.ok ? {} : typed.errors).toMatchObject({ exercise: "expected the exercise's name as text", value: "must be a number" });
  });
});
