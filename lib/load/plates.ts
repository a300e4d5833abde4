/**
 * Barbell loading: which totals a bar and a plate set can make, and the plates per side.
 *
 * Plates load in pairs, one per side, so a total is bar + 2 × (sum of one side). All sums are
 * worked in whole multiples of the plates' common divisor (e.g. 0.25 kg for IPF change discs)
 * so that no floating-point residue ever makes 82.5 into 82.49999.
 *
 * The search is an exact dynamic programme over reachable per-side sums that respects how many
 * pairs of each plate the gym has — greedy loading fails with limited pairs (2 × 20 + 1 × 15 can
 * make 55 per side, greedy 25-first cannot). When several plate combinations give the same sum,
 * the one with the fewest plates wins, then the one using heavier plates first.
 * Tables are cached per plate set, so expanding many sessions for one gym costs one table.
 *
 * Beyond {@link MAX_CELLS} quanta per side (over 25 t a side at 0.25 kg) the heaviest plates are
 * added greedily before the exact search; real gyms never get there.
 *
 * @example
 * nearestBarbellLoad(83, 20, [25, 20, 15, 10, 5, 2.5, 1.25]); // { load: 82.5, perSide: [25, 5, 1.25], beyondPlates: false }
 * platesPerSide(100, 20, [20, 10, 5]);                         // [20, 20]
 */

/** A gym's plates: weights in unlimited pairs, or weights with the number of pairs available. */
export type PlateSet = readonly number[] | readonly { weight: number; pairs: number }[];

interface PlateType {
  scaled: number; // weight × 1000, an integer
  weight: number;
  pairs: number | null; // null: as many as needed
}

export const MAX_CELLS = 100_000;
const SCALE = 1000;
const INF = 0x3fffffff;

function gcd(a: number, b: number): number {
  while (b) [a, b] = [b, a % b];
  return a;
}

function normalise(plates: PlateSet): PlateType[] {
  const byWeight = new Map<number, PlateType>();
  for (const p of plates as readonly (number | { weight: number; pairs: number })[]) {
    const weight = typeof p === "number" ? p : p.weight;
    const pairs = typeof p === "number" ? null : p.pairs;
    const scaled = Math.round(weight * SCALE);
    if (!(scaled > 0) || pairs === 0) continue;
    const prev = byWeight.get(scaled);
    if (!prev) byWeight.set(scaled, { scaled, weight, pairs });
    else prev.pairs = prev.pairs === null || pairs === null ? null : prev.pairs + pairs;
  }
  return [...byWeight.values()].sort((a, b) => b.scaled - a.scaled);
}

class PlateTable {
  readonly types: PlateType[];
  readonly quantum: number; // scaled units per cell
  readonly unlimited: boolean;
  readonly totalCells: number; // per-side maximum with limited plates
  size = 0;
  /** counts[i][s]: fewest plates of types i.. that make s cells; INF if none. */
  counts: Int32Array[] = [];
  prevReach = new Int32Array(0);
  nextReach = new Int32Array(0);

  constructor(plates: PlateSet) {
    this.types = normalise(plates);
    this.quantum = this.types.reduce((g, t) => gcd(g, t.scaled), 0) || 1;
    this.unlimited = this.types.some((t) => t.pairs === null);
    this.totalCells = this.unlimited ? Infinity : this.types.reduce((s, t) => s + (t.pairs ?? 0) * this.cells(t), 0);
  }

  cells(t: PlateType): number {
    return t.scaled / this.quantum;
  }

  /** Make sure sums up to `need` cells are tabulated (or as far as the plates or the cap go). */
  ensure(need: number): void {
    const want = Math.min(MAX_CELLS, this.totalCells, Math.max(need, 1024));
    if (want < this.size) return;
    const size = this.unlimited ? Math.min(MAX_CELLS, Math.max(want + 1, this.size * 2)) : want + 1;
    this.build(size);
  }

  private build(size: number): void {
    const n = this.types.length;
    const counts: Int32Array[] = new Array(n + 1);
    counts[n] = new Int32Array(size).fill(INF);
    counts[n][0] = 0;
    for (let i = n - 1; i >= 0; i--) {
      const w = this.cells(this.types[i]);
      const below = counts[i + 1];
      const cur = new Int32Array(below);
      const c = this.types[i].pairs;
      if (c === null) {
        for (let s = w; s < size; s++) if (cur[s - w] + 1 < cur[s]) cur[s] = cur[s - w] + 1;
      } else {
        for (let s = w; s < size; s++) {
          for (let k = 1; k <= c && k * w <= s; k++) {
            const v = below[s - k * w] + k;
            if (v < cur[s]) cur[s] = v;
          }
        }
      }
      counts[i] = cur;
    }
    const top = counts[0];
    const prev = new Int32Array(size);
    const next = new Int32Array(size);
    let last = -1;
    for (let s = 0; s < size; s++) {
      if (top[s] < INF) last = s;
      prev[s] = last;
    }
    last = -1;
    for (let s = size - 1; s >= 0; s--) {
      if (top[s] < INF) last = s;
      next[s] = last;
    }
    this.counts = counts;
    this.platesCache.clear();
    this.prevReach = prev;
    this.nextReach = next;
    this.size = size;
  }

