/**
 * The .iq parser, ready for CodeMirror: `parser` already carries the
 * highlighting props; `iqHighlighting` is exported for custom configurations.
 *
 * @example
 * import { parser } from "@/grammar";
 * const language = LRLanguage.define({ name: "iq", parser });
 */
import { parser as bareParser } from "./parser.js";
import { iqHighlighting } from "./highlight";

export { iqHighlighting };
export { bareParser };
export const parser = bareParser.configure({ props: [iqHighlighting] });
