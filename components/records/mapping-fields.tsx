"use client";

import type { Quantity } from "@/lib/csv/column-mapping";
import type { RecordMappingInput } from "@/lib/csv/record-mapping";
import { FORCE_UNITS, LENGTH_UNITS, STRAIN_UNITS, STRESS_UNITS } from "@/lib/csv/units";

// Stress or force, strain (an extensometer's) or extension: the file gives one of each pair.
const LABELS: Record<Quantity, string> = {
  stress: "Stress",
  force: "Force",
  strain: "Strain (extensometer)",
  extension: "Extension",
  time: "Time (optional)",
  transverseStrain: "Transverse strain (optional)",
  shearStrain: "Shear strain (optional)",
  shearStress: "Shear stress (optional)",
};

const UNIT_CHOICES = [
  { key: "stressUnit", label: "Stress unit", units: STRESS_UNITS },
  { key: "forceUnit", label: "Force unit", units: FORCE_UNITS },
  { key: "strainUnit", label: "Strain unit", units: STRAIN_UNITS },
  { key: "extensionUnit", label: "Extension unit", units: LENGTH_UNITS },
] as const;

export interface MappingFieldsProps {
  idPrefix: string;
  headers: string[];
  value: RecordMappingInput;
  onChange: (next: RecordMappingInput) => void;
}

/**
 * Which column is which quantity, and in which unit; "auto" reads the header (or the unit row)
 * or, for strain and stress, the values.
 */
export function MappingFields({ idPrefix, headers, value, onChange }: MappingFieldsProps) {
  const set = (channel: Quantity, raw: string) => {
    const next = { ...value } as Record<string, unknown>;
    if (raw === "") delete next[channel];
    else next[channel] = Number(raw);
    onChange(next as RecordMappingInput);
  };
  const select = "mt-1 block w-full rounded-md border border-glaze-line bg-white px-2 py-1 text-sm";
  return (
    <fieldset className="grid gap-3 sm:grid-cols-3">
      <legend className="mb-2 text-sm font-medium">Columns</legend>
      {(Object.keys(LABELS) as Quantity[]).map((channel) => (
        <label key={channel} className="text-sm" htmlFor={`${idPrefix}-${channel}`}>
          {LABELS[channel]}
          <select
            id={`${idPrefix}-${channel}`}
            className={select}
            value={value[channel] ?? ""}
            onChange={(e) => set(channel, e.target.value)}
          >
            <option value="">—</option>
            {headers.map((h, i) => (
              <option key={i} value={i}>
                {h}
              </option>
            ))}
          </select>
        </label>
      ))}
      {UNIT_CHOICES.map((u) => (
        <label key={u.key} className="text-sm" htmlFor={`${idPrefix}-${u.key}`}>
          {u.label}
          <select
            id={`${idPrefix}-${u.key}`}
            className={select}
            value={value[u.key] ?? "auto"}
            onChange={(e) => onChange({ ...value, [u.key]: e.target.value })}
          >
            {["auto", ...u.units].map((unit) => (
              <option key={unit}>{unit}</option>
            ))}
          </select>
        </label>
      ))}
    </fieldset>
  );
}
