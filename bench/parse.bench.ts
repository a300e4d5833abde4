/**
 * Parse speed of the .iq notation on a generated 1,000-line programme: warm full
 * parse, incremental reparse after a one-character edit, tree → model (what an
 * editor redoes on every keystroke), text → model, and @lezer/markdown on text of
 * the same size as a yardstick.
 */
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { TreeFragment, type Parser } from "@lezer/common";
import { parser as markdownParser } from "@lezer/markdown";
// The parser the editor uses (highlighting props, buffer size for incremental parsing).
import { parser } from "../grammar/index";
import { buildProgramme, parseProgramme } from "../lib/notation/index";

/**
 * A 1,000-line programme made of the sample templates' day and exercise lines
 * (so the mix of names, options and comments is what coaches write), cut into
 * four-week blocks.
 */
function programme(lines: number): string {
  const dir = fileURLToPath(new URL("../templates/", import.meta.url));
  const body = readdirSync(dir)
    .filter((f) => f.endsWith(".iq"))
    .sort()
    .flatMap((f) => readFileSync(join(dir, f), "utf8").split("\n"))
    .filter((l) => /^\s*(day|warmup|#|[^:]+$)/i.test(l) && !/^\s*block\b/i.test(l) && l.trim() !== "");
  const out = ["title: Benchmark", "units: kg", "round: 2.5", ""];
  for (let i = 0, block = 0; out.length < lines; i++) {
    if (i % 60 === 0) out.push(`block Phase ${++block} 4w deload w4`);
    else out.push(body[i % body.length]);
  }
  return out.join("\n");
}

/** Markdown of the same length: a list of short lines. */
function markdown(length: number): string {
  const out: string[] = [];
  let size = 0;
  for (let i = 0; size < length; i++) {
    const line = `- item ${i}: some *emphasis* and \`code\` with [a link](https://example.com/${i})`;
    out.push(line);
    size += line.length + 1;
  }
  return out.join("\n").slice(0, length);
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[s.length >> 1];
}

function time(fn: () => void, runs = 60, warm = 15): number {
  return timePair(fn, null, runs, warm)[0];
}

/**
 * Medians of two functions run in turn, so both see the same load on a shared
 * machine (timed one after the other, a burst of load elsewhere skews the ratio).
 */
function timePair(a: () => void, b: (() => void) | null, runs = 60, warm = 15): [number, number] {
  for (let i = 0; i < warm; i++) {
    a();
    b?.();
  }
  const xs: number[] = [];
  const ys: number[] = [];
  for (let i = 0; i < runs; i++) {
    let t0 = performance.now();
    a();
    xs.push(performance.now() - t0);
    if (!b) continue;
    t0 = performance.now();
    b();
    ys.push(performance.now() - t0);
  }
  return [median(xs), b ? median(ys) : NaN];
}

/** A timed reparse of `text` after replacing the character at `at` with `ch`, reusing the first parse. */
function reparse(p: Parser, text: string, at: number, ch: string): () => void {
  const edited = `${text.slice(0, at)}${ch}${text.slice(at + 1)}`;
  const fragments = TreeFragment.addTree(p.parse(text));
  const changes = [{ fromA: at, toA: at + 1, fromB: at, toB: at + 1 }];
  return () => {
    p.parse(edited, TreeFragment.applyChanges(fragments, changes));
  };
}

export default async function run(): Promise<void> {
  const text = programme(1000);
  const md = markdown(text.length);
  const kb = (text.length / 1024).toFixed(1);
  const [full, mdFull] = timePair(() => parser.parse(text), () => markdownParser.parse(md));
  const [inc, mdInc] = timePair(
    reparse(parser, text, text.indexOf("3x", text.length >> 1) + 2, "6"),
    reparse(markdownParser, md, md.length >> 1, "x"),
    200,
    50,
  );
  const tree = parser.parse(text);
  const build = time(() => buildProgramme(tree, text));
  const model = time(() => parseProgramme(text), 30, 5);
  const row = (what: string, iq: number, yard: number | null, target: string, pass: boolean | null) =>
    `${what.padEnd(34)} ${iq.toFixed(3).padStart(9)} ms  ${yard === null ? "".padStart(12) : `${yard.toFixed(3).padStart(9)} ms`}  ${target.padEnd(22)} ${pass === null ? "" : pass ? "pass" : "MISS"}`;
  console.log(`1,000-line programme, ${kb} KB; markdown yardstick of the same size (medians)`);
  console.log(`${"measure".padEnd(34)} ${".iq".padStart(12)}  ${"markdown".padStart(12)}  ${"target".padEnd(22)} result`);
  console.log(row("full parse (warm)", full, mdFull, "≤ 10 ms", full <= 10));
  console.log(row("incremental, one-character edit", inc, mdInc, "≤ 0.5 ms", inc <= 0.5));
  console.log(row("per byte vs markdown (full parse)", full / text.length * 1e3, mdFull / md.length * 1e3, "≤ markdown (µs/KB)", full / text.length <= mdFull / md.length));
  console.log(row("tree → model (buildProgramme)", build, null, "≤ 5 ms", build <= 5));
  console.log(row("text → model (parseProgramme)", model, null, "none (full parse + model)", null));
}
