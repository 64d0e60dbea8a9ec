import type { FitUncertainty } from "@/lib/calibration/uncertainty";

import type { DamageLaw } from "@/lib/mechanics/types";

import { formatValue, paramUnit } from "./params-table";

/** A standard error shown with two significant digits: more would claim a precision it lacks. */
const formatError = (v: number) => v.toPrecision(2);

/**
 * How sure the refinement is: per free parameter its standard error and 95 % interval, then the
 * correlations between them. Strong correlations (|r| ≥ 0.9) are marked: those parameters trade
 * off against each other on these records.
 */
export function UncertaintyTable({
  uncertainty,
  law,
}: {
  uncertainty: FitUncertainty;
  /** The growth law of the refined set: the slopes' unit follows it. */
  law: DamageLaw;
}) {
  const { params, correlation } = uncertainty;
  return (
    <div className="space-y-3" data-testid="uncertainty">
      <table className="text-sm">
        <caption className="mb-1 text-left font-medium">How sure the refined values are</caption>
        <thead className="text-ink-soft">
          <tr>
            <th className="pr-4 text-left font-medium">parameter</th>
            <th className="pr-4 text-right font-medium">value</th>
            <th className="pr-4 text-right font-medium">standard error</th>
            <th className="pr-4 text-left font-medium">95 % interval</th>
          </tr>
        </thead>
        <tbody>
          {params.map((p) => (
            <tr key={p.name} className="border-b border-glaze-line" data-param={p.name}>
              <th scope="row" className="py-1 pr-4 text-left font-medium">
                {p.name}
              </th>
              <td className="py-1 pr-4 text-right tabular-nums">
                {formatValue(p.value)} {paramUnit(p.name, law)}
              </td>
              <td className="py-1 pr-4 text-right tabular-nums">
                {p.se === null ? "not informed" : formatError(p.se)}
              </td>
              <td className="py-1 pr-4 tabular-nums">
                {p.low === null || p.high === null
                  ? "—"
                  : `${formatValue(p.low)} … ${formatValue(p.high)}`}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      {params.length > 1 ? (
        <table className="text-xs" aria-label="Correlation between the refined parameters">
          <thead className="text-ink-soft">
            <tr>
              <th className="pr-3 text-left font-medium">correlation</th>
              {params.map((p) => (
                <th key={p.name} className="px-2 text-right font-medium">
                  {p.name}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {params.map((row, a) => (
              <tr key={row.name}>
                <th scope="row" className="pr-3 text-left font-medium">
                  {row.name}
                </th>
                {correlation[a].map((r, b) => (
                  <td
                    key={params[b].name}
                    className={`px-2 text-right tabular-nums ${
                      r !== null && a !== b && Math.abs(r) >= 0.9
                        ? "font-semibold text-amber-900"
                        : ""
                    }`}
                  >
                    {r === null ? "—" : r.toFixed(2)}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
      <p className="max-w-prose text-xs text-ink-soft">
        From the least-squares fit at its optimum, with {uncertainty.degreesOfFreedom} degrees of
        freedom. They assume independent scatter of one size at every curve point; neighbouring
        points of one specimen are not independent, so read them as the least uncertainty these
        records allow, not as the scatter between specimens.
      </p>
    </div>
  );
}
