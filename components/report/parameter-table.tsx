import {
  choiceText,
  PARAMETER_FIELDS,
  type ParameterField,
  unitOf,
} from "@/lib/scenario/parameter-fields";
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";
import { shownNumber } from "@/lib/shared/shown-number";

// A unit that depends on the growth law (the slopes) is written once per law the sets use.
function unitForSets(field: ParameterField, sets: ParameterSet[]): string {
  const units = [...new Set(sets.map((s) => unitOf(field, s.law)))];
  return units.join(" / ");
}

/** A value as the table prints it: a choice in words with the file's word, a number rounded, a blank as "—". */
function shown(field: ParameterField, value: unknown): string {
  if (value === null || value === undefined) return "—";
  if (field.kind === "choice") return choiceText(field, String(value));
  return typeof value === "number" ? shownNumber(value) : String(value);
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
            <td className="py-0.5">
              <span className="font-mono">{f.symbol}</span> {f.label}
            </td>
            <td>{unitForSets(f, sets)}</td>
            {sets.map((s) => (
              <td key={s.id} className="text-right font-mono">
                {shown(f, (s as unknown as Record<string, unknown>)[f.symbol])}
              </td>
            ))}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
