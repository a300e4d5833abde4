import { describe, expect, it } from "vitest";
import { parseProgramme } from "./index";

describe("settings lines", () => {
  it("set title, units, rounding and model, with keys in any case", () => {
    const { programme, diagnostics } = parseProgramme("Title: Spring\nUNITS: LB\nround: 5\nmodel: Epley\nlevel: beginner");
    expect(diagnostics).toEqual([]);
    expect(programme).toMatchObject({ title: "Spring", units: "lb", round: 5, model: "epley", meta: { level: "beginner" } });
  });
  it("default to kg, no rounding override and Brzycki", () => {
    expect(parseProgramme("").programme).toEqual({ title: null, units: "kg", round: null, model: "brzycki", meta: {}, blocks: [] });
  });
  it("suggest the nearest unit and model", () => {
    const msgs = parseProgramme("units: kgs\nmodel: epely").diagnostics.map((d) => d.message);
    expect(msgs).toEqual(["unknown unit 'kgs' — did you mean kg?", "unknown model 'epely' — did you mean epley?"]);
  });
  it("reject a repeated key, naming the first line", () => {
    const d = parseProgramme("title: A\ntitle: B").diagnostics;
    expect(d.map((x) => [x.line, x.severity, x.message])).toEqual([[2, "error", "title is already set on line 1"]]);
  });
  it("warn about unknown keys and keep their text", () => {
    const r = parseProgramme("titel: A");
    expect(r.diagnostics.map((d) => d.message)).toEqual(["unknown setting 'titel' — did you mean title?"]);
    expect(r.programme.meta).toEqual({ titel: "A" });
  });
  it("reject empty values and a bad rounding step", () => {
    expect(parseProgramme("units:\nround: 0").diagnostics.map((d) => d.severity)).toEqual(["error", "error"]);
  });
  it("keep a key such as __proto__ as an ordinary entry", () => {
    const meta = parseProgramme("__proto__: x").programme.meta;
    expect(Object.keys(meta)).toEqual(["__proto__"]);
  });
  it("warn about settings after the first day", () => {
    expect(parseProgramme("day A\n  squat 3x5\nunits: lb").diagnostics.map((d) => d.message)).toEqual(["settings go at the top, before the first block or day"]);
  });
});
