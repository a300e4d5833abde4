/**
 * Nearest-name suggestions for "did you mean …?" messages.
 *
 * @example
 * nearest("kgs", ["kg", "lb"]); // ["kg"]
 */

/** Levenshtein distance (insert, delete, substitute each cost 1). */
export function editDistance(a: string, b: string): number {
  if (a === b) return 0;
  if (a.length === 0) return b.length;
  if (b.length === 0) return a.length;
  let prev = new Array<number>(b.length + 1);
  let curr = new Array<number>(b.length + 1);
  for (let j = 0; j <= b.length; j++) prev[j] = j;
  for (let i = 1; i <= a.length; i++) {
    curr[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const cost = a.charCodeAt(i - 1) === b.charCodeAt(j - 1) ? 0 : 1;
      curr[j] = Math.min(prev[j] + 1, curr[j - 1] + 1, prev[j - 1] + cost);
    }
    [prev, curr] = [curr, prev];
  }
  return prev[b.length];
}

/**
 * Candidates close to `word` (case-insensitive), best first, at most `limit`.
 * "Close" scales with length so short typos still match and long names may differ more.
 */
export function nearest(word: string, candidates: readonly string[], limit = 3): string[] {
  const w = word.toLowerCase();
  const budget = Math.max(2, Math.floor(w.length / 3));
  const close: { c: string; d: number }[] = [];
  for (const c of candidates) {
    const low = c.toLowerCase();
    // The distance is at least the difference in length: skip the table for names that far apart.
    if (Math.abs(low.length - w.length) > budget) continue;
    const d = editDistance(w, low);
    if (d <= budget) close.push({ c, d });
  }
  return close
    .sort((x, y) => x.d - y.d || x.c.localeCompare(y.c))
    .slice(0, limit)
    .map((x) => x.c);
}

/** " — did you mean kg?" or "" when nothing is close. */
export function didYouMean(word: string, candidates: readonly string[]): string {
  const near = nearest(word, candidates);
  if (near.length === 0) return "";
  const last = near.length > 1 ? ` or ${near[near.length - 1]}` : "";
  return ` — did you mean ${near.slice(0, near.length > 1 ? -1 : 1).join(", ")}${last}?`;
}