  private platesCache = new Map<number, readonly number[]>();

  /** Plates (weights, heaviest first) making exactly `s` cells; assumes s is reachable. */
  plates(s: number): number[] {
    let known = this.platesCache.get(s);
    if (!known) {
      known = this.search(s);
      if (this.platesCache.size > 4096) this.platesCache.clear();
      this.platesCache.set(s, known);
    }
    return [...known];
  }

  private search(s: number): number[] {
    const out: number[] = [];
    for (let i = 0; i < this.types.length && s > 0; i++) {
      const t = this.types[i];
      const w = this.cells(t);
      const target = this.counts[i][s];
      const limit = Math.min(t.pairs ?? Infinity, Math.floor(s / w));
      for (let k = limit; k >= 0; k--) {
        if (this.counts[i + 1][s - k * w] + k === target) {
          for (let j = 0; j < k; j++) out.push(t.weight);
          s -= k * w;
          break;
        }
      }
    }
    return out;
  }
}

const cache = new Map<string, PlateTable>();
// Profiles are re-used across thousands of calls; the identity lookup skips re-serialising them.
// (A plate list mutated in place after use keeps its old table — profiles are treated as values.)
const byIdentity = new WeakMap<object, PlateTable>();

function tableFor(plates: PlateSet): PlateTable {
  const known = byIdentity.get(plates);
  if (known) return known;
  const key = JSON.stringify(plates);
  let t = cache.get(key);
  if (!t) {
    if (cache.size > 256) cache.clear();
    t = new PlateTable(plates);
    cache.set(key, t);
  }
  byIdentity.set(plates, t);
  return t;
}

export interface BarbellLoad {
  /** Total on the bar, bar included. */
  load: number;
  /** Plates on each side, heaviest first. */
  perSide: number[];
  /** True when the target was heavier than the plates can make (load is the heaviest possible). */
  beyondPlates: boolean;
}

/**
 * Nearest total the bar and plates can make to `target`; ties go to the lighter total and
 * nothing goes below the empty bar.
 * @example nearestBarbellLoad(21.25, 20, [1.25]).load; // 20 (a tie between 20 and 22.5)
 */
export function nearestBarbellLoad(target: number, bar: number, plates: PlateSet): BarbellLoad {
  const t = tableFor(plates);
  const barScaled = Math.round(bar * SCALE);
  const sideCells = ((target * SCALE - barScaled) / 2 / t.quantum);
  if (!(sideCells > 0) || t.types.length === 0) return { load: bar, perSide: [], beyondPlates: sideCells > 0 };

  // Far past the table: put on whole pairs of the heaviest plate until the rest fits.
  const extra: number[] = [];
  let rest = sideCells;
  const heaviest = t.types[0];
  const hw = t.cells(heaviest);
  if (t.unlimited && heaviest.pairs === null && rest > MAX_CELLS - 2 * hw) {
    const m = Math.ceil((rest - (MAX_CELLS - 2 * hw)) / hw);
    for (let j = 0; j < m; j++) extra.push(heaviest.weight);
    rest -= m * hw;
  }

  t.ensure(Math.ceil(rest) + hw);
  const maxIndex = t.size - 1;
  const lo = t.prevReach[Math.min(maxIndex, Math.floor(rest))];
  const hiStart = Math.ceil(rest);
  const hi = hiStart <= maxIndex ? t.nextReach[hiStart] : -1;
  let s = lo;
  if (hi >= 0 && hi - rest < rest - lo - 1e-9) s = hi;
  // Only a shortfall of more than half the lightest plate counts: anything less is ordinary rounding.
  const lightest = t.cells(t.types[t.types.length - 1]);
  const beyondPlates = !t.unlimited && rest - t.prevReach[maxIndex] > lightest / 2;
  const perSide = [...extra, ...t.plates(s)];
  const load = (barScaled + 2 * (s + (sideCells - rest)) * t.quantum) / SCALE;
  return { load: Math.round(load * SCALE) / SCALE, perSide, beyondPlates };
}

/**
 * Plates per side for a total the plates can make exactly, heaviest first; null when they cannot.
 * @example platesPerSide(61, 20, [20, 10, 5, 2.5, 1.25]); // null
 */
export function platesPerSide(load: number, bar: number, plates: PlateSet): number[] | null {
  const r = nearestBarbellLoad(load, bar, plates);
  return Math.abs(r.load - load) < 1e-9 ? r.perSide : null;
}
