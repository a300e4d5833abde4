import { describe, expect, it } from "vitest";
import QRCode from "qrcode";
import { qrRuns } from "./qr";

/** Paints the runs back onto a grid, failing on any overlap. */
function paint(runs: Array<[number, number, number]>, size: number): boolean[] {
  const grid = new Array<boolean>(size * size).fill(false);
  for (const [x, y, w] of runs) {
    for (let i = 0; i < w; i++) {
      expect(grid[y * size + x + i]).toBe(false);
      grid[y * size + x + i] = true;
    }
  }
  return grid;
}

describe("QR code runs", () => {
  const url = "https://ironquill.test/athlete/sessions/5b7e2a3c-1d4f-4a6b-9c8d-0e1f2a3b4c5d/log";

  it("covers exactly the dark modules the qrcode package sets, row by row", () => {
    const { modules, runs } = qrRuns(url);
    const qr = QRCode.create(url, { errorCorrectionLevel: "M" });
    expect(paint(runs, modules)).toEqual(Array.from(qr.modules.data, Boolean));
  });

  it("fits a logging address in a version 5 symbol at level M", () => {
    // ISO/IEC 18004: 80 bytes exceed version 4-M (62) and fit version 5-M (84); version v is 17 + 4v modules wide. From memory.
    expect(new TextEncoder().encode(url).length).toBe(80);
    expect(qrRuns(url).modules).toBe(17 + 4 * 5);
  });
});
