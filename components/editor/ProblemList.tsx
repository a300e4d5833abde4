"use client";
import { memo } from "react";

export type Problem = { line: number; column: number; severity: "error" | "warning" | "info"; message: string };

// The notation reports unknown names as "unknown exercise 'name' — …".
function unknownName(message: string): string | null {
  return /^unknown exercise '([^']+)'/.exec(message)?.[1] ?? null;
}

const MARK = { error: "bg-ember-600", warning: "bg-brass-500", info: "bg-iron-300" } as const;

/** Every problem in the text; choosing one puts the cursor on it. */
export const ProblemList = memo(function ProblemList({ problems, onJump }: { problems: readonly Problem[]; onJump(line: number, column: number): void }) {
  if (problems.length === 0) {
    return <p className="text-sm text-moss-700" data-testid="problems-none">No problems found.</p>;
  }
  return (
    <details open className="panel" data-testid="problems">
      <summary className="cursor-pointer px-3 py-2 text-sm font-semibold">
        {problems.length} {problems.length === 1 ? "problem" : "problems"}
      </summary>
      <ul className="max-h-48 overflow-y-auto border-t border-chalk-200">
        {problems.map((p, i) => (
          <ProblemRow key={i} p={p} onJump={onJump} />
        ))}
      </ul>
    </details>
  );
});

type RowProps = { p: Problem; onJump(line: number, column: number): void };

// Typing changes one or two problems at a time; the others keep their rendering.
const ProblemRow = memo(
  function ProblemRow({ p, onJump }: RowProps) {
    const name = unknownName(p.message);
    return (
      <li className="flex items-start">
        <button type="button" onClick={() => onJump(p.line, p.column)} className="flex w-full items-start gap-2 px-3 py-1.5 text-left text-sm hover:bg-chalk-100">
          <span className={`mt-1.5 h-2 w-2 shrink-0 rounded-full ${MARK[p.severity]}`} aria-hidden="true" />
          <span className="font-mono text-xs text-iron-400">{p.line}:{p.column}</span>
          <span className="min-w-0 flex-1">
            <span className="sr-only">{p.severity}: </span>
            {p.message}
          </span>
        </button>
        {name ? (
          <a href={`/coach/library?add=${encodeURIComponent(name)}`} target="_blank" rel="noreferrer" className="shrink-0 px-3 py-1.5 text-xs font-semibold text-ember-600 hover:underline">
            Add to library
          </a>
        ) : null}
      </li>
    );
  },
  (a: RowProps, b: RowProps) => a.onJump === b.onJump && a.p.line === b.p.line && a.p.column === b.p.column && a.p.severity === b.p.severity && a.p.message === b.p.message,
);
