/**
 * What a query module throws when a request cannot be met: a code from the
 * app's closed vocabulary and a message a person can act on, with the fields
 * at fault. Route handlers turn it into an answer (server/http.ts).
 *
 * @example
 * throw new DomainError("invalid_input", "rows.3.value: expected a number", { "rows.3.value": "expected a number" });
 */
export type DomainErrorCode = "not_found" | "forbidden" | "invalid_input" | "conflict";

export class DomainError extends Error {
  constructor(
    readonly code: DomainErrorCode,
    message: string,
    readonly fields: Record<string, string> = {},
  ) {
    super(message);
    this.name = "DomainError";
  }
}
