/**
 * A file-name-safe form of a title: ASCII letters and digits joined by
 * hyphens, accents dropped, at most 60 characters.
 *
 * @example
 * slugify("Upper/lower, four days"); // "upper-lower-four-days"
 */
export function slugify(title: string, fallback = "template"): string {
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
