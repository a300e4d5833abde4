import { describe, expect, it } from "vitest";
import { parseAthleteProfile } from "./profile";
import { defaultPresetFor, EQUIPMENT_PRESETS, equipmentPreset, matchingPreset } from "./presets";

describe("equipment presets", () => {
  it("each makes a valid athlete profile", () => {
    for (const p of EQUIPMENT_PRESETS) {
      const r = parseAthleteProfile({ name: "X", units: p.units, bar: p.bar, plates: p.plates, dumbbellStep: p.dumbbellStep, machineStep: p.machineStep });
      expect(r.ok, p.id).toBe(true);
    }
  });

  it("uses the 20 kg men's bar and the IWF/IPF disc series for kg club gyms", () => {
    // IWF Technical and Competition Rules, "Sport equipment"; IPF Technical Rules, "Bars and discs"
    const club = equipmentPreset("kg-club");
    expect(club.bar).toBe(20);
    for (const d of club.plates as number[]) expect([50, 25, 20, 15, 10, 5, 2.5, 2, 1.5, 1.25, 1, 0.5, 0.25]).toContain(d);
  });

  it("starts lb athletes on a 45 lb bar", () => {
    // common practice, no single source
    expect(defaultPresetFor("lb").bar).toBe(45);
    expect(defaultPresetFor("kg").units).toBe("kg");
  });

  it("falls back to the kg club gym for an unknown id", () => {
    expect(equipmentPreset("moon-base").id).toBe("kg-club");
  });

  it("recognises a preset whatever the order of the plates or the key order of stored pairs", () => {
    const home = equipmentPreset("kg-home");
    const reordered = (home.plates as { weight: number; pairs: number }[]).map((x) => ({ pairs: x.pairs, weight: x.weight })).reverse();
    expect(matchingPreset({ ...home, plates: reordered })).toBe("kg-home");
    expect(matchingPreset({ ...home, plates: reordered.map((x, i) => (i === 0 ? { ...x, pairs: x.pairs + 1 } : x)) })).toBeNull();
    expect(matchingPreset({ ...equipmentPreset("lb-club"), machineStep: 5 })).toBeNull();
  });
});
