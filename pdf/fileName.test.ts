import { describe, expect, it } from "vitest";
import { attachmentHeader, sessionCardFileName, slug, weekPackFileName } from "./fileName";

describe("card file names", () => {
  it("makes lower-case ASCII words of names with accents and other scripts' letters", () => {
    expect(slug("Tomáš Novák")).toBe("tomas-novak");
    expect(slug("Łucja Ødegård-Straße")).toBe("lucja-odegard-strasse");
    expect(slug("  ---  ")).toBe("cards");
    expect(slug("x".repeat(100))).toHaveLength(60);
  });

  it("names a session card by athlete, date and day, and a pack by ISO week", () => {
    expect(sessionCardFileName("Tomas Brenner", "2026-12-07", "Day A")).toBe("tomas-brenner-2026-12-07-day-a.pdf");
    expect(weekPackFileName("Tomas Brenner", "2026-W50", 1)).toBe("tomas-brenner-week-2026-W50.pdf");
    expect(weekPackFileName("Tomas Brenner", "2026-W50", 4)).toBe("tomas-brenner-4-weeks-from-2026-W50.pdf");
  });

  it("writes a Content-Disposition attachment with a quoted name and the RFC 8187 UTF-8 form", () => {
    // RFC 6266 §4.1 (filename, filename*); RFC 8187 §3.2 (ext-value: charset '' pct-encoded).
    expect(attachmentHeader("tomas-brenner-week-2026-W50.pdf")).toBe(`attachment; filename="tomas-brenner-week-2026-W50.pdf"; filename*=UTF-8''tomas-brenner-week-2026-W50.pdf`);
    expect(attachmentHeader('a "b".pdf')).toBe(`attachment; filename="a _b_.pdf"; filename*=UTF-8''a%20%22b%22.pdf`);
  });
});
