import type { LoopRow } from "@/lib/calibration/types";

const fmt = (v: number | null, digits = 4) => (v === null ? "—" : v.toPrecision(digits));

/** Per loop: peak, unloading modulus, residual strain, damage and force (spec E.2–E.4). */
export function LoopTable({ loops, caption }: { loops: LoopRow[]; caption: string }) {
  return (
    <table className="w-full text-right text-sm tabular-nums" data-testid="loop-table">
      <caption className="mb-2 text-left text-sm font-medium">{caption}</caption>
      <thead className="text-ink-soft">
        <tr>
          <th className="py-1 font-medium">loop</th>
          <th className="py-1 font-medium">ε max</th>
          <th className="py-1 font-medium">σ max (MPa)</th>
          <th className="py-1 font-medium">E unload (MPa)</th>
          <th className="py-1 font-medium">R²</th>
          <th className="py-1 font-medium">ε residual</th>
          <th className="py-1 font-medium">d</th>
          <th className="py-1 font-medium">Y (MPa)</th>
          <th className="py-1 font-medium">in line</th>
        </tr>
      </thead>
      <tbody>
        {loops.map((l) => (
          <tr key={l.k} className="border-t border-glaze-line">
            <td className="py-1">{l.k}</td>
            <td className="py-1">{fmt(l.epsMax)}</td>
            <td className="py-1">{fmt(l.sigMax)}</td>
            <td className="py-1">{fmt(l.E, 5)}</td>
            <td className="py-1">{l.r2.toFixed(4)}</td>
            <td className="py-1">{fmt(l.epsR, 3)}</td>
            <td className="py-1">{l.d.toFixed(4)}</td>
            <td className="py-1">{fmt(l.Y)}</td>
            <td className="py-1">{l.usedInFit ? "yes" : "no"}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
