import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { slugify } from "./slug";

describe("slugs from titles", () => {
  it("joins the words of a title with single hyphens, in lower case", () => {
    expect(slugify("Upper/lower, four days", "template")).toBe("upper-lower-four-days");
    expect(slugify("  5x5 -- Strength!  ", "template")).toBe("5x5-strength");
  });

  it("drops accents by canonical decomposition", () => {
    // Unicode UAX #15: NFKD of "é" is "e" + U+0301 COMBINING ACUTE ACCENT, of "ñ" is "n" + U+0303.
    expect("é".normalize("NFKD")).toBe("e\u0301");
    expect(slugify("Périodisation à l'année", "programme")).toBe("periodisation-a-l-annee");
    expect(slugify("Señor Año", "programme")).toBe("senor-ano");
  });

  it("answers the fallback when no letter or digit is left", () => {
    expect(slugify("", "template")).toBe("template");
    expect(slugify(" -- ", "programme")).toBe("programme");
    expect(slugify("日本語", "programme")).toBe("programme");
  });

  it("stops at 60 characters without leaving a hyphen at the end", () => {
    expect(slugify("x".repeat(100), "t")).toHaveLength(60);
    expect(slugify(`${"a".repeat(59)} b`, "t")).toBe("a".repeat(59));
  });

  it("uses only characters a URL path carries unescaped, whatever the title", () => {
    // RFC 3986 §2.3: ALPHA, DIGIT and "-" are unreserved; the slug keeps to lower-case ones of those.
    fc.assert(
      fc.property(fc.string({ unit: "grapheme", maxLength: 120 }), (title) => {
        const slug = slugify(title, "fallback");
        expect(slug.length).toBeLessThanOrEqual(60);
        expect(slug).toMatch(/^[a-z0-9]+(-[a-z0-9]+)*$/);
        expect(encodeURIComponent(slug)).toBe(slug);
      }),
    );
  });
});
