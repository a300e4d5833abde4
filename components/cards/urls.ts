/**
 * Addresses of the card downloads, shared by the buttons and by any page that
 * wants a plain link.
 *
 * @example
 * sessionCardUrl("0f…", "a5");                 // "/api/sessions/0f…/card?size=a5"
 * weekCardsUrl("7c…", "2026-12-07", 4, "a6");  // "/api/athletes/7c…/cards?from=2026-12-07&weeks=4&size=a6"
 */
export type CardSizeChoice = "a6" | "a5" | "letter";

export const CARD_SIZE_LABELS: Record<CardSizeChoice, string> = {
  a6: "A6 pocket card",
  a5: "A5 half sheet",
  letter: "US Letter",
};

export function sessionCardUrl(sessionId: string, size: CardSizeChoice = "a6"): string {
  return `/api/sessions/${encodeURIComponent(sessionId)}/card?size=${size}`;
}

export function weekCardsUrl(athleteId: string, from: string, weeks: 1 | 4 = 1, size: CardSizeChoice = "a6"): string {
  const q = new URLSearchParams({ from, weeks: String(weeks), size });
  return `/api/athletes/${encodeURIComponent(athleteId)}/cards?${q}`;
}

/** The file name a download answer names in Content-Disposition, or null. */
export function fileNameFrom(disposition: string | null): string | null {
  if (!disposition) return null;
  const star = /filename\*=UTF-8''([^;]+)/i.exec(disposition);
  if (star) {
    try {
      return decodeURIComponent(star[1]);
    } catch {
      // Fall through to the plain form.
    }
  }
  const plain = /filename="([^"]+)"/i.exec(disposition);
  return plain ? plain[1] : null;
}
