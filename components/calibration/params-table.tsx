import type { MaterialParams } from "@/lib/mechanics/types";

const ROWS: [keyof MaterialParams, string][] = [
  ["E1", "MPa"],
  ["E2", "MPa"],
  ["nu12", ""],
  ["G12", "MPa"],
  ["Y0_1", "MPa"],
  ["Y0_2", "MPa"],
  ["a1", ""],
  ["a2", ""],
  ["b", ""],
  ["k6", ""],
  ["alpha", "mm/mm"],
  ["beta", "mm/mm"],
  ["dcrit", ""],
];

/** The values of a parameter set; those the records informed are marked. */
export function ParamsTable({
  params,
  identified = [],
}: {
  params: MaterialParams;
  identified?: (keyof MaterialParams)[];
}) {
  return (
    <table className="text-sm" data-testid="params-table">
      <tbody>
        {ROWS.map(([key, unit]) => (
          <tr key={key} className="border-b border-glaze-line">
            <th scope="row" className="py-1 pr-4 text-left font-medium">
              {key}
            </th>
            <td className="py-1 pr-2 text-right tabular-nums" data-param={key}>
              {Number(params[key]).toPrecision(4)}
            </td>
            <td className="py-1 pr-4 text-ink-soft">{unit}</td>
            <td className="py-1 text-xs text-ink-faint">
              {identified.includes(key) ? "from the records" : "starting value"}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
