"use client";

export interface PreviewTableProps {
  headers: string[];
  rows: number[][];
  lines: number[];
  rowCount: number;
}

/** The first rows as the reader sees them under the chosen layout, with their lines in the file. */
export function PreviewTable({ headers, rows, lines, rowCount }: PreviewTableProps) {
  return (
    <div className="overflow-x-auto">
      <table className="min-w-full text-right text-xs tabular-nums" aria-label="First rows as read">
        <thead>
          <tr className="border-b border-glaze-line text-ink-soft">
            <th scope="col" className="px-2 py-1 font-medium">
              Line
            </th>
            {headers.map((h, i) => (
              <th key={i} scope="col" className="px-2 py-1 font-medium">
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row, r) => (
            <tr key={lines[r]} className="border-b border-glaze-line/50">
              <td className="px-2 py-1 text-ink-faint">{lines[r]}</td>
              {row.map((v, c) => (
                <td key={c} className="px-2 py-1">
                  {Number.isFinite(v) ? v : "not a number"}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-1 text-xs text-ink-faint">
        The first {rows.length} of {rowCount.toLocaleString("en-US")} data rows.
      </p>
    </div>
  );
}
