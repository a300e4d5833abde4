/**
 * CodeMirror support for the .iq notation: our Lezer parser, highlighting in
 * Ironquill's palette, folding of blocks and days, and completion of keywords
 * and exercise names. Client-side only (imported by the editor leaf).
 */
import { type Completion, type CompletionContext, type CompletionResult } from "@codemirror/autocomplete";
import { foldService, HighlightStyle, LanguageSupport, LRLanguage } from "@codemirror/language";
import type { EditorState } from "@codemirror/state";
import { EditorView } from "@codemirror/view";
import { tags as t } from "@lezer/highlight";
import { fastFields, parser } from "@/grammar";

export const iqLanguage = LRLanguage.define({
  name: "iq",
  parser,
  languageData: { commentTokens: { line: "#" } },
});
// define() reconfigures the parser, which leaves its fields in V8's slow
// dictionary mode; swap in a fast copy (see grammar/index.ts) — the language
// reads only this field when it starts a parse.
(iqLanguage as { parser: LRLanguage["parser"] }).parser = fastFields(iqLanguage.parser);

export const iqHighlightStyle = HighlightStyle.define([
  { tag: t.definitionKeyword, color: "#a8461f", fontWeight: "700" },
  { tag: t.keyword, color: "#8f3b1b" },
  { tag: t.operatorKeyword, color: "#8f3b1b", fontStyle: "italic" },
  { tag: t.propertyName, color: "#5b6472", fontWeight: "600" },
  { tag: [t.heading1, t.heading2], color: "#1c2128", fontWeight: "700" },
  { tag: t.atom, color: "#2f6f5e", fontWeight: "600" },
  { tag: t.labelName, color: "#b8892b", fontWeight: "700" },
  { tag: t.name, color: "#1c2128" },
  { tag: t.number, color: "#1f4d41" },
  { tag: t.unit, color: "#2f6f5e", fontWeight: "600" },
  { tag: t.changed, color: "#8a6419" },
  { tag: t.string, color: "#6b4f8a" },
  { tag: t.lineComment, color: "#7f8793", fontStyle: "italic" },
  { tag: [t.brace, t.separator], color: "#a8461f" },
]);

export const iqTheme = EditorView.theme({
  "&": { fontSize: "14px", backgroundColor: "#fbfaf7", height: "100%" },
  ".cm-content": { fontFamily: "var(--font-mono), ui-monospace, monospace", padding: "10px 0", caretColor: "#c4562b" },
  ".cm-scroller": { lineHeight: "1.65" },
  ".cm-gutters": { backgroundColor: "#f5f3ee", color: "#a8afb9", borderRight: "1px solid #e9e5dc" },
  ".cm-activeLine": { backgroundColor: "#f6e1d633" },
  ".cm-activeLineGutter": { backgroundColor: "#e9e5dc", color: "#434b58" },
  "&.cm-focused .cm-cursor": { borderLeftColor: "#c4562b", borderLeftWidth: "2px" },
  "&.cm-focused .cm-selectionBackground, .cm-selectionBackground": { backgroundColor: "#f3e8cf" },
  ".cm-tooltip": { border: "1px solid #d8d2c5", borderRadius: "6px", backgroundColor: "#ffffff" },
  ".cm-tooltip-autocomplete ul li[aria-selected]": { backgroundColor: "#1c2128", color: "#ffffff" },
  ".cm-diagnostic-error": { borderLeftColor: "#a8461f" },
  ".cm-diagnostic-warning": { borderLeftColor: "#b8892b" },
  ".cm-foldPlaceholder": { backgroundColor: "#e9e5dc", border: "none", color: "#5b6472", padding: "0 6px" },
});

const HEADER = /^\s*(block|day)\b/i;

/** A `block` folds to the next block; a `day` folds to the next day or block. */
export const iqFolding = foldService.of((state: EditorState, lineStart: number) => {
  const line = state.doc.lineAt(lineStart);
  const m = HEADER.exec(line.text);
  if (!m) return null;
  const isBlock = m[1].toLowerCase() === "block";
  let last = line;
  for (let n = line.number + 1; n <= state.doc.lines; n++) {
    const next = state.doc.line(n);
    const h = HEADER.exec(next.text);
    if (h && (isBlock ? h[1].toLowerCase() === "block" : true)) break;
    if (next.text.trim() !== "") last = next;
  }
  return last.number > line.number ? { from: line.to, to: last.to } : null;
});

