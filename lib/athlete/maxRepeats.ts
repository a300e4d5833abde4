/**
 * Which maxes from an import are already on file. A max is the same entry
 * when exercise, date measured, kind, value and unit all agree; a note or a
 * source does not make it a different measurement. Lets the same CSV be
 * uploaded twice without doubling the athlete's history.
 *
 * @example
 * const key = maxIdentity({ exerciseKey: "back-squat", date: "2026-11-20", kind: "1rm", value: 140, unit: "kg" });
 * repeatedLines([{ line: 2, max }, { line: 3, max }], new Set([key])); // [2, 3] when both are that squat
 */
import type { CheckedMax } from "./maxEntry";

export type MaxIdentityFields = Pick<CheckedMax, "exerciseKey" | "date" | "kind" | "value" | "unit">;

/** One string per measurement; values compare as numbers, so "140" and "140.0" agree. */
export function maxIdentity(m: MaxIdentityFields): string {
  return [m.exerciseKey, m.date, m.kind, Number(m.value), m.unit].join("|");
}

/**
 * Lines of rows whose max is already stored (`stored`: identities of the
 * athlete's entries) or already given on an earlier line of the same file.
 * Rows without a checked max are never repeats; their problems say why.
 */
export function repeatedLines(rows: readonly { line: number; max: MaxIdentityFields | null }[], stored: ReadonlySet<string>): number[] {
  const seen = new Set(stored);
  const repeats: number[] = [];
  for (const r of rows) {
    if (!r.max) continue;
    const id = maxIdentity(r.max);
    if (seen.has(id)) repeats.push(r.line);
    else seen.add(id);
  }
  return repeats;
}
