import type { MaterialParams } from "@/lib/mechanics/types";

/** The parameters in the order every table shows them, with their units. */
export const PARAM_ROWS: [keyof MaterialParams, string][] = [
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

/** Four significant digits, without an exponent for moduli in MPa. */
export function formatValue(v: number): string {
  return Math.abs(v) >= 1000 ? v.toFixed(0) : v.toPrecision(4);
}

/** The values of a parameter set; those the records informed are marked. */
export function ParamsTable({
  params,
  identified,
  sourceWord = "from the records",
  marks,
}: {
  params: MaterialParams;
  /** When given, a column says which values came from the records (or were free). */
  identified?: (keyof MaterialParams)[];
  sourceWord?: string;
  /** Words that replace the source word for some values (refinement: tied, not informed). */
  marks?: Partial<Record<keyof MaterialParams, string>>;
}) {
  return (
    <table className="text-sm" data-testid="params-table">
      <tbody>
        {PARAM_ROWS.map(([key, unit]) => (
          <tr key={key} className="border-b border-glaze-line">
            <th scope="row" className="py-1 pr-4 text-left font-medium">
              {key}
            </th>
            <td className="py-1 pr-2 text-right tabular-nums" data-param={key}>
              {formatValue(Number(params[key]))}
            </td>
            <td className="py-1 pr-4 text-ink-soft">{unit}</td>
            {identified ? (
              <td className="py-1 text-xs text-ink-faint">
                {marks?.[key] ?? (identified.includes(key) ? sourceWord : "starting value")}
              </td>
            ) : null}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
