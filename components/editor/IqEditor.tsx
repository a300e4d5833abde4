"use client";
/**
 * The notation editor: CodeMirror 6 with the .iq language. The parent owns the
 * text and the model; diagnostics are pushed in. Each change hands over the
 * editor's own syntax tree, which CodeMirror reparses incrementally, so the
 * model is built without parsing the whole text a second time.
 */
import { autocompletion, closeBrackets, closeBracketsKeymap, completionKeymap } from "@codemirror/autocomplete";
import { defaultKeymap, history, historyKeymap, indentWithTab } from "@codemirror/commands";
import { bracketMatching, ensureSyntaxTree, foldGutter, foldKeymap, syntaxHighlighting } from "@codemirror/language";
import { type Diagnostic as CmDiagnostic, forEachDiagnostic, lintGutter, setDiagnostics } from "@codemirror/lint";
import { EditorSelection, EditorState } from "@codemirror/state";
import { drawSelection, EditorView, highlightActiveLine, highlightActiveLineGutter, keymap, lineNumbers, placeholder } from "@codemirror/view";
import type { Tree } from "@lezer/common";
import { forwardRef, useEffect, useImperativeHandle, useRef } from "react";
import type { Diagnostic } from "@/lib/notation/model";
import { iq, iqHighlightStyle, iqTheme } from "./language";

export type IqEditorHandle = {
  /** Move the cursor to a 1-based line and column and focus the editor. */
  jumpTo(line: number, column: number): void;
  /** Replace the whole text as one undoable change (used by the formatter). */
  replaceAll(text: string): void;
  focus(): void;
};

type Props = {
  initialText: string;
  diagnostics: readonly Diagnostic[];
  exerciseNames: readonly string[];
  /**
   * The new text, and a way to get the editor's syntax tree of all of it (null
   * when it cannot be finished in reasonable time; then parse the text instead).
   */
  onChange(text: string, syntax: () => Tree | null): void;
  onFormat(): void;
  onSave?(): void;
  ariaLabel?: string;
};

/**
 * Time the update may spend finishing the incremental parse. The language has
 * almost always finished it already; a fresh parse of the text would cost more.
 */
const TREE_BUDGET_MS = 2000;

/** The diagnostics the editor shows now (mapped through edits) are exactly these. */
function sameAsShown(state: EditorState, diags: readonly CmDiagnostic[]): boolean {
  let i = 0;
  let same = true;
  forEachDiagnostic(state, (d, from, to) => {
    const n = diags[i++];
    if (!n || n.from !== from || n.to !== to || n.severity !== d.severity || n.message !== d.message) same = false;
  });
  return same && i === diags.length;
}

export const IqEditor = forwardRef<IqEditorHandle, Props>(function IqEditor(props, ref) {
  const host = useRef<HTMLDivElement>(null);
  const view = useRef<EditorView | null>(null);
  // Handlers and names change every render; the editor reads the latest through refs.
  const latest = useRef(props);
  latest.current = props;

  useEffect(() => {
    if (!host.current) return;
    const v = new EditorView({
      parent: host.current,
      state: EditorState.create({
        doc: latest.current.initialText,
        extensions: [
          lineNumbers(),
          highlightActiveLineGutter(),
          foldGutter({ openText: "▾", closedText: "▸" }),
          lintGutter(),
          history(),
          drawSelection(),
          highlightActiveLine(),
          bracketMatching(),
          closeBrackets(),
          autocompletion({ activateOnTyping: true, maxRenderedOptions: 30 }),
          iq(() => latest.current.exerciseNames),
          syntaxHighlighting(iqHighlightStyle),
          iqTheme,
          EditorView.lineWrapping,
          placeholder("title: My programme\nday Monday mon\n  back squat 3x5 @75%"),
          EditorView.contentAttributes.of({ "aria-label": latest.current.ariaLabel ?? "Programme text", spellcheck: "false", autocapitalize: "off", autocorrect: "off" }),
          keymap.of([
            { key: "Shift-Alt-f", run: () => (latest.current.onFormat(), true) },
            { key: "Mod-s", preventDefault: true, run: () => (latest.current.onSave?.(), true) },
            ...closeBracketsKeymap,
            ...defaultKeymap,
            ...historyKeymap,
            ...foldKeymap,
            ...completionKeymap,
            indentWithTab,
          ]),
          EditorView.updateListener.of((u) => {
            if (u.docChanged) latest.current.onChange(u.state.doc.toString(), () => ensureSyntaxTree(u.state, u.state.doc.length, TREE_BUDGET_MS));
          }),
        ],
      }),
    });
    view.current = v;
    return () => {
      v.destroy();
      view.current = null;
    };
  }, []);

  useEffect(() => {
    const v = view.current;
    if (!v) return;
    const len = v.state.doc.length;
    const diags: CmDiagnostic[] = props.diagnostics.map((d) => ({
      from: Math.min(d.from, len),
      to: Math.min(Math.max(d.to, d.from), len),
      severity: d.severity,
      message: d.message,
    }));
    // Most keystrokes leave the problems where CodeMirror has already mapped them.
    if (!sameAsShown(v.state, diags)) v.dispatch(setDiagnostics(v.state, diags));
  }, [props.diagnostics]);

  useImperativeHandle(ref, () => ({
    jumpTo(line, column) {
      const v = view.current;
      if (!v) return;
      const l = v.state.doc.line(Math.max(1, Math.min(line, v.state.doc.lines)));
      const pos = Math.min(l.from + Math.max(0, column - 1), l.to);
      v.dispatch({ selection: EditorSelection.cursor(pos), scrollIntoView: true });
      v.focus();
    },
    replaceAll(text) {
      const v = view.current;
      if (!v || text === v.state.doc.toString()) return;
      const line = v.state.doc.lineAt(v.state.selection.main.head).number;
      v.dispatch({ changes: { from: 0, to: v.state.doc.length, insert: text } });
      const l = v.state.doc.line(Math.min(line, v.state.doc.lines));
      v.dispatch({ selection: EditorSelection.cursor(l.to), scrollIntoView: true });
    },
    focus() {
      view.current?.focus();
    },
  }));

  return <div ref={host} className="iq-editor h-full min-h-[18rem] overflow-hidden" data-testid="iq-editor" />;
});
