/**
 * A QR code as rectangles to draw, so it prints sharp at any card size and
 * costs no image decoding. Modules come from the qrcode package (ISO/IEC
 * 18004); each run of dark modules in a row becomes one rectangle.
 *
 * @example
 * const { modules, runs } = qrRuns("https://ironquill.test/athlete/sessions/…/log");
 * // runs: [[x, y, width], …] in modules, origin at the top-left module
 */
import QRCode from "qrcode";

export function qrRuns(text: string): { modules: number; runs: Array<[number, number, number]> } {
  // Level M survives a crease or a chalk smudge across a corner of the code.
  const qr = QRCode.create(text, { errorCorrectionLevel: "M" });
  const size = qr.modules.size;
  const data = qr.modules.data;
  const runs: Array<[number, number, number]> = [];
  for (let y = 0; y < size; y++) {
    let x = 0;
    while (x < size) {
      if (!data[y * size + x]) {
        x++;
        continue;
      }
      const start = x;
      while (x < size && data[y * size + x]) x++;
      runs.push([start, y, x - start]);
    }
  }
  return { modules: size, runs };
}
