import { quantitySymbol } from "@/lib/shared/quantity-symbols";
import type { ConformanceResult } from "@/lib/server/handoff/conformance/types";

const num = (x: number) => (x >= Number.MAX_VALUE ? "—" : Number(x.toPrecision(4)).toString());

/** Per quantity: tolerance, deviations and where it first went beyond tolerance. */
export function ConformanceResultTable({ result }: { result: ConformanceResult }) {
  return (
    <table className="w-full text-sm" data-testid="conformance-result">
      <thead className="text-left text-ink-faint">
        <tr>
          <th className="py-1">Quantity</th>
          <th>Tolerance</th>
          <th>Max abs</th>
          <th>RMS</th>
          <th>Max rel</th>
          <th>First increment beyond</th>
          <th>Verdict</th>
        </tr>
      </thead>
      <tbody>
        {result.quantities.map((q) => (
          <tr key={q.quantity} className="border-t border-glaze-line">
            <td className="py-1">{quantitySymbol(q.quantity)}</td>
            <td>{num(q.tolerance)}</td>
            <td>{num(q.maxAbs)}</td>
            <td>{num(q.rms)}</td>
            <td>{(q.maxRel * 100).toFixed(2)} %</td>
            <td>{q.firstFailIncrement ?? "—"}</td>
            <td className={q.passed ? "text-verdigris-dark" : "text-kiln-dark"}>
              {q.passed ? "pass" : "fail"}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
