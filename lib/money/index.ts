/**
 * Money in integer minor units, with ISO 4217 currency codes.
 * @example
 * import { formatMoney, parsePrice } from "../money";
 * const price = parsePrice("29.99", "eur"); // { ok: true, minor: 2999 }
 * formatMoney(2999, "eur"); // "€29.99"
 */
export * from "./money";
