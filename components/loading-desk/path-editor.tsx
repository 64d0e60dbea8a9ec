"use client";

import { useRef, useState } from "react";
import type { Leg } from "@/lib/mechanics/types";
import type { PathDoc } from "@/lib/scenario/path-text/path-doc";
import { formatPathTextError, type PathTextError } from "@/lib/scenario/path-text/parse-path-text";
import { PATH_TEMPLATES } from "@/lib/client/loading-desk/templates";
import { PathNotationHelp } from "./path-notation-help";
import { PathPreview } from "./path-preview";
import { PathTable } from "./path-table";

export interface PathEditorProps {
  text: string;
  doc: PathDoc;
  legs: Leg[];
  errors: PathTextError[];
  readOnly?: boolean;
  onText: (text: string) => void;
  onDoc: (doc: PathDoc) => void;
}

/** Start of line `line`, column `column` in `text` (both 1-based). */
function offsetOf(text: string, line: number, column: number): number {
  const lines = text.split("\n");
  return lines.slice(0, line - 1).reduce((s, l) => s + l.length + 1, 0) + column - 1;
}

export function PathEditor({ text, doc, legs, errors, readOnly, onText, onDoc }: PathEditorProps) {
  const [view, setView] = useState<"text" | "table">("text");
  const area = useRef<HTMLTextAreaElement>(null);
  const jump = (e: PathTextError) => {
    const el = area.current;
    if (!el) return;
    const at = offsetOf(text, e.line, e.column);
    el.focus();
    el.setSelectionRange(at, at + 1);
  };
  const tab = (v: "text" | "table", label: string) => (
    <button
      type="button"
      aria-pressed={view === v}
      onClick={() => setView(v)}
      className={`px-3 py-1 text-sm ${view === v ? "bg-ink text-glaze" : "bg-white text-ink-soft hover:bg-glaze-deep"}`}
    >
      {label}
    </button>
  );
  return (
    <div className="space-y-2">
      <div className="flex flex-wrap items-center gap-2">
        <div
          className="inline-flex overflow-hidden rounded-md border border-glaze-line"
          role="group"
          aria-label="Edit the path as"
        >
          {tab("text", "Text")}
          {tab("table", "Table")}
        </div>
        {!readOnly && (
          <label className="ml-auto flex items-center gap-2 text-sm">
            <span className="text-ink-soft">Start from</span>
            <select
              aria-label="Path template"
              value=""
              onChange={(e) => {
                const t = PATH_TEMPLATES.find((p) => p.key === e.target.value);
                if (t) onText(t.text);
              }}
              className="rounded border border-glaze-line bg-white px-2 py-1 text-sm"
            >
              <option value="">a template…</option>
              {PATH_TEMPLATES.map((t) => (
                <option key={t.key} value={t.key}>
                  {t.name}
                </option>
              ))}
            </select>
          </label>
        )}
      </div>
      {view === "text" && readOnly ? (
        // Read-only shows the path as text to read, not a box that looks editable (issue 13 item 5).
        <pre
          aria-label="Path in text form"
          className="overflow-x-auto whitespace-pre-wrap px-1 py-1 font-mono text-sm leading-5 text-ink"
        >
          {text}
        </pre>
      ) : view === "text" ? (
        <textarea
          ref={area}
          value={text}
          onChange={(e) => onText(e.target.value)}
          spellCheck={false}
          rows={Math.min(14, Math.max(5, text.split("\n").length + 1))}
          aria-label="Path in text form"
          aria-invalid={errors.length > 0 || undefined}
          aria-describedby="path-errors"
          className="w-full rounded-md border border-glaze-line bg-white p-2 font-mono text-sm leading-5 aria-[invalid]:border-kiln"
        />
      ) : (
        <PathTable doc={doc} readOnly={readOnly} onChange={onDoc} />
      )}
      <div id="path-errors" role={errors.length ? "alert" : undefined}>
        {errors.length > 0 && (
          <div className="rounded-md border border-kiln/40 bg-kiln-light px-3 py-2 text-sm text-kiln-dark">
            <p className="font-medium">
              The path text has {errors.length === 1 ? "an error" : `${errors.length} errors`}; the
              charts show the last valid path.
            </p>
            <ul className="mt-1 space-y-0.5">
              {errors.slice(0, 6).map((e) => (
                <li key={`${e.line}:${e.column}`}>
                  <button
                    type="button"
                    className="text-left underline-offset-2 hover:underline"
                    onClick={() => jump(e)}
                  >
                    {formatPathTextError(e)}
                  </button>
                </li>
              ))}
            </ul>
          </div>
        )}
      </div>
      <PathPreview legs={legs} />
      <PathNotationHelp />
    </div>
  );
}
