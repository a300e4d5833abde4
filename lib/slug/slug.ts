/**
 * A URL- and file-name-safe form of a title: lower-case ASCII letters and
 * digits joined by single hyphens, accents dropped, at most 60 characters;
 * `fallback` when nothing is left.
 *
 * @example
 * slugify("Upper/lower, four days", "template"); // "upper-lower-four-days"
 * slugify("Périodisation", "programme");          // "periodisation"
 * slugify("  --  ", "programme");                 // "programme"
 */
export function slugify(title: string, fallback: string): string {
  const slug = title
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 60)
    .replace(/-+$/, "");
  return slug || fallback;
}
