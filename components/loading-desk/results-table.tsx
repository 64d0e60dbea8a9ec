"use client";

import { useVirtualizer } from "@tanstack/react-virtual";
import { useRef, useState } from "react";
import { useDrawVersion } from "@/components/charts/use-draw-version";
import { RESULT_COLUMNS } from "@/lib/mechanics/types";
import { EXPORT_HEADINGS } from "@/lib/client/loading-desk/export-columns";
import type { ResultsStore } from "@/lib/client/loading-desk/results-store";
import { rowsToTsv } from "@/lib/client/loading-desk/selection-text";
import type { SetEntry } from "@/lib/client/loading-desk/set-list";

export interface ResultsTableProps {
  store: ResultsStore;
  entries: SetEntry[];
}

const ROW_H = 24;
const COL_W = 92;
const cell = (v: number, name: string) =>
  name === "increment" || name === "leg" || name === "failed"
    ? String(v)
    : v === 0
      ? "0"
      : v.toPrecision(6);

/** Every increment of one set, virtualised (100,000 rows stay smooth); select rows and copy. */
export function ResultsTable({ store, entries }: ResultsTableProps) {
  const [setId, setSetId] = useState(entries[0]?.set.id ?? "A");
  const [sel, setSel] = useState<{ from: number; to: number } | null>(null);
  const [copied, setCopied] = useState("");
  // Redrawn like a chart: throttled, in its own task.
  useDrawVersion(store);
  const id = entries.some((e) => e.set.id === setId) ? setId : entries[0]?.set.id;
  const buf = store.get(id ?? "")?.buffer;
  const rows = buf?.rows ?? 0;
  const scroller = useRef<HTMLDivElement>(null);
  // eslint-disable-next-line react-hooks/incompatible-library -- the virtualiser is meant to re-run each render
  const virt = useVirtualizer({
    count: rows,
    getScrollElement: () => scroller.current,
    estimateSize: () => ROW_H,
    overscan: 12,
  });
  const lo = sel ? Math.min(sel.from, sel.to) : -1;
  const hi = sel ? Math.max(sel.from, sel.to) : -1;

  const copy = async () => {
    if (!buf || !sel) return;
    const text = rowsToTsv(buf.columns, lo, Math.min(hi, rows - 1));
    try {
      await navigator.clipboard.writeText(text);
      setCopied(`Copied ${hi - lo + 1} rows.`);
    } catch {
      setCopied("The browser refused the clipboard; use the CSV export instead.");
    }
  };

  return (
    <div>
      <div className="mb-2 flex flex-wrap items-center gap-2 text-sm">
        <label htmlFor="table-set" className="text-ink-soft">
          Set
        </label>
        <select
          id="table-set"
          value={id}
          onChange={(e) => {
            setSetId(e.target.value);
            setSel(null);
          }}
          className="rounded border border-glaze-line bg-white px-2 py-1 text-sm"
        >
          {entries.map((e) => (
            <option key={e.set.id} value={e.set.id}>
              {e.set.id}: {e.set.label}
            </option>
          ))}
        </select>
        <span className="text-ink-faint">
          {rows.toLocaleString("en")} rows · click a row, shift-click to extend, Ctrl+C to copy
        </span>
        <button
          type="button"
          onClick={copy}
          disabled={!sel}
          className="ml-auto rounded border border-glaze-line bg-white px-2 py-1 text-xs disabled:opacity-40"
        >
          Copy selected rows
        </button>
        <span role="status" className="text-xs text-verdigris-dark">
          {copied}
        </span>
      </div>
      <div
        ref={scroller}
        tabIndex={0}
        role="grid"
        aria-label={`Results of set ${id}`}
        aria-rowcount={rows + 1}
        onKeyDown={(e) => {
          if ((e.ctrlKey || e.metaKey) && e.key === "c") void copy();
        }}
        className="h-72 overflow-auto rounded-md border border-glaze-line bg-white font-mono text-xs"
      >
        <div style={{ width: COL_W * RESULT_COLUMNS.length }}>
          <div
            role="row"
            className="sticky top-0 z-20 flex border-b border-glaze-line bg-glaze-deep shadow-sm"
          >
            {RESULT_COLUMNS.map((c) => (
              <div
                key={c}
                role="columnheader"
                title={`column ${c} of the results file`}
                className="shrink-0 px-1 py-1 text-right font-semibold"
                style={{ width: COL_W }}
              >
                {EXPORT_HEADINGS[c]}
              </div>
            ))}
          </div>
          <div className="relative z-0" style={{ height: virt.getTotalSize() }}>
            {virt.getVirtualItems().map((v) => (
              <div
                key={v.index}
                role="row"
                aria-rowindex={v.index + 2}
                aria-selected={v.index >= lo && v.index <= hi}
                onClick={(e) =>
                  setSel(
                    e.shiftKey && sel
                      ? { from: sel.from, to: v.index }
                      : { from: v.index, to: v.index },
                  )
                }
                className="absolute left-0 flex cursor-pointer select-none hover:bg-glaze-deep/60 aria-selected:bg-verdigris-light"
                style={{ top: v.start, height: ROW_H }}
              >
                {RESULT_COLUMNS.map((c) => (
                  <div
                    key={c}
                    role="gridcell"
                    className="shrink-0 px-1 py-1 text-right tabular-nums"
                    style={{ width: COL_W }}
                  >
                    {buf ? cell(buf.columns[c][v.index], c) : ""}
                  </div>
                ))}
              </div>
            ))}
          </div>
        </div>
      </div>
    </div>
  );
}
