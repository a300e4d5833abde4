import { describe, expect, it } from "vitest";
import { parseAthleteProfile } from "./profile";
import { defaultPresetFor, EQUIPMENT_PRESETS, equipmentPreset } from "./presets";

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
});
