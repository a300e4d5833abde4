/**
 * From the syntax tree to the programme model: settings, blocks, days, warm-ups
 * and exercises, plus every diagnostic. Never throws; a broken line is reported
 * and left out rather than guessed at.
 *
 * @example
 * const { programme } = buildProgramme(parser.parse(src), src);
 * programme.blocks[0].days[0].exercises.length;
 */
import type { SyntaxNode, Tree } from "@lezer/common";
import { WEEKDAY_SPELLINGS } from "../../grammar/tokens.js";
import { BuildContext } from "./context";
import { buildExercise, cueText, type NameUse } from "./exercise";
import { applySetting, emptySettings } from "./meta";
import type { Block, Day, Diagnostic, Programme, Weekday } from "./model";
import type { LineCache, LineReport } from "./lineCache";
import { firstErrorFrom, lineNodes } from "./lines";
import { nearest } from "./suggest";
import { reportSyntaxErrors } from "./syntax";
import { readDeloadWeek, readWeeks } from "./values";

export interface BuildOptions {
  /** Names in the coach's exercise library; when given, other names get a warning. */
  knownExercises?: string[];
  /** Lines read by the last build of the same document (an editor's); see {@link LineCache}. */
  cache?: LineCache;
}

/** Name of the block that holds days written before any `block` line. */
export const IMPLICIT_BLOCK_NAME = "Main";

export function buildProgramme(tree: Tree, source: string, options: BuildOptions = {}): { programme: Programme; diagnostics: Diagnostic[] } {
  try {
    return build(tree, source, options);
  } catch (e) {
    // A safety net, not a code path: parsing must never take the editor down.
    const ctx = new BuildContext(source);
    ctx.report(0, 0, "error", `internal problem while reading this programme: ${e instanceof Error ? e.message : String(e)}`);
    return { programme: { title: null, units: "kg", round: null, model: "brzycki", meta: {}, blocks: [] }, diagnostics: ctx.diagnostics };
  }
}

function build(tree: Tree, source: string, options: BuildOptions = {}): { programme: Programme; diagnostics: Diagnostic[] } {
  const ctx = new BuildContext(source);
  const settings = emptySettings();
  const blocks: Block[] = [];
  let implicit: Block | null = null;
  let block: Block | null = null;
  let day: Day | null = null;
  let weekdays = new Map<Weekday, Day>();
  let orphanReported = false;
  const names: NameUse[] = [];

  const currentDay = (node: SyntaxNode): Day => {
    if (day) return day;
    if (!orphanReported) {
      ctx.report(node.from, node.to, "error", "this line needs a day above it, e.g. day Full body");
      orphanReported = true;
    }
    return openDay({ line: ctx.line(node), name: "Day 1", weekday: null, warmups: [], exercises: [] });
  };
  const openDay = (d: Day): Day => {
    if (!block) {
      implicit = { line: null, name: IMPLICIT_BLOCK_NAME, weeks: 1, deloadWeeks: [], days: [] };
      block = implicit;
      blocks.push(block);
    }
    block.days.push(d);
    day = d;
    return d;
  };

  options.cache?.begin();
  const nodes = lineNodes(tree, ctx.src);
  const broken: SyntaxNode[] = [];
  for (const node of nodes) {
    const cutoff = firstErrorFrom(node);
    if (cutoff !== Infinity) broken.push(node);
    // A line node that does not open its line was made up by error recovery.
    if (!opensLine(ctx, node)) continue;
    ctx.enterLine(node, cutoff);
    switch (node.name) {
      case "Meta":
        applySetting(ctx, node, settings, blocks.length > 0);
        break;
      case "Block":
        block = buildBlock(ctx, node, blocks);
        blocks.push(block);
        day = null;
        weekdays = new Map();
        break;
      case "Day": {
        const d = buildDay(ctx, node, block ? block.days.length + 1 : ((implicit as Block | null)?.days.length ?? 0) + 1, weekdays);
        openDay(d);
        break;
      }
      case "Warmup": {
        const cue = ctx.child(node, "Cue");
        if (cue) currentDay(node).warmups.push(cueText(ctx, cue));
        break;
      }
      case "Exercise": {
        const ex = options.cache ? cachedExercise(ctx, node, cutoff, names, options.cache) : buildExercise(ctx, node, names);
        if (ex) currentDay(node).exercises.push(ex);
        break;
      }
    }
  }

  if (implicit) (implicit as Block).weeks = settings.weeks ?? 1;
  else if (settings.weeksNode)
    ctx.report(settings.weeksNode.from, settings.weeksNode.to, "warning", "weeks: only sets the length of days written before the first block line");
  for (const b of blocks) if (b.days.length === 0 && b.line !== null) {
    const at = ctx.src.lineStarts[b.line - 1];
    ctx.report(at, at + 5, "warning", `block '${b.name}' has no days`);
  }
  if (options.knownExercises) checkNames(ctx, names, options.knownExercises);
  reportSyntaxErrors(ctx, broken);
  ctx.diagnostics.sort((a, b) => a.from - b.from || a.to - b.to);

  const programme: Programme = {
    title: settings.title, units: settings.units, round: settings.round, model: settings.model, meta: settings.meta, blocks,
  };
  return { programme, diagnostics: ctx.diagnostics };
}

