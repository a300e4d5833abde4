/**
 * Structural equality of plain data (numbers, strings, booleans, null, arrays,
 * plain objects), as expanded sessions are. The live preview works a fresh
 * expansion on every keystroke; comparing it with the last one lets only the
 * days that really changed render again.
 *
 * @example
 * sameData({ sets: [1, 2] }, { sets: [1, 2] }); // true
 */
export function sameData(a: unknown, b: unknown): boolean {
  if (Object.is(a, b)) return true;
  if (typeof a !== "object" || typeof b !== "object" || a === null || b === null) return false;
  if (Array.isArray(a)) {
    if (!Array.isArray(b) || a.length !== b.length) return false;
    for (let i = 0; i < a.length; i++) if (!sameData(a[i], b[i])) return false;
    return true;
  }
  // Anything but a plain object (a Map, a Date) is equal only to itself.
  const proto = Object.getPrototypeOf(a);
  if (Array.isArray(b) || (proto !== Object.prototype && proto !== null) || Object.getPrototypeOf(b) !== proto) return false;
  // Counted with for…in rather than Object.keys: this runs for every set of every day on each keystroke.
  const x = a as Record<string, unknown>;
  const y = b as Record<string, unknown>;
  let count = 0;
  for (const k in x) {
    if (!hasOwn.call(x, k)) continue;
    count++;
    if (!hasOwn.call(y, k) || !sameData(x[k], y[k])) return false;
  }
  for (const k in y) if (hasOwn.call(y, k)) count--;
  return count === 0;
}

const hasOwn = Object.prototype.hasOwnProperty;
