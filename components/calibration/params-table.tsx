import type { DamageLaw, MaterialParams } from "@/lib/mechanics/types";
import { PARAMETER_FIELDS } from "@/lib/scenario/parameter-fields";
import { unitFor } from "@/lib/client/loading-desk/field-text";

/** The parameters in the order every table shows them. */
export const PARAM_KEYS: (keyof MaterialParams)[] = [
  "E1",
  "E2",
  "nu12",
  "G12",
  "Y0_1",
  "Y0_2",
  "a1",
  "a2",
  "b",
  "k6",
  "alpha",
  "beta",
  "dcrit",
];

/** A parameter's unit for the law in use (the slopes a1, a2 follow it), from the one field list. */
export function paramUnit(key: string, law: DamageLaw): string {
  const field = PARAMETER_FIELDS.find((f) => f.symbol === key);
  return field ? unitFor(field, law) : "";
}

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
        {PARAM_KEYS.map((key) => (
          <tr key={key} className="border-b border-glaze-line">
            <th scope="row" className="py-1 pr-4 text-left font-medium">
              {key}
            </th>
            <td className="py-1 pr-2 text-right tabular-nums" data-param={key}>
              {formatValue(Number(params[key]))}
            </td>
            <td className="py-1 pr-4 text-ink-soft">{paramUnit(key, params.law)}</td>
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
