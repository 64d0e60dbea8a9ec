"use client";

import { messageOf } from "@/lib/client/data/api-fetch";
import { useRevisionDiff } from "@/lib/client/data/use-revisions";

import { RevisionDiffView } from "./revision-diff-view";

export interface RevisionCompareProps {
  slug: string;
  scenarioId: string;
  numbers: number[];
  value: { from: number; to: number };
  onChange: (value: { from: number; to: number }) => void;
}

const SELECT = "rounded-md border border-glaze-line bg-white px-2 py-1 text-sm";

/** Two revisions picked by number, their differences from the diff route. */
export function RevisionCompare({
  slug,
  scenarioId,
  numbers,
  value,
  onChange,
}: RevisionCompareProps) {
  const diff = useRevisionDiff(slug, scenarioId, value.from, value.to);
  const pick = (key: "from" | "to", label: string) => (
    <label className="text-sm">
      {label}{" "}
      <select
        value={value[key]}
        onChange={(e) => onChange({ ...value, [key]: Number(e.target.value) })}
        className={SELECT}
      >
        {numbers.map((n) => (
          <option key={n} value={n}>
            rev {n}
          </option>
        ))}
      </select>
    </label>
  );
  return (
    <section aria-labelledby="compare-title" className="mt-4 border-t border-glaze-line pt-3">
      <h3 id="compare-title" className="mb-2 text-sm font-semibold">
        Compare two revisions
      </h3>
      <div className="mb-3 flex flex-wrap gap-3">
        {pick("from", "From")}
        {pick("to", "to")}
      </div>
      {value.from === value.to ? (
        <p className="text-sm text-ink-soft">Pick two different revisions.</p>
      ) : diff.isPending ? (
        <p className="text-sm text-ink-soft">Comparing…</p>
      ) : diff.isError ? (
        <p className="text-sm text-kiln-dark">{messageOf(diff.error)}</p>
      ) : (
        <RevisionDiffView
          diff={diff.data.diff}
          fromLabel={`rev ${value.from}`}
          toLabel={`rev ${value.to}`}
        />
      )}
    </section>
  );
}
