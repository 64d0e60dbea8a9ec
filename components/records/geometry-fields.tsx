"use client";

import { GEOMETRY_LABELS, type Geometry } from "@/lib/csv/record-mapping";

export interface GeometryFieldsProps {
  idPrefix: string;
  value: Geometry;
  needsSection: boolean; // force is mapped: width and thickness make the cross-section
  needsGauge: boolean; // extension is mapped: the gauge length makes the strain
  onChange: (next: Geometry) => void;
}

const FIELDS = [
  { key: "widthMm", label: "Width (mm)", section: true },
  { key: "thicknessMm", label: "Thickness (mm)", section: true },
  { key: "gaugeLengthMm", label: "Gauge length (mm)", section: false },
] as const satisfies { key: keyof typeof GEOMETRY_LABELS; label: string; section: boolean }[];

/** The specimen's dimensions that turn force into stress (σ = F/(w·t)) and extension into strain. */
export function GeometryFields({
  idPrefix,
  value,
  needsSection,
  needsGauge,
  onChange,
}: GeometryFieldsProps) {
  const shown = FIELDS.filter((f) => (f.section ? needsSection : needsGauge));
  if (shown.length === 0) return null;
  return (
    <fieldset className="grid gap-3 sm:grid-cols-3">
      <legend className="mb-2 text-sm font-medium">Specimen</legend>
      {shown.map((f) => (
        <label key={f.key} className="text-sm" htmlFor={`${idPrefix}-${f.key}`}>
          {f.label}
          <input
            id={`${idPrefix}-${f.key}`}
            type="number"
            inputMode="decimal"
            min={0}
            step="any"
            className="mt-1 block w-full rounded-md border border-glaze-line bg-white px-2 py-1 text-sm"
            value={value[f.key] ?? ""}
            onChange={(e) => {
              const n = e.target.value.trim() === "" ? Number.NaN : Number(e.target.value);
              onChange({ ...value, [f.key]: Number.isFinite(n) ? n : undefined });
            }}
          />
        </label>
      ))}
    </fieldset>
  );
}
