/**
 * A value returned by a db/ query module as the browser gets it back from
 * `Response.json()`: each Date becomes its ISO 8601 string (what Date#toJSON
 * writes); everything else keeps its shape. Lets the API's response types
 * reuse the query modules' types instead of restating them.
 *
 * @example
 * type InvitationItem = AsJson<InvitationSummary>; // expiresAt: Date → string
 */
export type AsJson<T> = T extends Date
  ? string
  : T extends readonly (infer U)[]
    ? AsJson<U>[]
    : T extends object
      ? { [K in keyof T]: AsJson<T[K]> }
      : T;
