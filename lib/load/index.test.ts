import { describe, expect, it } from "vitest";
import * as load from "./index";

describe("load engine public surface", () => {
  it("exposes the functions other parts of the product code against", () => {
    for (const name of ["expandProgramme", "e1rm", "percentOf1RM", "roundLoad", "platesPerSide", "warmupRamp", "weekProgression", "rpeToRir"] as const) {
      expect(typeof load[name], name).toBe("function");
    }
  });

  it("gives the same published answers through the index as through the modules", () => {
    // Brzycki 1993 and Epley 1985 at 100 kg × 5.
    expect(load.e1rm(100, 5, 0, "brzycki")).toBeCloseTo(112.5, 2);
    expect(load.e1rm(100, 5, 0, "epley")).toBeCloseTo(116.67, 2);
    // NIST SP 811: 1 lb = 0.45359237 kg.
    expect(load.KG_PER_LB).toBe(0.45359237);
    expect(load.platesPerSide(100, 20, [20, 10, 5])).toEqual([20, 20]);
    expect(load.roundLoad(83, { kind: "barbell", bar: 20, plates: [25, 20, 15, 10, 5, 2.5, 1.25] }).load).toBe(82.5);
  });
});
