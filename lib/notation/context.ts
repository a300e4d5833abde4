/**
 * Shared state while turning a syntax tree into a programme: the source text,
 * the diagnostics gathered so far and small helpers to read nodes.
 *
 * @example
 * const ctx = new BuildContext("title: x");
 * ctx.report(0, 5, "warning", "just an example");
 * ctx.diagnostics.length; // 1
 */
import type { SyntaxNode } from "@lezer/common";
import type { Severity, Diagnostic } from "./model";
import { singleSpaced } from "./canonical";
import { firstErrorFrom } from "./lines";
import { SourceText } from "./source";
import type { Problem, Read } from "./values";

export class BuildContext {
  readonly src: SourceText;
  readonly diagnostics: Diagnostic[] = [];

  /** Start of the first error in the line being read: what the parser guessed after it is not trusted. */
  private cutoff = Infinity;

  constructor(text: string) {
    this.src = new SourceText(text);
  }

  /** Begin reading a line node: note where its first syntax error starts (pass it when already known). */
  enterLine(node: SyntaxNode, firstError: number = firstErrorFrom(node)): void {
    this.cutoff = firstError;
  }

  /** A node really written before any error (not a token the parser made up to recover). */
  usable(node: SyntaxNode): boolean {
    return !node.type.isError && node.to > node.from && node.from < this.cutoff;
  }

  child(node: SyntaxNode, name: string): SyntaxNode | null {
    for (let c = node.firstChild; c; c = c.nextSibling) if (c.name === name && this.usable(c)) return c;
    return null;
  }

  children(node: SyntaxNode, name: string): SyntaxNode[] {
    const out: SyntaxNode[] = [];
    for (let c = node.firstChild; c; c = c.nextSibling) if (c.name === name && this.usable(c)) out.push(c);
    return out;
  }

  text(node: { from: number; to: number }): string {
    return this.src.text.slice(node.from, node.to);
  }

  line(node: { from: number }): number {
    return this.src.lineOf(node.from);
  }

  /** When set, every report is also noted here as given (for the line cache). */
  recording: { from: number; to: number; severity: Severity; message: string }[] | null = null;

  report(from: number, to: number, severity: Severity, message: string): void {
    this.recording?.push({ from, to, severity, message });
    this.diagnostics.push(this.src.diagnostic(from, to, severity, message));
  }

  /** Report a reader's problems (positioned inside `node`) and hand back its value. */
  take<T>(node: { from: number }, read: Read<T>): T | null {
    for (const p of read.problems) this.reportProblem(node.from, p);
    return read.value;
  }

  reportProblem(base: number, p: Problem): void {
    this.report(base + p.offset, base + p.offset + p.length, p.severity, p.message);
  }

  /** Words of a name token joined by single spaces (the source may use several). */
  words(node: { from: number; to: number }): string {
    return singleSpaced(this.text(node));
  }
}
