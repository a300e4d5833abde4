/**
 * Slugs: the names of store listings and downloaded files made from titles.
 * @example
 * import { slugify } from "../slug";
 * slugify("Upper/lower, four days", "template"); // "upper-lower-four-days"
 */
export * from "./slug";
