"use client";

import type { DeskOverlay } from "@/lib/scenario/desk-extras";

export interface MissingRecordsNoticeProps {
  records: readonly DeskOverlay[];
  /** Takes a record off the scenario's choice; absent on a read-only desk. */
  onForget?: (recordId: string) => void;
}

/**
 * Test records the revision draws that this team does not hold: deleted since, or the scenario
 * came from another team's export (records do not travel with it). Named by the name kept in
 * the file, since the record itself cannot be read.
 */
export function MissingRecordsNotice({ records, onForget }: MissingRecordsNoticeProps) {
  if (records.length === 0) return null;
  return (
    <div
      role="status"
      className="rounded-lg border border-glaze-line bg-white/60 px-3 py-2 text-sm"
    >
      <ul className="space-y-1">
        {records.map((r) => (
          <li key={r.recordId} className="flex flex-wrap items-center gap-2">
            <span>
              Test record {r.name ? `“${r.name}”` : `with id ${r.recordId}`} is not in this team: it
              was deleted, or the scenario came from another team. It is left off the charts.
            </span>
            {onForget ? (
              <button
                type="button"
                onClick={() => onForget(r.recordId)}
                className="rounded border border-glaze-line bg-white px-2 py-0.5 text-xs hover:bg-glaze-deep"
              >
                Take it off this scenario
              </button>
            ) : null}
          </li>
        ))}
      </ul>
    </div>
  );
}
