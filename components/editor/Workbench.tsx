"use client";
/**
 * The coach's workbench: the notation editor beside a live preview worked for
 * a preview athlete. One model per change, built from the editor's own
 * incrementally parsed tree, feeds the underlines, the problem list and the
 * preview; the draft is kept locally (once the browser is idle, and at once
 * when the page is hidden) and on the server shortly after, so a closed tab
 * loses nothing.
 */
import { useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState } from "react";
import { expandProgramme } from "@/lib/load";
import type { Tree } from "@lezer/common";
import { buildProgramme, formatProgramme, LineCache, parseProgramme } from "@/lib/notation";
import type { Diagnostic } from "@/lib/notation/model";
import { CATALOGUE } from "@/lib/exercises/catalogue";
import { exerciseResolver, type LibraryName } from "@/lib/exercises/resolve";
import { Caution } from "../Caution";
import { WeekPreview } from "../preview/WeekPreview";
import { IqEditor, type IqEditorHandle } from "./IqEditor";
import { ProblemList, type Problem } from "./ProblemList";
import { PreviewAthletePanel } from "./PreviewAthletePanel";
import { useLocalDraft } from "./useLocalDraft";
import { usePreviewAthlete } from "./usePreviewAthlete";
import { useSameData } from "./useSameData";
import { nextMonday, SAMPLE_MAXES_KG, sampleProfile } from "./sampleProfile";

export type SaveState = { kind: "idle" } | { kind: "saving" } | { kind: "saved"; message: string } | { kind: "error"; message: string };

type Props = {
  /** Key for the local draft copy, e.g. "template:<id>" or "template:new". */
  draftKey: string;
  initialText: string;
  /** The coach's own exercises by every name they answer to: completion, name checks, and loads. */
  library?: readonly LibraryName[];
  onSave(text: string): Promise<SaveState>;
  onDraft?(text: string): Promise<void>;
  saveLabel?: string;
  toolbar?: React.ReactNode;
};

const CATALOGUE_NAMES = CATALOGUE.flatMap((e) => [e.name, ...e.aliases]);

const NO_LIBRARY: readonly LibraryName[] = [];

