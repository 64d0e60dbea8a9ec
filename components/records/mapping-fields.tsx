"use client";

import { CHANNELS, type Channel } from "@/lib/csv/column-mapping";
import type { ColumnMappingInput } from "@/lib/csv/record-schema";
import { STRAIN_UNITS, STRESS_UNITS } from "@/lib/csv/units";

const LABELS: Record<Channel, string> = {
  strain: "Strain",
  stress: "Stress",
  time: "Time (optional)",
  transverseStrain: "Transverse strain (optional)",
  shearStrain: "Shear strain (optional)",
  shearStress: "Shear stress (optional)",
};

export interface MappingFieldsProps {
  idPrefix: string;
  headers: string[];
  value: ColumnMappingInput;
  onChange: (next: ColumnMappingInput) => void;
}

/** Which column is which quantity, and in which unit; "auto" reads the header or the values. */
export function MappingFields({ idPrefix, headers, value, onChange }: MappingFieldsProps) {
  const set = (channel: Channel, raw: string) => {
    const next = { ...value } as Record<string, unknown>;
    if (raw === "") delete next[channel];
    else next[channel] = Number(raw);
    onChange(next as ColumnMappingInput);
  };
  const select = "mt-1 block w-full rounded-md border border-glaze-line bg-white px-2 py-1 text-sm";
  return (
    <fieldset className="grid gap-3 sm:grid-cols-3">
      <legend className="mb-2 text-sm font-medium">Columns</legend>
      {CHANNELS.map((channel) => (
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
      <label className="text-sm" htmlFor={`${idPrefix}-strain-unit`}>
        Strain unit
        <select
          id={`${idPrefix}-strain-unit`}
          className={select}
          value={value.strainUnit ?? "auto"}
          onChange={(e) => onChange({ ...value, strainUnit: e.target.value as never })}
        >
          {["auto", ...STRAIN_UNITS].map((u) => (
            <option key={u}>{u}</option>
          ))}
        </select>
      </label>
      <label className="text-sm" htmlFor={`${idPrefix}-stress-unit`}>
        Stress unit
        <select
          id={`${idPrefix}-stress-unit`}
          className={select}
          value={value.stressUnit ?? "auto"}
          onChange={(e) => onChange({ ...value, stressUnit: e.target.value as never })}
        >
          {["auto", ...STRESS_UNITS].map((u) => (
            <option key={u}>{u}</option>
          ))}
        </select>
      </label>
    </fieldset>
  );
}
