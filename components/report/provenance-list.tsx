import { UncertaintyTable } from "@/components/calibration/uncertainty-table";
import type { SetProvenance } from "@/lib/server/handoff/report/provenance";

const num = (x: number | null, unit = "") =>
  x === null ? "—" : `${Number(x.toPrecision(3))}${unit}`;

/** Per set: where the values came from, and for a fit the records used and their RMS residuals. */
export function ProvenanceList({ items }: { items: SetProvenance[] }) {
  return (
    <ul className="space-y-2 text-sm" data-testid="report-provenance">
      {items.map((p) => (
        <li key={p.setId}>
          <span className="font-semibold">Set {p.setId}</span>: {p.kind}
          {p.librarySource ? ` (team ${p.librarySource})` : ""}
          {p.method ? `, method ${p.method}` : ""}
          {p.fittedAt ? `, fitted ${p.fittedAt.slice(0, 10)}` : ""}
          {/* The sentence's full stop comes after, so a note's own one is dropped (no "..") */}
          {p.note ? `. ${p.note.replace(/\.\s*$/, "")}` : ""}
          {p.warnings.length > 0 ? (
            <ul className="mt-1 list-disc pl-5 text-xs text-amber-900">
              {p.warnings.map((w) => (
                <li key={w}>{w}</li>
              ))}
            </ul>
          ) : null}
          {p.records.length > 0 ? (
            <table className="mt-1 w-full text-xs">
              <thead className="text-left text-ink-faint">
                <tr>
                  <th>Test record</th>
                  <th>Points</th>
                  <th>RMS residual (MPa)</th>
                </tr>
              </thead>
              <tbody>
                {p.records.map((r) => (
                  <tr key={r.name}>
                    <td>{r.name}</td>
                    <td>{r.points ?? "—"}</td>
                    <td>{num(r.rms)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          ) : (
            <span className="text-ink-faint">. No test records are linked to this set.</span>
          )}
          {p.uncertainty ? (
            <div className="mt-2 break-inside-avoid">
              <UncertaintyTable uncertainty={p.uncertainty} law={p.law} />
            </div>
          ) : null}
        </li>
      ))}
    </ul>
  );
}
