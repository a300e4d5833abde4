/**
 * Prices as whole numbers of a currency's minor unit (cents, pence), never
 * floats: 29.99 EUR is 2999. Currency codes are ISO 4217 alphabetic codes,
 * kept lower-case as the payment provider expects them and shown upper-case.
 *
 * @example
 * parsePrice("29.99", "eur");   // { ok: true, minor: 2999 }
 * formatMoney(2999, "eur");     // "€29.99"
 * toMajorText(2999, "eur");     // "29.99"
 */

/** The currencies a listing may use; every one has two decimal places (ISO 4217 minor unit 2). */
export const CURRENCIES = ["eur", "gbp", "usd", "cad", "aud", "chf"] as const;
export type Currency = (typeof CURRENCIES)[number];

/** ISO 4217 exponent: how many digits after the decimal point the minor unit stands for. */
const EXPONENT: Record<Currency, number> = { eur: 2, gbp: 2, usd: 2, cad: 2, aud: 2, chf: 2 };

/** The most a single programme may cost, in minor units (1,000.00 of any listed currency). */
export const PRICE_MAX_MINOR = 100_000;
/** The least: one whole unit (1.00); smaller charges cost more to process than they bring. */
export const PRICE_MIN_MINOR = 100;

export function isCurrency(code: string): code is Currency {
  return (CURRENCIES as readonly string[]).includes(code);
}

export function minorDigits(currency: Currency): number {
  return EXPONENT[currency];
}

export type PriceResult = { ok: true; minor: number } | { ok: false; message: string };

/**
 * Reads a price as a person types it ("29", "29.9", "29.99", "1,000.00")
 * into minor units by string arithmetic, so 0.1 + 0.2 style float errors
 * cannot creep in. Refuses more decimals than the currency has, and prices
 * outside PRICE_MIN_MINOR…PRICE_MAX_MINOR.
 */
export function parsePrice(text: string, currency: Currency): PriceResult {
  const digits = minorDigits(currency);
  const cleaned = text.trim().replace(/(\d),(?=\d{3}(\D|$))/g, "$1");
  const m = /^(\d{1,7})(?:\.(\d*))?$/.exec(cleaned);
  if (!m) return { ok: false, message: "Enter the price as a number, e.g. 29.99" };
  const fraction = m[2] ?? "";
  if (fraction.length > digits) return { ok: false, message: `${currency.toUpperCase()} has ${digits} decimal places at most` };
  const minor = Number(m[1]) * 10 ** digits + Number(fraction.padEnd(digits, "0") || "0");
  return checkMinor(minor, currency);
}

/** Whether an amount already in minor units is a whole number inside the allowed range. */
export function checkMinor(minor: number, currency: Currency): PriceResult {
  if (!Number.isSafeInteger(minor)) return { ok: false, message: "The price must be a whole number of minor units" };
  if (minor < PRICE_MIN_MINOR) return { ok: false, message: `The price must be at least ${formatMoney(PRICE_MIN_MINOR, currency)}` };
  if (minor > PRICE_MAX_MINOR) return { ok: false, message: `The price must be at most ${formatMoney(PRICE_MAX_MINOR, currency)}` };
  return { ok: true, minor };
}

/** "29.99" for 2999: the amount in major units as plain text, for form fields. */
export function toMajorText(minor: number, currency: Currency): string {
  const digits = minorDigits(currency);
  const sign = minor < 0 ? "-" : "";
  const abs = Math.abs(minor);
  const whole = Math.floor(abs / 10 ** digits);
  const rest = String(abs % 10 ** digits).padStart(digits, "0");
  return digits === 0 ? `${sign}${whole}` : `${sign}${whole}.${rest}`;
}

/** The amount for people, through Intl.NumberFormat in the given locale ("€29.99" in en-GB). */
export function formatMoney(minor: number, currency: string, locale = "en-GB"): string {
  const code = currency.toUpperCase();
  const digits = isCurrency(currency.toLowerCase()) ? minorDigits(currency.toLowerCase() as Currency) : 2;
  // Division by a power of ten is exact enough for display: the integer stays the stored truth.
  return new Intl.NumberFormat(locale, { style: "currency", currency: code, minimumFractionDigits: digits, maximumFractionDigits: digits }).format(minor / 10 ** digits);
}
