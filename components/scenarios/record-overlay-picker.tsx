"use client";

import { overlayAxesOf } from "@/lib/client/loading-desk/record-overlay";
import { messageOf } from "@/lib/client/data/api-fetch";
import { useTestRecords } from "@/lib/client/data/use-test-records";
import { STRAIN_LABEL, STRESS_LABEL } from "@/lib/client/loading-desk/chart-defs";
import { testTypeWords } from "@/lib/csv/test-type-words";
import type { DeskOverlay } from "@/lib/scenario/desk-extras";

export interface RecordOverlayPickerProps {
  slug: string;
  /** The records drawn, by id with the name they had when chosen. */
  selected: readonly DeskOverlay[];
  onChange: (records: DeskOverlay[]) => void;
  /** How the chosen records' points are coming along. */
  loading: boolean;
  errors: string[];
}

/** Tick team test records to draw over the stress–strain chart; saved with the next revision. */
export function RecordOverlayPicker({
  slug,
  selected,
  onChange,
  loading,
  errors,
}: RecordOverlayPickerProps) {
  const list = useTestRecords(slug);
  const records = list.data?.items ?? [];
  const isChosen = (id: string) => selected.some((s) => s.recordId === id);
  const toggle = (id: string, name: string) =>
    onChange(
      isChosen(id)
        ? selected.filter((s) => s.recordId !== id)
        : [...selected, { recordId: id, name }],
    );

  return (
    <details className="rounded-lg border border-glaze-line bg-white/60 px-3 py-2 text-sm">
      <summary className="cursor-pointer font-display font-semibold">
        Test records on the charts
        <span className="ml-2 font-sans text-xs font-normal text-ink-faint">
          {selected.length ? `${selected.length} chosen` : "none chosen"}
          {loading ? " · loading points…" : ""}
        </span>
      </summary>
      <p className="mt-2 text-xs text-ink-faint">
        A record is drawn dotted as “test: name” when the stress–strain chart shows its pair; the
        choice is saved with the next revision.
      </p>
      {list.isError ? <p className="mt-2 text-kiln-dark">{messageOf(list.error)}</p> : null}
      {errors.map((e, i) => (
        <p key={i} className="mt-2 text-kiln-dark">
          {e}
        </p>
      ))}
      {list.isSuccess && records.length === 0 ? (
        <p className="mt-2 text-ink-soft">This team has no test records yet.</p>
      ) : null}
      <ul className="mt-2 space-y-1">
        {records.map((r) => {
          const axes = overlayAxesOf(r.testType);
          return (
            <li key={r.id}>
              <label className={`flex items-center gap-2 ${axes ? "" : "text-ink-faint"}`}>
                <input
                  type="checkbox"
                  disabled={!axes}
                  checked={isChosen(r.id)}
                  onChange={() => toggle(r.id, r.name)}
                />
                <span>
                  {r.name} — {testTypeWords(r.testType, true)}, {r.loading}
                  {axes
                    ? ` · ${STRESS_LABEL[axes.y]} against ${STRAIN_LABEL[axes.x]}`
                    : " · no single stress–strain pair to draw"}
                </span>
              </label>
            </li>
          );
        })}
      </ul>
    </details>
  );
}
