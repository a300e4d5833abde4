import { describe, expect, it } from "vitest";
import { convertBodyweight, parseEquipment } from "./equipment";
import { EQUIPMENT_PRESETS, matchingPreset } from "./presets";

const base = { units: "kg", bodyweight: 82.5, bar: 20, plates: [5, 25, 1.25, 10, 2.5, 20, 15], dumbbellStep: 2, machineStep: 5 };

describe("equipment", () => {
  it("accepts every preset with and without a bodyweight", () => {
    for (const p of EQUIPMENT_PRESETS) {
      const input = { units: p.units, bar: p.bar, plates: p.plates, dumbbellStep: p.dumbbellStep, machineStep: p.machineStep };
      expect(parseEquipment({ ...input, bodyweight: null }).ok, p.id).toBe(true);
      expect(parseEquipment({ ...input, bodyweight: 70 }).ok, p.id).toBe(true);
    }
  });

  it("sorts plates heaviest first so the preset they came from is recognised", () => {
    const r = parseEquipment(base);
    expect(r.ok && r.equipment.plates).toEqual([25, 20, 15, 10, 5, 2.5, 1.25]);
    expect(r.ok && matchingPreset(r.equipment)).toBe("kg-club");
    expect(matchingPreset({ ...base, units: "kg", bar: 15 } as never)).toBeNull();
  });

  it("names the field at fault, down to the plate", () => {
    const r = parseEquipment({ ...base, units: "st", bar: 150, plates: [{ weight: 20, pairs: 2 }, { weight: 10, pairs: -1 }], dumbbellStep: 60, colour: "red" });
    expect(r.ok ? {} : r.fields).toEqual({
      units: 'expected "kg" or "lb"',
      bar: "must be at most 100",
      "plates.1.pairs": "must be 0 or more",
      dumbbellStep: "must be at most 50",
      _: 'unknown field "colour"',
    });
  });

  it("refuses an empty plate list and a plate listed twice", () => {
    expect(parseEquipment({ ...base, plates: [] })).toEqual({ ok: false, fields: { plates: "list at least one plate" } });
    expect(parseEquipment({ ...base, plates: [20, 10, 20] })).toEqual({ ok: false, fields: { "plates.2": "20 is listed twice" } });
  });

  it("converts bodyweight to the other unit to one decimal", () => {
    // 1 lb = 0.45359237 kg exactly (NIST SP 811, Appendix B): 80 kg = 176.37 lb, 200 lb = 90.72 kg.
    expect(convertBodyweight(80, "kg", "lb")).toBe(176.4);
    expect(convertBodyweight(200, "lb", "kg")).toBe(90.7);
    expect(convertBodyweight(80, "kg", "kg")).toBe(80);
  });
});
