"use client";

import { useDrawVersion } from "@/components/charts/use-draw-version";
import type { ResultsStore } from "@/lib/client/loading-desk/results-store";
import type { SetEntry } from "@/lib/client/loading-desk/set-list";

export interface RunErrorsProps {
  store: ResultsStore;
  entries: SetEntry[];
}

/** Solver errors and failure notes per set, in words (never a stack trace). */
export function RunErrors({ store, entries }: RunErrorsProps) {
  useDrawVersion(store);
  const notes = entries.flatMap((e) => {
    const run = store.get(e.set.id);
    if (run?.error) return [{ id: e.set.id, tone: "error", text: run.error }];
    const s = run?.buffer?.status;
    if (!s) return [];
    const out = [];
    if (s.failed)
      out.push({
        id: e.set.id,
        tone: "note",
        text: `failure flagged (${s.failMode}) at increment ${s.stoppedAtIncrement ?? run!.buffer!.rows - 1}; the path stops there`,
      });
    for (const w of s.warnings) out.push({ id: e.set.id, tone: "note", text: w });
    return out;
  });
  if (notes.length === 0) return null;
  return (
    <ul className="mb-2 space-y-1 text-sm" role="status" data-testid="run-notes">
      {notes.map((n, i) => (
        <li
          key={i}
          className={`rounded border px-2 py-1 ${n.tone === "error" ? "border-kiln/50 bg-kiln-light text-kiln-dark" : "border-glaze-line bg-glaze-deep/50 text-ink-soft"}`}
        >
          <span className="font-semibold">Set {n.id}: </span>
          {n.text}
        </li>
      ))}
    </ul>
  );
}
