import { describe, expect, it } from "vitest";
import { toExpansionProfile } from "./expansion";

const lbGym = { units: "lb" as const, bar: 45, plates: [45, 25, 10, 5, 2.5], dumbbellStep: 5, machineStep: 10, bodyweight: 148 };

describe("toExpansionProfile", () => {
  it("keeps a max already in the gym's unit exactly", () => {
    const p = toExpansionProfile("Maya", lbGym, [{ exercise: "back squat", value: 225, units: "lb" }]);
    expect(p.maxes).toEqual({ "back squat": 225 });
  });

  it("converts a max from the other unit to hundredths", () => {
    // 1 lb = 0.45359237 kg exactly (NIST SP 811, Appendix B): 100 kg = 220.462… lb
    const p = toExpansionProfile("Maya", lbGym, [{ exercise: "deadlift", value: 100, units: "kg" }]);
    expect(p.maxes.deadlift).toBe(220.46);
    const kg = toExpansionProfile("Tomas", { ...lbGym, units: "kg", bar: 20, plates: [25, 20, 10, 5, 2.5, 1.25] }, [{ exercise: "bench press", value: 225, units: "lb" }]);
    // 225 lb × 0.45359237 = 102.0582…
    expect(kg.maxes["bench press"]).toBe(102.06);
  });

  it("carries the gym over and leaves bodyweight out when none is stored", () => {
    const p = toExpansionProfile("Lena", { ...lbGym, bodyweight: null }, []);
    expect(p).toEqual({ name: "Lena", units: "lb", bar: 45, plates: [45, 25, 10, 5, 2.5], dumbbellStep: 5, machineStep: 10, maxes: {} });
    expect("bodyweight" in p).toBe(false);
    expect(toExpansionProfile("Maya", lbGym, []).bodyweight).toBe(148);
  });
});
