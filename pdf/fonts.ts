/**
 * Fonts of the printed cards, registered once per process with react-pdf.
 * TTF only: react-pdf's font engine reads TTF and WOFF but not WOFF2.
 * DejaVu Sans Condensed carries every glyph a card prints (×, –, ·, accented
 * names) and its figures are all one width, so columns of loads line up.
 *
 * @example
 * registerCardFonts();
 * // <Text style={{ fontFamily: CARD_FONT }}>…</Text>
 */
import { existsSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { Font } from "@react-pdf/renderer";

export const CARD_FONT = "IronquillCardSans";

const FILES = { regular: "DejaVuSansCondensed.ttf", bold: "DejaVuSansCondensed-Bold.ttf" };

/**
 * The repo's assets/fonts. The working directory is the repo root for the web
 * server, the `iq` command, the benches and the tests; the path beside this
 * module covers a script started from elsewhere. (Not `new URL(…, import.meta.url)`:
 * bundlers take that form for an asset to copy.)
 */
function fontDir(): string {
  const candidates = [join(process.cwd(), "assets", "fonts")];
  try {
    candidates.push(join(dirname(fileURLToPath(import.meta.url)), "..", "assets", "fonts"));
  } catch {
    // A bundled chunk may not have a file URL; the working directory then has to do.
  }
  // The ignore comments keep the bundler from tracing the whole project for these runtime paths.
  const found = candidates.find((dir) => existsSync(/*turbopackIgnore: true*/ join(/*turbopackIgnore: true*/ dir, FILES.regular)));
  if (!found) throw new Error(`card fonts not found: looked for ${FILES.regular} in ${candidates.join(", ")}`);
  return found;
}

let registered = false;

export function registerCardFonts(): void {
  if (registered) return;
  const dir = fontDir();
  Font.register({
    family: CARD_FONT,
    fonts: [
      { src: join(/*turbopackIgnore: true*/ dir, FILES.regular), fontWeight: 400 },
      { src: join(/*turbopackIgnore: true*/ dir, FILES.bold), fontWeight: 700 },
    ],
  });
  // Exercise names and loads must never break mid-word ("dead-lift", "67.-5").
  Font.registerHyphenationCallback((word) => [word]);
  registered = true;
}
