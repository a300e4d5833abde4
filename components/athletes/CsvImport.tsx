"use client";
import { useQueryClient } from "@tanstack/react-query";
import { useRef, useState } from "react";
import type { CsvApplyResponse, CsvPreviewResponse, CsvProblem, CsvRow } from "@/app/api/athletes/types";
import { api, ApiFailure, describeFailure } from "@/components/templates/api";
import { CSV_MAX_BYTES, CSV_MAX_ROWS, CSV_OPTIONAL, CSV_REQUIRED, describeCsvProblem, MAXES_CSV_EXAMPLE } from "@/lib/athlete/maxesCsv";
import { recomputedText } from "./format";
import { maxesKey } from "./MaxesPanel";

const COLUMNS = ["exercise", "value", "unit", "date", "kind", "source", "note"] as const;
const EXAMPLE_HREF = `data:text/csv;charset=utf-8,${encodeURIComponent(MAXES_CSV_EXAMPLE)}`;

/** Problems listed above the table; every bad row is also highlighted in it. */
const PROBLEMS_SHOWN = 30;

/**
 * Maxes from a CSV file in two steps: choose the file and see every row
 * checked (nothing is written), then add them all at once. Adding stays off
 * while any row has a problem; a file is imported whole or not at all.
 */
export function CsvImport({ athleteId }: { athleteId: string }) {
  const client = useQueryClient();
  const input = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<CsvPreviewResponse | null>(null);
  const [busy, setBusy] = useState<"preview" | "apply" | null>(null);
  const [message, setMessage] = useState<{ tone: "ok" | "bad"; text: string } | null>(null);
  const [applyProblems, setApplyProblems] = useState<string[]>([]);

  function post<T>(mode: "preview" | "apply", f: File) {
    const form = new FormData();
    form.set("file", f);
    return api<T>(`/api/athletes/${athleteId}/maxes/csv?mode=${mode}`, { method: "POST", body: form });
  }

  async function choose(f: File) {
    setFile(f);
    setPreview(null);
    setMessage(null);
    setApplyProblems([]);
    if (f.size > CSV_MAX_BYTES) {
      setMessage({ tone: "bad", text: `That file is over the ${CSV_MAX_BYTES / 1024} KB limit; split it into smaller files.` });
      return;
    }
    setBusy("preview");
    try {
      setPreview(await post<CsvPreviewResponse>("preview", f));
    } catch (e) {
      setMessage({ tone: "bad", text: describeFailure(e) });
    } finally {
      setBusy(null);
    }
  }

  async function apply() {
    if (!file) return;
    setBusy("apply");
    setApplyProblems([]);
    try {
      const res = await post<CsvApplyResponse>("apply", file);
      const skipped = res.skipped ? ` ${res.skipped} already on file ${res.skipped === 1 ? "was" : "were"} left as they were.` : "";
      setMessage({ tone: "ok", text: res.added === 0 ? `Nothing new to add: every max in the file is already on file.` : `Added ${res.added} max${res.added === 1 ? "" : "es"}.${skipped} ${recomputedText(res.recomputed)}` });
      reset(false);
      await client.invalidateQueries({ queryKey: maxesKey(athleteId) });
    } catch (e) {
      setMessage({ tone: "bad", text: describeFailure(e) });
      if (e instanceof ApiFailure) setApplyProblems(Object.entries(e.error.fields).map(([k, v]) => `${k.replace(/^rows\.(\d+)\./, "Line $1, ")}: ${v}`));
    } finally {
      setBusy(null);
    }
  }

  function reset(clearMessage = true) {
    setFile(null);
    setPreview(null);
    if (clearMessage) setMessage(null);
    if (input.current) input.current.value = "";
  }

  const bad = preview ? preview.rows.filter((r) => r.problems.length > 0).length : 0;
  const repeats = new Set(preview?.repeats ?? []);
  const fresh = preview ? preview.rows.length - repeats.size : 0;
  const canApply = !!preview && preview.ok && fresh > 0 && busy === null;

  return (
    <div className="space-y-4 text-sm">
      <div className="space-y-2 text-iron-600">
        <p>
          One max per line, with a header line first. Required columns: <code className="rounded bg-chalk-200 px-1">{CSV_REQUIRED.join(", ")}</code>; optional:{" "}
          <code className="rounded bg-chalk-200 px-1">{CSV_OPTIONAL.join(", ")}</code>. Dates are written YYYY-MM-DD and may not be in the future; unit is kg or lb; kind is 1rm
          (the default) or tm; source is tested (the default), estimated or logs. Columns may come in any order, separated by commas, semicolons or tabs.
        </p>
        <p>
          Up to {CSV_MAX_ROWS.toLocaleString("en")} rows and {CSV_MAX_BYTES / 1024} KB per file. Exercise names must be built-in or in the exercise library. Nothing is added until
          every row is right.
        </p>
        <details className="rounded-md border border-chalk-200 bg-chalk-50 px-3 py-2">
          <summary className="cursor-pointer font-medium text-iron-700">Example file</summary>
          <pre className="mt-2 overflow-x-auto text-xs leading-5 text-iron-700">{MAXES_CSV_EXAMPLE}</pre>
        </details>
        <a href={EXAMPLE_HREF} download="maxes-example.csv" className="inline-block font-medium text-ember-700 underline underline-offset-2">
          Download the example (maxes-example.csv)
        </a>
      </div>

      <div className="flex flex-wrap items-center gap-3">
        <input ref={input} id={`csv-${athleteId}`} type="file" accept=".csv,text/csv,text/plain" className="sr-only" onChange={(e) => e.target.files?.[0] && void choose(e.target.files[0])} />
        <label htmlFor={`csv-${athleteId}`} className="btn-quiet cursor-pointer">{busy === "preview" ? "Checking…" : file ? "Choose another file" : "Choose a CSV file"}</label>
        {file ? <span className="truncate text-iron-500">{file.name}</span> : null}
      </div>

      {message ? (
        <p role={message.tone === "bad" ? "alert" : "status"} className={message.tone === "bad" ? "text-ember-700" : "rounded-md bg-moss-100 px-3 py-2 text-moss-700"}>
          {message.text}
        </p>
      ) : null}
      {applyProblems.length ? (
        <ul className="list-disc pl-5 text-ember-700">
          {applyProblems.map((p) => (
            <li key={p}>{p}</li>
          ))}
        </ul>
      ) : null}

      {preview ? (
        <div className="space-y-3" data-testid="csv-preview">
          <p className="font-medium text-iron-700" aria-live="polite">
            {preview.rows.length} row{preview.rows.length === 1 ? "" : "s"} read
            {bad > 0 || preview.fileProblems.length > 0 ? ` — ${preview.problems.length} problem${preview.problems.length === 1 ? "" : "s"}; fix the file and choose it again.` : " — all good."}
            {repeats.size > 0 ? ` ${repeats.size} ${repeats.size === 1 ? "is" : "are"} already on file and will be left out.` : ""}
          </p>
          <ProblemList problems={preview.problems} />
          {preview.rows.length ? <PreviewTable rows={preview.rows} repeats={repeats} /> : null}
          <div className="flex flex-wrap items-center gap-3">
            <button type="button" className="btn-primary" disabled={!canApply} onClick={apply}>
              {busy === "apply" ? "Adding…" : `Add ${fresh} max${fresh === 1 ? "" : "es"}`}
            </button>
            <button type="button" className="btn-quiet" disabled={busy !== null} onClick={() => reset()}>Cancel</button>
            {!preview.ok ? <span className="text-iron-500">Adding is off until every row is right.</span> : null}
          </div>
        </div>
      ) : null}
    </div>
  );
}

