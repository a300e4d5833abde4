/**
 * File names for downloaded cards: lower-case ASCII words joined by hyphens,
 * safe in a Content-Disposition header and on every file system.
 *
 * @example
 * sessionCardFileName("Tomas Brenner", "2026-12-07", "Day A"); // "tomas-brenner-2026-12-07-day-a.pdf"
 * weekPackFileName("Tomas Brenner", "2026-W50", 1);             // "tomas-brenner-week-2026-W50.pdf"
 * weekPackFileName("Tomas Brenner", "2026-W50", 4);             // "tomas-brenner-4-weeks-from-2026-W50.pdf"
 */
import { slugify } from "../lib/slug";

/** "Tomáš Brenner-Łukasz" → "tomas-brenner-lukasz"; an empty result becomes `fallback`. */
export function slug(text: string, fallback = "cards"): string {
  // Letters that do not decompose into a base letter plus accent (even after NFKD), spelled out so people's names keep them.
  const spelled = text.normalize("NFKD").replace(/[łŁ]/g, "l").replace(/[øØ]/g, "o").replace(/[đĐ]/g, "d").replace(/ß/g, "ss").replace(/[æÆ]/g, "ae");
  return slugify(spelled, fallback);
}

export function sessionCardFileName(athlete: string, date: string, day: string): string {
  return `${slug(athlete, "athlete")}-${date}-${slug(day, "session")}.pdf`;
}

export function weekPackFileName(athlete: string, isoWeek: string, weeks: number): string {
  const who = slug(athlete, "athlete");
  return weeks === 1 ? `${who}-week-${isoWeek}.pdf` : `${who}-${weeks}-weeks-from-${isoWeek}.pdf`;
}

/** `attachment; filename="…"` with the RFC 6266 / RFC 8187 UTF-8 form alongside. */
export function attachmentHeader(fileName: string): string {
  const plain = fileName.replace(/[^\x20-\x7e]|["\\]/g, "_");
  return `attachment; filename="${plain}"; filename*=UTF-8''${encodeURIComponent(fileName)}`;
}
