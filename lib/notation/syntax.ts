/**
 * Turns the parser's error nodes into one coach-readable diagnostic per line,
 * phrased for the kind of line it happened on.
 *
 * @example
 * // "bench press" (no sets×reps) → "'bench press' needs sets×reps after the name, e.g. bench press 3x8"
 */
import type { SyntaxNode } from "@lezer/common";
import type { BuildContext } from "./context";

const SHAPES: Record<string, string> = {
  Meta: "a setting reads key: value, e.g. units: kg",
  Block: "a block line reads: block NAME 4w, optionally followed by deload w4",
  Day: "a day line reads: day NAME, optionally ending with a weekday such as mon",
  Warmup: 'a warm-up line reads: warmup "5 min bike, arm circles"',
  Exercise: "after sets×reps come options such as @75%, @2rir, 80kg, ramp 60/75/90%, rest 2m, +2.5kg/wk, or a \"cue\"",
};

function lineNode(node: SyntaxNode): SyntaxNode | null {
  for (let n: SyntaxNode | null = node; n; n = n.parent) if (SHAPES[n.name]) return n;
  return null;
}

function snippet(text: string): string {
  const t = text.trim().split("\n")[0];
  return t.length > 30 ? `${t.slice(0, 27)}…` : t;
}

export function reportSyntaxErrors(ctx: BuildContext, nodes: SyntaxNode[]): void {
  const reportedLines = new Set<number>();
  for (const top of nodes) top.cursor().iterate((ref) => {
      if (!ref.type.isError) return;
      const node = ref.node;
      const text = ctx.text(node);
      // Report where the problem shows: on the unexpected text, or right after the last good token.
      let from = node.from;
      let to = node.to;
      if (text.trim() === "") {
        const before = node.prevSibling ?? node.parent;
        from = to = before && before.to <= node.from ? Math.min(before.to, node.from) : node.from;
        while (from > 0 && /[\n\r]/.test(ctx.src.text[from - 1] ?? "") === false && /\s/.test(ctx.src.text[from - 1] ?? "")) from--;
        to = from;
      } else {
        const lead = text.length - text.trimStart().length;
        from += lead;
        to = Math.min(to, from + text.trim().split("\n")[0].length);
      }
      const line = ctx.src.lineOf(from);
      if (reportedLines.has(line)) return false;
      reportedLines.add(line);
      ctx.report(from, to, "error", message(ctx, node, text));
      return false;
  });
}

function message(ctx: BuildContext, node: SyntaxNode, text: string): string {
  const owner = lineNode(node);
  const shown = snippet(text);
  if (owner?.name === "Exercise" && !owner.getChild("SetsReps")) {
    const name = owner.getChild("ExerciseName");
    const label = name ? ctx.words(name) : shown;
    const spaced = /(\d+) ?[x×] (\d+)|(\d+) [x×] ?(\d+)/i.exec(label);
    const odd = label.split(" ").find((w) => /^\d+[x×]/i.test(w));
    if (odd) return `can't read sets×reps '${odd}' — write 3x8, 3x6-8, 3x10+ or 3x30s`;
    if (spaced) return `write sets×reps without spaces: ${spaced[1] ?? spaced[3]}x${spaced[2] ?? spaced[4]}`;
    return `'${label}' needs sets×reps after the name, e.g. ${label || "bench press"} 3x8`;
  }
  if (owner) return shown ? `can't read '${shown}' here — ${SHAPES[owner.name]}` : `this line is incomplete — ${SHAPES[owner.name]}`;
  if (shown.startsWith("}") || shown.startsWith("|") || shown.startsWith(","))
    return `stray '${shown[0]}' — variations are written {a | b} and substitutes as or a, b`;
  return shown ? `can't read '${shown}' — expected a setting, block, day, warmup or exercise line` : "this line is incomplete";
}
