import { describe, expect, it } from "vitest";
import { itemsByDate } from "./place";

describe("items by date", () => {
  it("groups items under their day and keeps their order within it", () => {
    const byDay = itemsByDate([
      { date: "2027-01-04", id: "a" },
      { date: "2027-01-06", id: "b" },
      { date: "2027-01-04", id: "c" },
    ]);
    expect(byDay.get("2027-01-04")?.map((s) => s.id)).toEqual(["a", "c"]);
    expect(byDay.get("2027-01-06")?.map((s) => s.id)).toEqual(["b"]);
    expect(byDay.get("2027-01-05")).toBeUndefined();
  });
});