/** An exercise line from the cache when nothing it depends on changed; read (and kept) otherwise. */
function cachedExercise(ctx: BuildContext, node: SyntaxNode, cutoff: number, names: NameUse[], cache: LineCache) {
  const base = node.from;
  const line = ctx.line(node);
  const hit = cache.get(node, ctx.src.text, line, cutoff);
  if (hit) {
    for (const r of hit.reports) ctx.report(base + r.from, base + r.to, r.severity, r.message);
    for (const n of hit.names) names.push({ name: n.name, from: base + n.from, to: base + n.to });
    return hit.exercise;
  }
  const reports: LineReport[] = [];
  const firstName = names.length;
  ctx.recording = reports;
  try {
    const exercise = buildExercise(ctx, node, names);
    cache.set(node, ctx.src.text, line, cutoff, {
      exercise,
      names: names.slice(firstName).map((n) => ({ name: n.name, from: n.from - base, to: n.to - base })),
      reports: reports.map((r) => ({ ...r, from: r.from - base, to: r.to - base })),
    });
    return exercise;
  } finally {
    ctx.recording = null;
  }
}

/** Only spaces (as String.prototype.trim sees them) between the start of the node's line and the node. */
function opensLine(ctx: BuildContext, node: SyntaxNode): boolean {
  const text = ctx.src.text;
  for (let i = ctx.src.lineStarts[ctx.line(node) - 1]; i < node.from; i++) {
    const ch = text.charCodeAt(i);
    if (ch === 32 || ch === 9 || ch === 13) continue;
    if (text[i].trim() !== "") return false;
  }
  return true;
}

function buildBlock(ctx: BuildContext, node: SyntaxNode, blocks: Block[]): Block {
  const nameNode = ctx.child(node, "BlockName");
  const block: Block = { line: ctx.line(node), name: nameNode ? ctx.words(nameNode) : `Block ${blocks.length + 1}`, weeks: 1, deloadWeeks: [], days: [] };
  const weeksNode = ctx.child(node, "Weeks");
  if (weeksNode) block.weeks = ctx.take(weeksNode, readWeeks(ctx.text(weeksNode), "a block")) ?? 1;
  else if (!node.getChild("⚠")) ctx.report(node.from, nameNode?.to ?? node.from + 5, "error", `block '${block.name}' needs a length in weeks, e.g. block ${block.name} 4w`);
  const deload = ctx.child(node, "Deload");
  for (const w of deload ? ctx.children(deload, "DeloadWeek") : []) {
    const n = ctx.take(w, readDeloadWeek(ctx.text(w)));
    if (n === null) continue;
    if (n > block.weeks) ctx.report(w.from, w.to, "error", `deload week ${n} is outside this ${block.weeks}-week block`);
    else if (block.deloadWeeks.includes(n)) ctx.report(w.from, w.to, "warning", `week ${n} is already a deload week`);
    else block.deloadWeeks.push(n);
  }
  block.deloadWeeks.sort((a, b) => a - b);
  if (block.weeks > 1 && block.deloadWeeks.length === block.weeks)
    ctx.report(node.from, node.to, "warning", "every week of this block is a deload");
  return block;
}

function buildDay(ctx: BuildContext, node: SyntaxNode, index: number, weekdays: Map<Weekday, Day>): Day {
  const nameNode = ctx.child(node, "DayName");
  const d: Day = { line: ctx.line(node), name: nameNode ? ctx.words(nameNode) : `Day ${index}`, weekday: null, warmups: [], exercises: [] };
  const wd = ctx.child(node, "Weekday");
  if (wd) {
    const weekday = (WEEKDAY_SPELLINGS as Record<string, Weekday>)[ctx.text(wd).toLowerCase()];
    const other = weekdays.get(weekday);
    if (other) ctx.report(wd.from, wd.to, "error", `${weekday} is already taken by day '${other.name}' (line ${other.line}) in this block`);
    else weekdays.set(weekday, d);
    d.weekday = weekday;
  }
  return d;
}

/** Names typed by hand differ in case, hyphens, apostrophes and spacing without meaning another lift. */
function nameKey(name: string): string {
  return name.toLowerCase().replace(/['’`]/g, "").replace(/[-_]+/g, " ").replace(/\s+/g, " ").trim();
}

/** The keys of the last library seen: an editor passes the same names on every keystroke. */
let lastKnown: { names: string[]; keys: Set<string> } | null = null;

function knownKeys(known: string[]): Set<string> {
  // Compared by content, not identity, so a caller that changes its array in place is still right.
  const same = lastKnown !== null && lastKnown.names.length === known.length && known.every((n, i) => n === lastKnown!.names[i]);
  if (!same) lastKnown = { names: [...known], keys: new Set(known.map(nameKey)) };
  return lastKnown!.keys;
}

function checkNames(ctx: BuildContext, names: NameUse[], known: string[]): void {
  const set = knownKeys(known);
  // A name comes back on many lines; key it and search the library once per spelling.
  const isKnown = new Map<string, boolean>();
  const hints = new Map<string, string>();
  for (const n of names) {
    let ok = isKnown.get(n.name);
    if (ok === undefined) isKnown.set(n.name, (ok = set.has(nameKey(n.name))));
    if (ok) continue;
    let hint = hints.get(n.name);
    if (hint === undefined) {
      const near = nearest(n.name, known);
      hint = near.length > 0 ? ` — did you mean ${near.join(", ")}?` : " — it is not in the exercise library";
      hints.set(n.name, hint);
    }
    ctx.report(n.from, n.to, "warning", `unknown exercise '${n.name}'${hint}`);
  }
}
