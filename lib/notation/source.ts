/**
 * Positions in a source text: offsets ↔ 1-based line and column, and the
 * positioned diagnostics built from them.
 *
 * @example
 * const src = new SourceText("a\nbc");
 * src.lineOf(3); // 2
 * src.diagnostic(3, 4, "error", "oops").column; // 2
 */
import type { Diagnostic, Severity } from "./model";

export class SourceText {
  readonly text: string;
  /** Offset of the first character of each line. */
  readonly lineStarts: number[];

  constructor(text: string) {
    this.text = text;
    this.lineStarts = [0];
    for (let i = text.indexOf("\n"); i >= 0; i = text.indexOf("\n", i + 1)) this.lineStarts.push(i + 1);
  }

  /** 1-based line of an offset (an offset past the end belongs to the last line). */
  lineOf(offset: number): number {
    let lo = 0;
    let hi = this.lineStarts.length - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (this.lineStarts[mid] <= offset) lo = mid;
      else hi = mid - 1;
    }
    return lo + 1;
  }

  /** Build a diagnostic, clamping the range into the document so editors can always show it. */
  diagnostic(from: number, to: number, severity: Severity, message: string): Diagnostic {
    const len = this.text.length;
    const f = Math.max(0, Math.min(from, len));
    const t = Math.max(f, Math.min(to, len));
    const line = this.lineOf(f);
    return { from: f, to: t, line, column: f - this.lineStarts[line - 1] + 1, length: t - f, severity, message };
  }
}
