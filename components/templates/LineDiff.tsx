/**
 * A line diff of two versions' text, side by side in one column: removed lines
 * struck on a warm tint, added lines on a green one, unchanged runs folded.
 */
import { diffLines } from "diff";

type Row = { kind: "same" | "add" | "del" | "fold"; a: number | null; b: number | null; text: string };

export function lineDiffRows(before: string, after: string, context = 3): Row[] {
  const rows: Row[] = [];
  let a = 1;
  let b = 1;
  // A last line without a newline would otherwise show as changed when a line is added after it.
  const withEol = (t: string) => (t === "" || t.endsWith("\n") ? t : `${t}\n`);
  for (const part of diffLines(withEol(before), withEol(after))) {
    const lines = part.value.replace(/\n$/, "").split("\n");
    for (const text of lines) {
      if (part.added) rows.push({ kind: "add", a: null, b: b++, text });
      else if (part.removed) rows.push({ kind: "del", a: a++, b: null, text });
      else rows.push({ kind: "same", a: a++, b: b++, text });
    }
  }
  // Fold long unchanged stretches, keeping `context` lines around each change.
  const near = rows.map((r, i) => rows.slice(Math.max(0, i - context), i + context + 1).some((x) => x.kind !== "same"));
  const out: Row[] = [];
  for (let i = 0; i < rows.length; i++) {
    if (near[i]) out.push(rows[i]);
    else if (out.at(-1)?.kind !== "fold") out.push({ kind: "fold", a: null, b: null, text: "" });
  }
  return out;
}

const STYLE = { same: "text-iron-600", add: "bg-moss-100 text-moss-700", del: "bg-ember-50 text-ember-700 line-through decoration-ember-400/60", fold: "" } as const;

export function LineDiff({ before, after }: { before: string; after: string }) {
  const rows = lineDiffRows(before, after);
  const changed = rows.filter((r) => r.kind === "add" || r.kind === "del").length;
  if (changed === 0) return <p className="panel p-6 text-sm text-iron-500">These two versions have the same text.</p>;
  return (
    <div className="panel overflow-x-auto" data-testid="line-diff">
      <table className="w-full font-mono text-[13px] leading-6">
        <tbody>
          {rows.map((r, i) =>
            r.kind === "fold" ? (
              <tr key={i} className="bg-chalk-100 text-center text-xs text-iron-400">
                <td colSpan={4} className="py-1">⋯ unchanged lines ⋯</td>
              </tr>
            ) : (
              <tr key={i} className={STYLE[r.kind]} data-kind={r.kind}>
                <td className="w-10 select-none border-r border-chalk-200 px-2 text-right text-xs text-iron-300">{r.a ?? ""}</td>
                <td className="w-10 select-none border-r border-chalk-200 px-2 text-right text-xs text-iron-300">{r.b ?? ""}</td>
                <td className="w-6 select-none text-center">{r.kind === "add" ? "+" : r.kind === "del" ? "−" : ""}</td>
                <td className="whitespace-pre pr-4">{r.text || " "}</td>
              </tr>
            ),
          )}
        </tbody>
      </table>
    </div>
  );
}
