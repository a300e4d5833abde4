/** Where the feed of a token lives; the `.ics` ending is what some calendar apps look for. */
export function feedPath(token: string): string {
  return `/api/calendar/${token}.ics`;
}