export function Workbench({ draftKey, initialText, library = NO_LIBRARY, onSave, onDraft, saveLabel = "Save version", toolbar }: Props) {
  const editor = useRef<IqEditorHandle>(null);
  // The tree, when the editor gave one, is of exactly this text.
  const [source, setSource] = useState<{ text: string; tree: Tree | null }>({ text: initialText, tree: null });
  const text = source.text;
  const [save, setSave] = useState<SaveState>({ kind: "idle" });
  const [week, setWeek] = useState(1);
  const [units, setUnits] = useState<"kg" | "lb">("kg");
  const [maxes, setMaxes] = useState<Record<string, number>>(SAMPLE_MAXES_KG);
  const [draftNote, setDraftNote] = useState<string | null>(null);
  const start = useMemo(() => nextMonday(), []);
  const known = useMemo(() => [...new Set([...CATALOGUE_NAMES, ...library.map((n) => n.name)])], [library]);
  const resolve = useMemo(() => exerciseResolver(library), [library]);

  // Unchanged exercise lines are taken over from the last build (the model is only read here).
  const lineCache = useRef<LineCache | null>(null);
  const parsed = useMemo(() => {
    const options = { knownExercises: known, cache: (lineCache.current ??= new LineCache()) };
    return source.tree ? buildProgramme(source.tree, source.text, options) : parseProgramme(source.text, options);
  }, [source, known]);
  // Underlines and preview change in the same frame. While a line is being typed it
  // is often incomplete and left out of the model: an equal model keeps the last
  // one, so nothing below is worked again; otherwise the preview days are memoised
  // and only the day that changed renders again.
  const programme = useSameData(parsed.programme);
  const totalWeeks = Math.max(1, programme.blocks.reduce((s, b) => s + b.weeks, 0));
  const shownWeek = Math.min(week, totalWeeks);
  const previewAthlete = usePreviewAthlete();
  const sample = useMemo(() => sampleProfile(units, maxes), [units, maxes]);
  // While a chosen athlete loads, the preview keeps showing the sample rather than going blank.
  const profile = previewAthlete.profile ?? sample;
  const expansion = useMemo(() => expandProgramme(programme, profile, { start, weeks: shownWeek, library }), [programme, profile, start, shownWeek, library]);
  const sessions = useMemo(() => expansion.sessions.filter((s) => s.weekInProgramme === shownWeek), [expansion, shownWeek]);
  const rotations = useMemo(() => {
    const m = new Map<number, string[]>();
    for (const b of programme.blocks) for (const d of b.days) for (const e of d.exercises) if (e.variations.length > 1) m.set(e.line, e.variations);
    return m;
  }, [programme]);
  const usedNames = useSameData(useMemo(() => {
    const written = new Set<string>();
    for (const b of programme.blocks) for (const d of b.days) for (const e of d.exercises) if (e.intensity) for (const n of [...e.variations, ...e.substitutes]) written.add(n);
    // The same few names come back on many lines: resolve each spelling once.
    return [...new Set([...written].map((n) => resolve(n)?.name ?? n.toLowerCase()))];
  }, [programme, resolve]));

  const problems: Problem[] = useSameData(useMemo(() => {
    const fromNotation = parsed.diagnostics.map((d: Diagnostic) => ({ line: d.line, column: d.column, severity: d.severity, message: d.message }));
    const fromLoads = expansion.diagnostics
      .filter((d) => d.line !== null && d.code !== "no-max")
      .map((d) => ({ line: d.line as number, column: 1, severity: d.severity, message: d.message }));
    return [...fromNotation, ...fromLoads].sort((a, b) => a.line - b.line || a.column - b.column);
  }, [parsed.diagnostics, expansion.diagnostics]));
  const errorCount = parsed.diagnostics.filter((d) => d.severity === "error").length;

  // Keystroke → repaint, measured by the editor benchmark (performance marks, not a test).
  // Measured at the first frame after the preview shows the change.
  useLayoutEffect(() => {
    if (typeof performance === "undefined" || performance.getEntriesByName("iq:change").length === 0) return;
    requestAnimationFrame(() => {
      // Two commits before one frame measure once.
      if (performance.getEntriesByName("iq:change").length === 0) return;
      performance.measure("iq:repaint", "iq:change");
      performance.clearMarks("iq:change");
    });
  }, [sessions, parsed]);

  // A newer local copy than the server's is offered back on load.
  useEffect(() => {
    try {
      const raw = localStorage.getItem(`iq-draft:${draftKey}`);
      if (raw) {
        const saved = JSON.parse(raw) as { text: string; at: string };
        if (saved.text !== initialText) setDraftNote(saved.at);
      }
    } catch {
      /* storage unavailable: the server draft still applies */
    }
  }, [draftKey, initialText]);

  const localDraft = useLocalDraft(draftKey, text, initialText);
  const latestText = useRef(text);
  useEffect(() => {
    latestText.current = text;
    if (text === initialText || !onDraft) return;
    const t = setTimeout(() => void onDraft(text).catch(() => undefined), 800);
    return () => clearTimeout(t);
  }, [text, initialText, onDraft]);

  const onChange = useCallback((next: string, syntax: () => Tree | null) => {
    performance.mark("iq:change");
    setSource({ text: next, tree: syntax() });
    setSave((s) => (s.kind === "saved" || s.kind === "error" ? { kind: "idle" } : s));
  }, []);

  // Stable, so the memoised preview days do not render again for a new handler.
  const jumpTo = useCallback((line: number, column: number) => editor.current?.jumpTo(line, column), []);
  const jumpToLine = useCallback((line: number) => editor.current?.jumpTo(line, 1), []);

  const format = useCallback(() => editor.current?.replaceAll(formatProgramme(latestText.current)), []);

  const doSave = useCallback(async () => {
    setSave({ kind: "saving" });
    const result = await onSave(latestText.current).catch(() => ({ kind: "error", message: "Could not reach Ironquill; your text is kept here. Try again." }) as SaveState);
    setSave(result);
    if (result.kind === "saved") localDraft.forget();
  }, [onSave, localDraft]);

  // Same athlete in the other unit: 1 lb = 0.45359237 kg, maxes to the nearest 2.5 kg / 5 lb.
  const switchUnits = useCallback((next: "kg" | "lb") => {
    if (next === units) return;
    const factor = next === "lb" ? 1 / 0.45359237 : 0.45359237;
    const step = next === "lb" ? 5 : 2.5;
    setMaxes((m) => Object.fromEntries(Object.entries(m).map(([k, v]) => [k, Math.round((v * factor) / step) * step])));
    setUnits(next);
  }, [units]);

  function restoreLocal() {
    try {
      localDraft.flush();
      const raw = localStorage.getItem(`iq-draft:${draftKey}`);
      if (raw) editor.current?.replaceAll((JSON.parse(raw) as { text: string }).text);
    } finally {
      setDraftNote(null);
    }
  }

  return (
    <div className="grid gap-4 lg:grid-cols-[minmax(0,1.1fr)_minmax(0,1fr)]">
      <section aria-label="Programme text" className="flex min-w-0 flex-col gap-3">
        <div className="flex flex-wrap items-center gap-2">
          {toolbar}
          <button type="button" onClick={format} className="btn-quiet py-2" title="Tidy spacing and keyword case (Shift+Alt+F)">
            Tidy
          </button>
          <button type="button" onClick={() => void doSave()} disabled={save.kind === "saving"} className="btn-primary py-2" title="Save a new version (Ctrl/Cmd+S)">
            {save.kind === "saving" ? "Saving…" : saveLabel}
          </button>
          <span role="status" className={`text-sm ${save.kind === "error" ? "text-ember-700" : "text-iron-500"}`} data-testid="save-status">
            {save.kind === "saved" || save.kind === "error" ? save.message : errorCount ? `${errorCount} to fix before saving` : ""}
          </span>
        </div>
        {draftNote ? (
          <div className="flex flex-wrap items-center gap-3 rounded-md border border-brass-500/40 bg-brass-100/60 px-3 py-2 text-sm">
            <span>Unsaved text from {new Date(draftNote).toLocaleString()} was kept on this device.</span>
            <button type="button" className="font-semibold text-ember-700 underline" onClick={restoreLocal}>Bring it back</button>
            <button type="button" className="text-iron-500 underline" onClick={() => setDraftNote(null)}>Dismiss</button>
          </div>
        ) : null}
        <div className="panel h-[55dvh] overflow-hidden lg:h-[calc(100dvh-16rem)]">
          <IqEditor ref={editor} initialText={initialText} diagnostics={parsed.diagnostics} exerciseNames={known} onChange={onChange} onFormat={format} onSave={() => void doSave()} />
        </div>
        <ProblemList problems={problems} onJump={jumpTo} />
      </section>

      <section aria-label="Preview" className="flex min-w-0 flex-col gap-3">
        <div className="flex flex-wrap items-center justify-between gap-2">
          <h2 className="text-sm font-semibold uppercase tracking-wider text-iron-400">Preview</h2>
          <div className="flex items-center gap-1" role="group" aria-label="Week">
            <button type="button" className="btn-quiet px-2.5 py-1.5" onClick={() => setWeek(Math.max(1, shownWeek - 1))} disabled={shownWeek <= 1} aria-label="Previous week">‹</button>
            <span className="min-w-[6.5rem] text-center text-sm font-semibold" data-testid="preview-week">Week {shownWeek} of {totalWeeks}</span>
            <button type="button" className="btn-quiet px-2.5 py-1.5" onClick={() => setWeek(Math.min(totalWeeks, shownWeek + 1))} disabled={shownWeek >= totalWeeks} aria-label="Next week">›</button>
          </div>
        </div>
        <PreviewAthletePanel athlete={previewAthlete} units={units} onUnits={switchUnits} maxes={maxes} onMaxes={setMaxes} names={usedNames} />
        <div className="lg:max-h-[calc(100dvh-22rem)] lg:overflow-y-auto">
          <WeekPreview sessions={sessions} rotations={rotations} onLine={jumpToLine} />
        </div>
        <Caution />
      </section>
    </div>
  );
}
