import { PARAMETER_FIELDS } from "@/lib/scenario/parameter-fields";
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";

// The slopes a1, a2 have the unit of the growth law the set uses (A.3): d against sqrt(Y) or Y.
const SLOPE_UNITS: Record<string, string> = { sqrtY: "MPa⁻⁰·⁵", linY: "MPa⁻¹" };

function unitOf(symbol: string, fallback: string, sets: ParameterSet[]): string {
  if (symbol !== "a1" && symbol !== "a2") return fallback;
  const units = [...new Set(sets.map((s) => SLOPE_UNITS[s.law] ?? fallback))];
  return units.length === 1 ? units[0] : units.join(" / ");
}

/** Every parameter of every set with its unit: the table the simulation team types in. */
export function ParameterTable({ sets }: { sets: ParameterSet[] }) {
  return (
    <table className="w-full border-collapse text-sm" data-testid="report-parameters">
      <thead>
        <tr className="border-b border-ink text-left">
          <th className="py-1">Parameter</th>
          <th>Unit</th>
          {sets.map((s) => (
            <th key={s.id} className="text-right">
              Set {s.id}
              {s.label ? <span className="block text-xs font-normal">{s.label}</span> : null}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {PARAMETER_FIELDS.map((f) => (
          <tr key={f.symbol} className="border-b border-glaze-line">
            <td className="py-0.5 font-mono">{f.symbol}</td>
            <td>{unitOf(f.symbol, f.unit, sets)}</td>
            {sets.map((s) => (
              <td key={s.id} className="text-right font-mono">
                {String((s as unknown as Record<string, unknown>)[f.symbol] ?? "—")}
              </td>
            ))}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
