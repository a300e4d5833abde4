/**
 * Exercise lines read by the last build of a document, for an editor that
 * rebuilds the model on every keystroke: a line found here is not read again,
 * its exercise, names and diagnostics are taken over, moved to where the line
 * now starts. A line is taken over only when everything reading it depends on
 * is unchanged: its line number, its text, the shape of its syntax tree (node
 * types and ranges) and where its first syntax error starts. Lines the latest
 * build did not use are dropped, so the cache holds one document's lines.
 *
 * Results built with a cache share exercise objects with earlier results:
 * treat them as read-only (the server never passes one).
 *
 * @example
 * const cache = new LineCache();
 * buildProgramme(tree, text, { cache });      // reads every line
 * buildProgramme(newTree, newText, { cache }); // reads only the lines that changed
 */
import type { SyntaxNode } from "@lezer/common";
import type { NameUse } from "./exercise";
import type { Exercise, Severity } from "./model";

/** A diagnostic as reported while reading a line, positioned from the start of its node. */
export type LineReport = { from: number; to: number; severity: Severity; message: string };

/** What reading one exercise node gave, positions relative to the node's start. */
export type LineResult = { exercise: Exercise | null; names: NameUse[]; reports: LineReport[] };

type Entry = LineResult & { text: string; cutoff: number; shape: number[] };

export class LineCache {
  private previous = new Map<number, Entry>();
  private current = new Map<number, Entry>();

  /** Start a build: lines the build before this one did not use are let go. */
  begin(): void {
    this.previous = this.current;
    this.current = new Map();
  }

  /** The result kept for this node on this line, if nothing it depends on changed. */
  get(node: SyntaxNode, src: string, line: number, cutoff: number): LineResult | undefined {
    const e = this.current.get(line) ?? this.previous.get(line);
    if (!e || e.cutoff !== relative(node, cutoff) || e.text.length !== node.to - node.from || !src.startsWith(e.text, node.from) || !sameShape(node, e.shape)) return undefined;
    this.current.set(line, e);
    return e;
  }

  set(node: SyntaxNode, src: string, line: number, cutoff: number, result: LineResult): void {
    this.current.set(line, { ...result, text: src.slice(node.from, node.to), cutoff: relative(node, cutoff), shape: shapeOf(node) });
  }

  /** Lines kept for the next build. */
  get size(): number {
    return this.current.size;
  }
}

function relative(node: SyntaxNode, cutoff: number): number {
  return cutoff === Infinity ? -1 : cutoff - node.from;
}

/** Calls `visit(typeId, from, to)` for the node and each node below it, in document order, positions relative to the node. */
function walk(node: SyntaxNode, visit: (id: number, from: number, to: number) => boolean): boolean {
  const base = node.from;
  const c = node.cursor();
  if (!visit(c.type.id, 0, c.to - base)) return false;
  // A cursor would walk on past the node's end: count the depth to stay inside.
  if (!c.firstChild()) return true;
  for (let depth = 1; depth > 0; ) {
    if (!visit(c.type.id, c.from - base, c.to - base)) return false;
    if (c.firstChild()) {
      depth++;
      continue;
    }
    while (depth > 0 && !c.nextSibling()) {
      c.parent();
      depth--;
    }
  }
  return true;
}

/** The node's subtree as a flat list: type id, start and end of each node. */
export function shapeOf(node: SyntaxNode): number[] {
  const out: number[] = [];
  walk(node, (id, from, to) => (out.push(id, from, to), true));
  return out;
}

function sameShape(node: SyntaxNode, shape: number[]): boolean {
  let i = 0;
  return walk(node, (id, from, to) => shape[i++] === id && shape[i++] === from && shape[i++] === to) && i === shape.length;
}
