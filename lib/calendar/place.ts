/**
 * Puts dated items (sessions) on the days of a grid, keeping their order
 * within a day.
 *
 * @example
 * const byDay = itemsByDate([{ date: "2027-01-04", id: "a" }, { date: "2027-01-04", id: "b" }]);
 * byDay.get("2027-01-04")?.map((s) => s.id); // ["a", "b"]
 */
export function itemsByDate<T extends { date: string }>(items: readonly T[]): Map<string, T[]> {
  const out = new Map<string, T[]>();
  for (const item of items) {
    const list = out.get(item.date);
    if (list) list.push(item);
    else out.set(item.date, [item]);
  }
  return out;
}
