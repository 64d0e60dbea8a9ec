"use client";

import { useState } from "react";
import { diffSets } from "@/lib/client/loading-desk/set-diff";
import type { SetEntry } from "@/lib/client/loading-desk/set-list";

export interface SetDiffTableProps {
  entries: SetEntry[];
}

/** Two sets side by side; rows that differ are highlighted with the relative change. */
export function SetDiffTable({ entries }: SetDiffTableProps) {
  const [left, setLeft] = useState(entries[0]?.set.id ?? "");
  const [right, setRight] = useState(entries[1]?.set.id ?? "");
  if (entries.length < 2)
    return <p className="text-xs text-ink-faint">Add a second set to compare two side by side.</p>;
  const a = entries.find((e) => e.set.id === left) ?? entries[0];
  const b = entries.find((e) => e.set.id === right) ?? entries[1];
  const rows = diffSets(a.set, b.set);
  const pick = (value: string, set: (v: string) => void, label: string) => (
    <select
      aria-label={label}
      value={value}
      onChange={(e) => set(e.target.value)}
      className="w-full max-w-full truncate rounded border border-glaze-line bg-white px-1 py-0.5 text-xs"
    >
      {entries.map((e) => (
        <option key={e.set.id} value={e.set.id}>
          {e.set.id}: {e.set.label}
        </option>
      ))}
    </select>
  );
  return (
    <table className="w-full table-fixed text-xs" data-testid="set-diff">
      <thead>
        <tr className="text-left">
          <th scope="col" className="w-16 py-1">
            value
          </th>
          <th scope="col">{pick(a.set.id, setLeft, "First set to compare")}</th>
          <th scope="col">{pick(b.set.id, setRight, "Second set to compare")}</th>
          <th scope="col" className="w-20 text-right">
            change
          </th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr
            key={r.symbol}
            className={`border-t border-glaze-line/60 ${r.differs ? "bg-kiln-light/50 font-semibold" : "text-ink-soft"}`}
          >
            <th scope="row" className="py-0.5 text-left font-normal" title={r.label}>
              {r.symbol}
            </th>
            {/* Choices read as words and may be long: wrap them inside the cell, never over the next. */}
            <td className="break-words pr-1 font-mono">{r.left}</td>
            <td className="break-words pr-1 font-mono">{r.right}</td>
            <td className="whitespace-nowrap text-right font-mono">
              {r.differs
                ? r.relative === null
                  ? "≠"
                  : `${r.relative > 0 ? "+" : ""}${(r.relative * 100).toPrecision(3)} %`
                : ""}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
