/**
 * Paper sizes of the session cards and the type scale that goes with each.
 *
 * Page sizes are in PDF points (1 pt = 1/72 in): ISO 216 A6 and A5 from their
 * millimetre sizes, US Letter from inches. The type scale keeps loads at 10 pt
 * or more even on A6, so they read at arm's length on the gym floor.
 *
 * @example
 * pageSize("a6");        // { width: 297.64, height: 419.53 }
 * CARD_SIZES.includes("letter"); // true
 */

export const CARD_SIZES = ["a6", "a5", "letter"] as const;
export type CardSize = (typeof CARD_SIZES)[number];

const MM = 72 / 25.4;
const round2 = (n: number) => Math.round(n * 100) / 100;

/** Width × height in points, portrait. */
export function pageSize(size: CardSize): { width: number; height: number } {
  switch (size) {
    case "a6":
      return { width: round2(105 * MM), height: round2(148 * MM) };
    case "a5":
      return { width: round2(148 * MM), height: round2(210 * MM) };
    case "letter":
      return { width: 8.5 * 72, height: 11 * 72 };
  }
}

export function isCardSize(s: string): s is CardSize {
  return (CARD_SIZES as readonly string[]).includes(s);
}

/** Sizes in points for one paper size. */
export interface CardMetrics {
  margin: number;
  /** Space kept free at the foot of every page for the caution and page count. */
  footer: number;
  base: number;
  small: number;
  /** Loads and plates: the numbers lifted from the bar. */
  load: number;
  name: number;
  title: number;
  qr: number;
  /** Write-in boxes: height, and widths of the reps, load and RIR boxes. */
  box: { height: number; reps: number; load: number; rir: number; label: number; gap: number };
  /** Put the write-in boxes beside the prescription rather than under it. */
  sideBySide: boolean;
  /** Write-in cells (one per set) on a row before the next row starts. */
  boxColumns: number;
}

/** Space between the boxes inside one write-in cell. */
export const BOX_SPACING = 1.5;

/** Width of one write-in cell (set number, reps, load and RIR boxes) including the gap after it. */
export function cellWidth(m: CardMetrics): number {
  return m.box.label + m.box.reps + m.box.load + m.box.rir + 3 * BOX_SPACING + m.box.gap;
}

/** Width of the block of write-in cells: `boxColumns` cells, no gap after the last. */
export function boxesWidth(m: CardMetrics): number {
  return m.boxColumns * cellWidth(m) - m.box.gap;
}

export function metricsFor(size: CardSize): CardMetrics {
  switch (size) {
    case "a6":
      return {
        margin: 14,
        footer: 30,
        base: 8.5,
        small: 7.5,
        load: 10,
        name: 10.5,
        title: 13,
        qr: 50,
        box: { height: 18, reps: 18, load: 38, rir: 15, label: 9, gap: 6 },
        sideBySide: false,
        boxColumns: 3,
      };
    case "a5":
      return {
        margin: 22,
        footer: 30,
        base: 9,
        small: 7.5,
        load: 11,
        name: 11,
        title: 15,
        qr: 60,
        box: { height: 18, reps: 19, load: 36, rir: 16, label: 9, gap: 8 },
        sideBySide: true,
        boxColumns: 2,
      };
    case "letter":
      return {
        margin: 36,
        footer: 32,
        base: 11,
        small: 9,
        load: 14,
        name: 14,
        title: 20,
        qr: 76,
        box: { height: 24, reps: 24, load: 44, rir: 20, label: 11, gap: 9 },
        sideBySide: true,
        boxColumns: 3,
      };
  }
}
