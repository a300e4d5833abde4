/**
 * The line nodes of a programme. A syntax error can make the parser's recovery
 * run over a line break ("{" alone on a line swallowing the next line); lines
 * caught in such a node are parsed again one by one, so what a line means never
 * depends on how a neighbouring broken line was recovered.
 *
 * @example
 * lineNodes(parser.parse("{\nday A"), "{\nday A", src).map((n) => n.name); // ["Exercise", "Day"]
 */
import type { SyntaxNode, Tree } from "@lezer/common";
import { parser } from "../../grammar/parser.js";
import type { SourceText } from "./source";

function lineEnd(src: SourceText, line: number): number {
  return line < src.lineStarts.length ? src.lineStarts[line] - 1 : src.text.length;
}

/** Last line a node really covers (its own trailing newline does not count). */
function lastLine(src: SourceText, node: SyntaxNode): number {
  const to = node.to > node.from && src.text[node.to - 1] === "\n" ? node.to - 1 : node.to;
  return src.lineOf(Math.max(node.from, to - 1));
}

/** Top-level line and error nodes, in order, each confined to one line. */
export function lineNodes(tree: Tree, src: SourceText): SyntaxNode[] {
  const out: SyntaxNode[] = [];
  let pad = "";
  let node = tree.topNode.firstChild;
  while (node) {
    if (node.name === "Comment") {
      node = node.nextSibling;
      continue;
    }
    const first = src.lineOf(node.from);
    const last = lastLine(src, node);
    if (first === last) {
      out.push(node);
      node = node.nextSibling;
      continue;
    }
    // Nodes already taken from the first line are replaced by its re-parse.
    while (out.length > 0 && out[out.length - 1].from >= src.lineStarts[first - 1]) out.pop();
    for (let l = first; l <= last; l++) {
      const from = src.lineStarts[l - 1];
      const to = lineEnd(src, l);
      if (to <= from) continue;
      // Spaces in front keep the positions of the re-parsed nodes those of the document.
      if (pad.length < from) pad = " ".repeat(src.text.length);
      const sub = parser.parse(pad.slice(0, from) + src.text.slice(from, to));
      for (let c = sub.topNode.firstChild; c; c = c.nextSibling) if (c.name !== "Comment") out.push(c);
    }
    const next = last < src.lineStarts.length ? src.lineStarts[last] : Infinity;
    while (node && node.from < next) node = node.nextSibling;
  }
  return out;
}

/** Start of the first error node inside `node` (itself included), or Infinity. */
export function firstErrorFrom(node: SyntaxNode): number {
  if (node.type.isError) return node.from;
  const c = node.cursor();
  if (!c.firstChild()) return Infinity;
  let depth = 1;
  for (;;) {
    if (c.type.isError) return c.from;
    if (c.firstChild()) {
      depth++;
      continue;
    }
    while (!c.nextSibling()) {
      if (--depth === 0) return Infinity;
      c.parent();
    }
  }
}
