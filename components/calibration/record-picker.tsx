"use client";

import type { TestRecordSummary } from "@/db/queries/test-records";
import { testTypeWords } from "@/lib/csv/test-type-words";

/** Tick the records to calibrate from. */
export function RecordPicker({
  records,
  selected,
  onChange,
}: {
  records: TestRecordSummary[];
  selected: string[];
  onChange: (ids: string[]) => void;
}) {
  if (records.length === 0)
    return <p className="text-sm text-ink-soft">Upload test records first.</p>;
  const toggle = (id: string) =>
    onChange(selected.includes(id) ? selected.filter((s) => s !== id) : [...selected, id]);
  return (
    <fieldset className="space-y-1">
      <legend className="mb-2 text-sm font-medium">Test records</legend>
      {records.map((r) => (
        <label key={r.id} className="flex items-center gap-2 text-sm">
          <input type="checkbox" checked={selected.includes(r.id)} onChange={() => toggle(r.id)} />
          <span>
            {r.name} — {testTypeWords(r.testType, true)}, {r.loading},{" "}
            {r.pointCount.toLocaleString("en")} points
          </span>
        </label>
      ))}
    </fieldset>
  );
}