function PreviewTable({ rows, repeats }: { rows: CsvRow[]; repeats: ReadonlySet<number> }) {
  return (
    <div className="max-h-[28rem] overflow-auto rounded-md border border-chalk-200">
      <table className="w-full min-w-[40rem] text-left text-xs">
        <caption className="sr-only">Rows read from the file</caption>
        <thead className="sticky top-0 bg-chalk-50 uppercase tracking-wider text-iron-400">
          <tr>
            <th scope="col" className="px-2 py-2 font-semibold">Line</th>
            {COLUMNS.map((c) => (
              <th key={c} scope="col" className="px-2 py-2 font-semibold">{c}</th>
            ))}
          </tr>
        </thead>
        <tbody className="divide-y divide-chalk-200">
          {rows.map((r) => {
            const badFields = new Set(r.problems.map((p) => p.field));
            return (
              <tr
                key={r.line}
                className={r.problems.length ? "bg-ember-50" : repeats.has(r.line) ? "text-iron-400" : ""}
                data-problem={r.problems.length ? "true" : undefined}
                data-repeat={repeats.has(r.line) ? "true" : undefined}
              >
                <td className="px-2 py-1.5 align-top tabular-nums text-iron-500">
                  {r.line}
                  {repeats.has(r.line) ? <span className="ml-1 whitespace-nowrap rounded bg-chalk-200 px-1 text-[10px] uppercase tracking-wide">on file</span> : null}
                </td>
                {COLUMNS.map((c) => (
                  <td key={c} className={`px-2 py-1.5 align-top ${badFields.has(c) ? "font-semibold text-ember-700 underline decoration-wavy" : ""}`}>
                    {c === "exercise" && r.max && r.max.exercise.toLowerCase() !== (r.cells.exercise ?? "").trim().toLowerCase() ? (
                      <>
                        {r.cells.exercise} <span className="text-iron-400">→ {r.max.exercise}</span>
                      </>
                    ) : (
                      (r.cells[c] ?? "")
                    )}
                  </td>
                ))}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

function ProblemList({ problems }: { problems: CsvProblem[] }) {
  if (!problems.length) return null;
  const more = problems.length - PROBLEMS_SHOWN;
  return (
    <ul className="list-disc space-y-1 pl-5 text-ember-700" aria-label="Problems by line">
      {problems.slice(0, PROBLEMS_SHOWN).map((p, i) => (
        <li key={i}>{describeCsvProblem(p)}</li>
      ))}
      {more > 0 ? <li className="list-none text-iron-500">…and {more} more, highlighted in the table.</li> : null}
    </ul>
  );
}
