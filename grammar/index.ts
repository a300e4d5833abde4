/**
 * The .iq parser, ready for CodeMirror: `parser` already carries the
 * highlighting props and a buffer size suited to reparsing after each keystroke;
 * `iqHighlighting` is exported for custom configurations.
 *
 * @example
 * import { parser } from "@/grammar";
 * const language = LRLanguage.define({ name: "iq", parser });
 */
import type { LRParser } from "@lezer/lr";
import { parser as bareParser } from "./parser.js";
import { iqHighlighting } from "./highlight";

export { iqHighlighting };
export { bareParser };
/**
 * Smaller tree buffers than Lezer's default (1024 nodes): a buffer is reused
 * whole or parsed again, so after an edit the parser re-reads about one buffer's
 * worth of lines (some 80 at 512 nodes, half the default). Smaller still makes
 * reparsing cheaper but every full parse slower (more, smaller trees to build).
 */
const BUFFER_LENGTH = 512;

/**
 * A copy of a configured parser whose fields V8 keeps in fast mode. `configure`
 * copies all of a parser's fields onto a new object in one go, which V8 stores as
 * a hash table; the parser reads those fields for every token, and parses about
 * half again as slowly. An object literal with the same fields stays fast.
 */
export function fastFields(p: LRParser): LRParser {
  return Object.setPrototypeOf({ ...p }, Object.getPrototypeOf(p)) as LRParser;
}

export const parser = fastFields(bareParser.configure({ props: [iqHighlighting], bufferLength: BUFFER_LENGTH }));
