import { describe, expect, it } from "vitest";
import { KG_PER_LB, convertMass, defaultRoundStep, massIn } from "./units";

describe("mass units", () => {
  it("defines the pound as exactly 0.45359237 kg", () => {
    // International yard and pound agreement (1959); NIST SP 811 (2008), Appendix B.
    expect(KG_PER_LB).toBe(0.45359237);
    expect(convertMass(45, "lb", "kg")).toBeCloseTo(20.41165665, 10);
  });

  it("converts 20 kg to about 44.09 lb and back unchanged", () => {
    // NIST SP 811: 20 / 0.45359237 = 44.0924…
    expect(convertMass(20, "kg", "lb")).toBeCloseTo(44.0925, 4);
    expect(convertMass(convertMass(20, "kg", "lb"), "lb", "kg")).toBeCloseTo(20, 12);
  });

  it("leaves a mass in the requested unit alone", () => {
    expect(massIn({ value: 82.5, unit: "kg" }, "kg")).toBe(82.5);
  });

  it("uses the programme's rounding step only in its own unit", () => {
    expect(defaultRoundStep("kg", 1, "kg")).toBe(1);
    expect(defaultRoundStep("lb", 1, "kg")).toBe(5);
    expect(defaultRoundStep("kg", null, "kg")).toBe(2.5);
    expect(defaultRoundStep("kg", 0, "kg")).toBe(2.5);
  });
});
