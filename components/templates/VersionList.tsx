"use client";
import Link from "next/link";
import { useState } from "react";

type V = { number: number; note: string | null; createdAt: string; authorName: string };
const WHEN = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", hour: "2-digit", minute: "2-digit" });

/** Versions newest first; pick any two to compare line by line, or download one as .iq. */
export function VersionList({ templateId, versions }: { templateId: string; versions: V[] }) {
  // Until the coach picks, compare the two newest (the list grows as versions are saved).
  const [pickA, setA] = useState<number | null>(null);
  const [pickB, setB] = useState<number | null>(null);
  const a = pickA ?? versions[1]?.number ?? versions[0]?.number ?? 1;
  const b = pickB ?? versions[0]?.number ?? 1;
  if (versions.length === 0) return <p className="text-sm text-iron-400">Not saved yet.</p>;
  return (
    <div>
      <ul className="divide-y divide-chalk-200" data-testid="version-list">
        {versions.map((v) => (
          <li key={v.number} className="flex items-center gap-3 py-2 text-sm">
            <span className="flex gap-1" role="group" aria-label={`Compare version ${v.number}`}>
              <input type="radio" name="cmp-a" aria-label={`Compare from version ${v.number}`} checked={a === v.number} onChange={() => setA(v.number)} />
              <input type="radio" name="cmp-b" aria-label={`Compare to version ${v.number}`} checked={b === v.number} onChange={() => setB(v.number)} />
            </span>
            <span className="font-mono font-semibold">v{v.number}</span>
            <span className="min-w-0 flex-1 truncate text-iron-600">{v.note ?? <span className="text-iron-300">no note</span>}</span>
            <span className="hidden text-xs text-iron-400 sm:inline">{WHEN.format(new Date(v.createdAt))}</span>
            <a href={`/api/templates/${templateId}/versions/${v.number}?format=iq`} className="text-xs font-semibold text-ember-600 hover:underline" aria-label={`Download version ${v.number} as .iq`}>
              .iq
            </a>
          </li>
        ))}
      </ul>
      {versions.length > 1 ? (
        <Link href={`/coach/templates/${templateId}/diff?a=${Math.min(a, b)}&b=${Math.max(a, b)}`} className={`btn-quiet mt-3 ${a === b ? "pointer-events-none opacity-50" : ""}`} aria-disabled={a === b}>
          Compare v{Math.min(a, b)} with v{Math.max(a, b)}
        </Link>
      ) : null}
    </div>
  );
}