const LINE_KEYWORDS: Completion[] = [
  { label: "block", type: "keyword", detail: "Name 4w deload w4", info: "Starts a block: its name, length in weeks and deload weeks." },
  { label: "day", type: "keyword", detail: "Name mon", info: "Starts a training day, optionally on a weekday." },
  { label: "warmup", type: "keyword", detail: '"…"', info: "A general warm-up line printed before the first lift." },
  ...["title:", "units:", "round:", "model:", "description:", "level:", "tags:", "weeks:"].map((label) => ({ label, type: "property" })),
];

const OPTION_KEYWORDS: Completion[] = [
  { label: "ramp", type: "keyword", detail: "50/70/85%", info: "Warm-up sets at these percentages of the first working load." },
  { label: "pause", type: "keyword", detail: "1s", info: "Pause at the bottom of each rep." },
  { label: "tempo", type: "keyword", detail: "3110", info: "Lowering, pause, lifting, pause — seconds." },
  { label: "rest", type: "keyword", detail: "2m", info: "Rest between sets." },
  { label: "rotate", type: "keyword", detail: "2w", info: "Move to the next variation every N weeks." },
  { label: "or", type: "keyword", detail: "substitute, …", info: "Substitutes when the first choice is not available." },
  { label: "bw", type: "constant", info: "Bodyweight (bw+10kg adds load)." },
];

const WEEKDAYS: Completion[] = ["mon", "tue", "wed", "thu", "fri", "sat", "sun"].map((label) => ({ label, type: "constant" }));
const VALUES: Record<string, string[]> = { units: ["kg", "lb"], model: ["brzycki", "epley", "nsca"] };

const SETS_REPS = /\b\d+\s*x\s*\d/i;

/** Completion source: what fits at the cursor, from the line's shape so far. */
export function iqCompletions(exerciseNames: () => readonly string[]) {
  return (ctx: CompletionContext): CompletionResult | null => {
    const word = ctx.matchBefore(/[\p{L}\p{N}_:-]*/u);
    if (!word || (word.from === word.to && !ctx.explicit)) return null;
    const line = ctx.state.doc.lineAt(ctx.pos);
    const before = line.text.slice(0, word.from - line.from);
    const meta = /^\s*(units|model)\s*:\s*$/i.exec(before);
    if (meta) return { from: word.from, options: VALUES[meta[1].toLowerCase()].map((label) => ({ label, type: "constant" })) };
    if (/^\s*day\b/i.test(before)) return { from: word.from, options: WEEKDAYS };
    if (/^\s*block\b/i.test(before)) return { from: word.from, options: [{ label: "deload", type: "keyword" }] };
    if (SETS_REPS.test(before)) {
      const subs = /\bor\b[^"]*$/i.test(before);
      const names = subs ? exerciseNames().map((label) => ({ label, type: "variable" })) : [];
      return { from: word.from, options: [...OPTION_KEYWORDS, ...names], validFor: /^[\p{L}\p{N}_-]*$/u };
    }
    const atLineStart = /^\s*([A-Z]\d+\s+)?$/i.test(before);
    const names = exerciseNames().map((label) => ({ label, type: "variable", boost: -1 }));
    // Exercise names may have spaces: complete from the start of the name, not the last word.
    if (!atLineStart && /^\s*([A-Z]\d+\s+)?[\p{L}\p{N} -]+$/u.test(before)) {
      const start = line.from + before.search(/\S/) + (/^\s*[A-Z]\d+\s+/i.exec(before)?.[0].trimStart().length ?? 0);
      return { from: start, options: names, validFor: /^[\p{L}\p{N} _-]*$/u };
    }
    return { from: word.from, options: atLineStart ? [...LINE_KEYWORDS, ...names] : names, validFor: /^[\p{L}\p{N}_:-]*$/u };
  };
}

export function iq(exerciseNames: () => readonly string[]): LanguageSupport {
  return new LanguageSupport(iqLanguage, [iqFolding, iqLanguage.data.of({ autocomplete: iqCompletions(exerciseNames) })]);
}
