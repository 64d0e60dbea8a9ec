"use client";

import { type XAxisChoice, xAxisTitle } from "@/lib/client/loading-desk/chart-x-axis";

export interface XAxisSelectProps {
  value: XAxisChoice;
  choices: readonly XAxisChoice[];
  onChange: (choice: XAxisChoice) => void;
}

/** The quantity a chart is drawn against, by symbol and unit ("ε11 (mm/mm)"). */
export function XAxisSelect({ value, choices, onChange }: XAxisSelectProps) {
  return (
    <label className="flex items-center gap-1 text-xs text-ink-faint">
      Horizontal axis
      <select
        value={value}
        onChange={(e) => onChange(e.target.value as XAxisChoice)}
        className="rounded border border-glaze-line bg-white px-1 py-0.5 text-xs text-ink"
      >
        {choices.map((c) => (
          <option key={c} value={c}>
            {xAxisTitle(c)}
          </option>
        ))}
      </select>
    </label>
  );
}
