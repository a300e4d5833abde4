/**
 * The `.iq` notation: parse a programme into the typed model with positioned
 * diagnostics, print its canonical form, or get the raw syntax tree.
 *
 * @example
 * const { programme, diagnostics } = parseProgramme("day Full body\n  squat 3x5 @75%");
 * programme.blocks[0].days[0].exercises[0].intensity; // { kind: "percent", value: 75 }
 */
import type { Tree } from "@lezer/common";
import { parser } from "../../grammar/parser.js";
import { buildProgramme, type BuildOptions } from "./build";
import type { Diagnostic, Programme } from "./model";

export type { Diagnostic, Programme } from "./model";
export * from "./model";
export { formatProgramme } from "./format";
export type { BuildOptions as ParseOptions } from "./build";
/** Model and diagnostics from a tree already at hand (an editor's incrementally parsed tree). */
export { buildProgramme } from "./build";
/** Lines kept between builds of the same document, so an editor reads again only what changed. */
export { LineCache } from "./lineCache";

/** The Lezer syntax tree of a source text (error nodes mark what could not be read). */
export function parseTree(source: string): Tree {
  return parser.parse(source);
}

/** Parse a programme. Never throws: problems come back as diagnostics. */
export function parseProgramme(source: string, options: BuildOptions = {}): { programme: Programme; diagnostics: Diagnostic[] } {
  return buildProgramme(parseTree(source), source, options);
}
