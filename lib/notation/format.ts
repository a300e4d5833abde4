/**
 * The formatter: canonical spacing, keyword case and number style, line by line.
 * Lines the parser could not read are kept as written (only trailing spaces go),
 * so formatting never changes what a programme means.
 *
 * @example
 * formatProgramme("DAY  Upper MON\nbench press 3X5 @75.0%\n");
 * // "day Upper mon\n  bench press 3x5 @75%\n"
 */
import type { SyntaxNode } from "@lezer/common";
import { parser } from "../../grammar/parser.js";
import { canonicalSetting, canonicalToken } from "./canonical";
import { firstErrorFrom, lineNodes } from "./lines";
import { metaKeyName } from "./meta";
import { SourceText } from "./source";

// Only the characters the notation itself skips; other Unicode spaces can be part of a word.
const trimEnd = (s: string): string => s.replace(/[ \t\r\u00a0]+$/, "");
const isBlank = (s: string): boolean => /^[ \t\r\u00a0]*$/.test(s);

const LINE_NODES = new Set(["Meta", "Block", "Day", "Warmup", "Exercise"]);
const INDENTED = new Set(["Warmup", "Exercise"]);

type Out = { kind: "content"; node: string; text: string } | { kind: "comment"; text: string } | { kind: "blank" } | { kind: "verbatim"; text: string };

const hasError = (node: SyntaxNode): boolean => firstErrorFrom(node) !== Infinity;

function renderLine(src: SourceText, node: SyntaxNode): string {
  const parts: string[] = [];
  const walk = (n: SyntaxNode): void => {
    for (let c = n.firstChild; c; c = c.nextSibling) {
      if (c.name === "Comment") continue;
      if (c.firstChild) {
        walk(c);
        continue;
      }
      const raw = src.text.slice(c.from, c.to);
      if (isBlank(raw)) continue; // the line's own newline
      if (c.name === "MetaKey") parts.push(`${metaKeyName(raw)}:`);
      else if (c.name === "MetaValue") parts.push(canonicalSetting(metaKeyName(src.text.slice(n.firstChild!.from, n.firstChild!.to)), raw));
      else parts.push(canonicalToken(c.name, n.name, raw));
    }
  };
  walk(node);
  let out = "";
  for (let i = 0; i < parts.length; i++) {
    const p = parts[i];
    const prev = parts[i - 1];
    const tight = i === 0 || prev === "{" || p === "}" || p === ",";
    out += tight ? p : ` ${p}`;
  }
  return out;
}

/** Canonical form of a programme's source text. Idempotent. */
export function formatProgramme(source: string): string {
  const src = new SourceText(source);
  const tree = parser.parse(source);
  const lineCount = src.lineStarts.length;
  const verbatim = new Array<boolean>(lineCount).fill(false);
  const content = new Map<number, { node: string; text: string }>();
  const comments = new Map<number, string>();

  tree.iterate({
    enter: (ref) => {
      if (ref.name === "Comment") comments.set(src.lineOf(ref.from) - 1, trimEnd(source.slice(ref.from, ref.to)));
    },
  });

  for (const node of lineNodes(tree, src)) {
    const line = src.lineOf(node.from) - 1;
    if (verbatim[line]) continue;
    if (!LINE_NODES.has(node.name) || content.has(line) || hasError(node)) {
      verbatim[line] = true;
      content.delete(line);
      continue;
    }
    content.set(line, { node: node.name, text: renderLine(src, node) });
  }

  const lines: Out[] = [];
  for (let i = 0; i < lineCount; i++) {
    const end = i + 1 < lineCount ? src.lineStarts[i + 1] - 1 : source.length;
    const raw = trimEnd(source.slice(src.lineStarts[i], end));
    const c = content.get(i);
    if (verbatim[i]) lines.push(isBlank(raw) ? { kind: "blank" } : { kind: "verbatim", text: raw });
    else if (c) lines.push({ kind: "content", node: c.node, text: comments.has(i) ? `${c.text} ${comments.get(i)}` : c.text });
    else if (comments.has(i)) lines.push({ kind: "comment", text: comments.get(i)! });
    else if (isBlank(raw)) lines.push({ kind: "blank" });
    else lines.push({ kind: "verbatim", text: raw });
  }
  return assemble(lines);
}

function assemble(lines: Out[]): string {
  const out: string[] = [];
  let prevContent: string | null = null;
  for (let i = 0; i < lines.length; i++) {
    const l = lines[i];
    if (l.kind === "blank") {
      if (out.length > 0 && out[out.length - 1] !== "") out.push("");
      continue;
    }
    if (l.kind === "verbatim") {
      out.push(l.text);
      prevContent = null;
    } else if (l.kind === "content") {
      out.push(INDENTED.has(l.node) ? `  ${l.text}` : l.text);
      prevContent = l.node;
    } else {
      // A comment between exercise lines of a day lines up with them.
      let next: string | null = null;
      for (let j = i + 1; j < lines.length; j++) {
        const n = lines[j];
        if (n.kind === "content") next = n.node;
        if (n.kind === "content" || n.kind === "verbatim") break;
      }
      const inDay = prevContent !== null && prevContent !== "Meta" && prevContent !== "Block" && next !== null && INDENTED.has(next);
      out.push(inDay ? `  ${l.text}` : l.text);
    }
  }
  while (out.length > 0 && out[out.length - 1] === "") out.pop();
  return out.length > 0 ? `${out.join("\n")}\n` : "";
}
