import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { nearestBarbellLoad, platesPerSide, type PlateSet } from "./plates";

// IWF Technical and Competition Rules, "Sport equipment": discs 25, 20, 15, 10, 5 and change
// discs 2.5, 2, 1.5, 1, 0.5 kg; bars 20 kg (men) and 15 kg (women).
const IWF_DISCS = [25, 20, 15, 10, 5, 2.5, 2, 1.5, 1, 0.5];
// IPF Technical Rules, "Bars and discs": 50, 25, 20, 15, 10, 5, 2.5, 1.25, 0.5, 0.25 kg;
// bar + collars 25 kg (collars 2.5 kg each).
const IPF_DISCS = [50, 25, 20, 15, 10, 5, 2.5, 1.25, 0.5, 0.25];
// Common pound gym (common practice, no single source): 45 lb bar; 45, 35, 25, 10, 5, 2.5 lb.
const LB_PLATES = [45, 35, 25, 10, 5, 2.5];

const sum = (xs: number[]) => xs.reduce((a, b) => a + b, 0);

/** Every per-side sum a limited plate set can make, by plain enumeration (independent of the DP). */
function allSides(types: { weight: number; pairs: number }[]): number[] {
  let sums = [0];
  for (const t of types) {
    const next: number[] = [];
    for (const s of sums) for (let k = 0; k <= t.pairs; k++) next.push(Math.round((s + k * t.weight) * 1000) / 1000);
    sums = [...new Set(next)];
  }
  return sums.sort((a, b) => a - b);
}

describe("plates per side", () => {
  it("loads every whole kilogram from the empty 20 kg bar with IWF discs", () => {
    for (let load = 20; load <= 250; load++) {
      const side = platesPerSide(load, 20, IWF_DISCS);
      expect(side, `${load} kg`).not.toBeNull();
      expect(20 + 2 * sum(side!)).toBeCloseTo(load, 9);
    }
  });

  it("loads every half kilogram on a 25 kg IPF bar with collars", () => {
    for (let load = 25; load <= 300; load += 0.5) {
      const side = platesPerSide(load, 25, IPF_DISCS);
      expect(side, `${load} kg`).not.toBeNull();
    }
    // 250 kg: 112.5 per side, fewest discs first: 50 + 50 + 10 + 2.5.
    expect(platesPerSide(250, 25, IPF_DISCS)).toEqual([50, 50, 10, 2.5]);
  });

  it("loads every 5 lb from a 45 lb bar with a common pound set", () => {
    for (let load = 45; load <= 600; load += 5) expect(platesPerSide(load, 45, LB_PLATES), `${load} lb`).not.toBeNull();
    expect(platesPerSide(225, 45, LB_PLATES)).toEqual([45, 45]);
    expect(platesPerSide(47, 45, LB_PLATES)).toBeNull();
  });

  it("lists plates heaviest first", () => {
    expect(nearestBarbellLoad(83, 20, [25, 20, 15, 10, 5, 2.5, 1.25]).perSide).toEqual([25, 5, 1.25]);
  });

  it("finds loads with limited pairs that heaviest-first loading misses", () => {
    // 55 per side from one 25, two 20s and one 15: greedy takes 25 + 20 and is stuck at 45.
    const gym = [{ weight: 25, pairs: 1 }, { weight: 20, pairs: 2 }, { weight: 15, pairs: 1 }];
    expect(nearestBarbellLoad(130, 20, gym)).toEqual({ load: 130, perSide: [20, 20, 15], beyondPlates: false });
  });

  it("stops at the heaviest load the plates can make and says so", () => {
    const gym = [{ weight: 20, pairs: 1 }, { weight: 10, pairs: 1 }];
    expect(nearestBarbellLoad(200, 20, gym)).toEqual({ load: 80, perSide: [20, 10], beyondPlates: true });
  });

  it("never goes below the empty bar", () => {
    expect(nearestBarbellLoad(5, 20, IWF_DISCS)).toEqual({ load: 20, perSide: [], beyondPlates: false });
    expect(nearestBarbellLoad(60, 15, []).load).toBe(15);
  });

  it("breaks a tie toward the lighter load", () => {
    // 21.25 lies halfway between 20 (empty) and 22.5 (1.25 a side).
    expect(nearestBarbellLoad(21.25, 20, [1.25]).load).toBe(20);
    expect(nearestBarbellLoad(21.26, 20, [1.25]).load).toBe(22.5);
  });

  const plateSet = fc
    .uniqueArray(fc.constantFrom(...IPF_DISCS, 2, 1.5, 1), { minLength: 1, maxLength: 4 })
    .chain((ws) => fc.tuple(...ws.map((w) => fc.record({ weight: fc.constant(w), pairs: fc.integer({ min: 0, max: 3 }) }))));

  it("always picks the nearest achievable load, ties to the lighter (checked by enumeration)", () => {
    fc.assert(
      fc.property(plateSet, fc.constantFrom(15, 20, 25), fc.double({ min: 0, max: 400, noNaN: true }), (types, bar, target) => {
        const got = nearestBarbellLoad(target, bar, types as PlateSet);
        const totals = allSides(types).map((s) => bar + 2 * s);
        const best = Math.min(...totals.map((t) => Math.abs(t - target)));
        expect(Math.abs(got.load - target)).toBeLessThanOrEqual(best + 1e-9);
        const lighterTie = totals.find((t) => Math.abs(Math.abs(t - target) - best) < 1e-9)!;
        expect(got.load).toBeCloseTo(lighterTie, 9);
      }),
      { numRuns: 300 },
    );
  });

  it("never rounds further than half the smallest step when the lightest plate is unlimited", () => {
    fc.assert(
      fc.property(fc.subarray(IPF_DISCS, { minLength: 1 }), fc.double({ min: 20, max: 500, noNaN: true }), (plates, target) => {
        const smallestStep = 2 * Math.min(...plates);
        const got = nearestBarbellLoad(target, 20, plates);
        expect(Math.abs(got.load - target)).toBeLessThanOrEqual(smallestStep / 2 + 1e-9);
      }),
    );
  });

  it("always puts (load − bar) / 2 on each side, within the pairs available", () => {
    fc.assert(
      fc.property(plateSet, fc.constantFrom(15, 20, 45), fc.double({ min: -50, max: 500, noNaN: true }), (types, bar, target) => {
        const got = nearestBarbellLoad(target, bar, types as PlateSet);
        expect(sum(got.perSide)).toBeCloseTo((got.load - bar) / 2, 9);
        for (const t of types) expect(got.perSide.filter((w) => w === t.weight).length).toBeLessThanOrEqual(t.pairs);
        expect(got.perSide).toEqual([...got.perSide].sort((a, b) => b - a));
      }),
      { numRuns: 300 },
    );
  });
});
