import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { checkMinor, CURRENCIES, formatMoney, minorDigits, parsePrice, PRICE_MAX_MINOR, PRICE_MIN_MINOR, toMajorText } from "./money";

describe("money in minor units", () => {
  it("uses the ISO 4217 minor unit of every allowed currency", () => {
    // ISO 4217 table A.1: EUR, GBP, USD, CAD, AUD, CHF all have minor unit 2.
    for (const c of CURRENCIES) expect(minorDigits(c)).toBe(2);
    // Cross-check with ECMA-402: Intl.NumberFormat carries the ISO 4217 digits for each currency.
    for (const c of CURRENCIES) {
      expect(new Intl.NumberFormat("en", { style: "currency", currency: c.toUpperCase() }).resolvedOptions().maximumFractionDigits).toBe(minorDigits(c));
    }
  });

  it("reads typed prices into whole minor units without float error", () => {
    expect(parsePrice("29.99", "eur")).toEqual({ ok: true, minor: 2999 });
    expect(parsePrice("29.9", "eur")).toEqual({ ok: true, minor: 2990 });
    expect(parsePrice("29", "gbp")).toEqual({ ok: true, minor: 2900 });
    expect(parsePrice("29.", "gbp")).toEqual({ ok: true, minor: 2900 });
    expect(parsePrice(" 1,000.00 ", "usd")).toEqual({ ok: true, minor: 100_000 });
    // In IEEE 754 binary64, 4.35 × 100 is 434.99999999999994, so multiplying a float would lose a cent.
    expect(4.35 * 100).not.toBe(435);
    expect(parsePrice("1.10", "eur")).toEqual({ ok: true, minor: 110 });
    expect(parsePrice("4.35", "eur")).toEqual({ ok: true, minor: 435 });
  });

  it("refuses prices it cannot read, too many decimals, and amounts outside the range", () => {
    expect(parsePrice("abc", "eur").ok).toBe(false);
    expect(parsePrice("-5", "eur").ok).toBe(false);
    expect(parsePrice("1e3", "eur").ok).toBe(false);
    expect(parsePrice("29.999", "eur")).toEqual({ ok: false, message: "EUR has 2 decimal places at most" });
    expect(parsePrice("0.99", "eur").ok).toBe(false);
    expect(parsePrice("1000.01", "eur").ok).toBe(false);
    expect(checkMinor(2999.5, "eur").ok).toBe(false);
    expect(checkMinor(PRICE_MIN_MINOR, "eur").ok).toBe(true);
    expect(checkMinor(PRICE_MAX_MINOR, "eur").ok).toBe(true);
  });

  it("round-trips every allowed amount through text and back", () => {
    fc.assert(
      fc.property(fc.integer({ min: PRICE_MIN_MINOR, max: PRICE_MAX_MINOR }), fc.constantFrom(...CURRENCIES), (minor, c) => {
        expect(parsePrice(toMajorText(minor, c), c)).toEqual({ ok: true, minor });
      }),
    );
  });

  it("formats amounts as Intl.NumberFormat does for the currency", () => {
    // Reference: ECMA-402 Intl.NumberFormat with style "currency".
    expect(formatMoney(2999, "eur")).toBe(new Intl.NumberFormat("en-GB", { style: "currency", currency: "EUR" }).format(29.99));
    expect(formatMoney(2999, "gbp")).toBe("£29.99");
    expect(formatMoney(100_000, "usd", "en-US")).toBe("$1,000.00");
    expect(formatMoney(5, "eur")).toBe(new Intl.NumberFormat("en-GB", { style: "currency", currency: "EUR" }).format(0.05));
    expect(toMajorText(5, "eur")).toBe("0.05");
    expect(toMajorText(-250, "eur")).toBe("-2.50");
  });
});
