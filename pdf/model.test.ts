import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { parseAthleteProfile } from "../lib/athlete/profile";
import { expandProgramme } from "../lib/load/index";
import { parseProgramme } from "../lib/notation/index";
import { cardView, longDate, longDateRange } from "./model";

// ECMA-402 (Intl) spells the weekday and month of a calendar date; the card does it without a time zone.
const intl = (date: string) =>
  new Intl.DateTimeFormat("en-GB", { weekday: "short", day: "numeric", month: "short", year: "numeric", timeZone: "UTC" })
    .format(new Date(`${date}T00:00:00Z`))
    .replace(/,/g, "");

function sampleWeek() {
  const r = parseAthleteProfile(JSON.parse(readFileSync("pdf/fixtures/tomas-kg.json", "utf8")));
  if (!r.ok) throw new Error(r.errors.join("; "));
  const { programme } = parseProgramme(readFileSync("pdf/fixtures/eight-exercises.iq", "utf8"));
  return expandProgramme(programme, r.profile, { start: "2026-12-07", weeks: 1 }).sessions;
}

describe("card text", () => {
  it("spells dates with the weekday of the Gregorian calendar, across month, year and leap-day edges", () => {
    for (const d of ["2026-12-07", "2027-01-01", "2028-02-29", "2026-12-31", "2000-03-01"]) expect(longDate(d)).toBe(intl(d));
  });

  it("writes a date range once per shared month and year", () => {
    expect(longDateRange("2026-12-07", "2026-12-13")).toBe("7–13 Dec 2026");
    expect(longDateRange("2026-11-30", "2026-12-27")).toBe("30 Nov – 27 Dec 2026");
    expect(longDateRange("2026-12-28", "2027-01-03")).toBe("28 Dec 2026 – 3 Jan 2027");
  });

  it("groups equal work sets, keeps warm-up steps apart and gives one write-in cell per work set", () => {
    const [dayA] = sampleWeek();
    const card = cardView(dayA, { athlete: "Tomas Brenner" });
    expect(card).toMatchObject({ athlete: "Tomas Brenner", units: "kg", dateText: "Mon 7 Dec 2026", isoWeek: "2026-W50", day: "Day A", blockText: "Base · week 1", deload: false });
    const squat = card.exercises[0];
    expect(squat.work).toEqual([{ count: 5, reps: "5", load: "105 kg", bare: "105", plates: "25 · 15 · 2.5" }]);
    expect(squat.workSets).toBe(5);
    expect(squat.warmups.map((w) => `${w.bare}×${w.reps}`)).toEqual(["42.5×8", "62.5×5", "77.5×3", "90×1"]);
    expect(squat.details).toEqual(["rest 3 min"]);
    expect(squat.cue).toBe("brace, then sit between the heels");
  });

  it("shows superset labels, tempo, pauses, bodyweight loads, timed sets and substitutes with their own loads", () => {
    const [dayA] = sampleWeek();
    const ex = Object.fromEntries(cardView(dayA, { athlete: "T" }).exercises.map((e) => [e.name, e]));
    expect(ex["bench press"]).toMatchObject({ label: "A1", effort: "2 RIR", details: ["rest 2 min", "pause 1 s"] });
    expect(ex["pull-up"]).toMatchObject({ label: "A2", work: [{ count: 4, reps: "5–8", load: "BW + 5 kg", plates: null }] });
    expect(ex["pull-up"].substitutes).toEqual([{ name: "lat pulldown", text: "4 × 5–8 (the written load is for pull-up)" }]);
    expect(ex["romanian deadlift"].details).toEqual(["tempo 3110"]);
    // 60 kg on a 20 kg bar: 20 kg a side.
    expect(ex["romanian deadlift"].substitutes).toEqual([{ name: "good morning", text: "3 × 8 · 60 kg · 20 a side" }]);
    expect(ex["barbell row"].substitutes[1]).toEqual({ name: "dumbbell row", text: "3 × 8–10 (no 1RM on file for dumbbell row)" });
    expect(ex.plank).toMatchObject({ timed: true, workSets: 3, work: [{ count: 3, reps: "45 s" }] });
  });

  it("names the programme week when it differs from the week of the block, and marks a deload", () => {
    const weeks = sampleWeek();
    const s = { ...weeks[0], block: "Peak", week: 2, weekInProgramme: 6, deload: true };
    expect(cardView(s, { athlete: "T" })).toMatchObject({ blockText: "Peak · week 2 · programme week 6", deload: true });
  });
});
