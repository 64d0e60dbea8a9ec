/**
 * Mapped columns → the points of a test record in mm/mm and MPa, or one error naming the line and
 * the cell. A mapped column with a cell that is not a number fails the whole file: no points.
 */
import type { Channel } from "./column-mapping";
import { csvError, type CsvError } from "./csv-error";
import type { ColumnMappingChoice } from "./record-schema";
import type { CurveTable } from "./parse-table";
import {
  detectStrainUnit,
  headerUnitText,
  detectStressUnit,
  STRAIN_FACTOR,
  STRESS_FACTOR,
  strainUnitFromHeader,
  stressUnitFromHeader,
  type StrainUnit,
  type StressUnit,
} from "./units";

export interface CurvePoints {
  strain: Float64Array; // mm/mm (axial, or engineering shear for shear-only files)
  stress: Float64Array; // MPa
  time?: Float64Array; // as in the file
  transverseStrain?: Float64Array; // mm/mm
  shearStrain?: Float64Array; // mm/mm, engineering
  shearStress?: Float64Array; // MPa
  lines: Int32Array; // physical line of every point
  strainUnit: StrainUnit;
  stressUnit: StressUnit;
}

export type PointsResult =
  { ok: true; points: CurvePoints; warnings: string[] } | { ok: false; error: CsvError };

const STRAIN_CHANNELS: Channel[] = ["strain", "transverseStrain", "shearStrain"];

export function extractPoints(table: CurveTable, mapping: ColumnMappingChoice): PointsResult {
  const channels = (Object.keys(mapping) as (keyof ColumnMappingChoice)[]).filter(
    (k): k is Channel => k !== "strainUnit" && k !== "stressUnit" && mapping[k] !== undefined,
  );
  for (const channel of channels) {
    const index = mapping[channel] as number;
    if (index >= table.headers.length) {
      return {
        ok: false,
        error: csvError(
          "mapping",
          `${channel} is mapped to column ${index + 1}, but the file has ${table.headers.length} columns.`,
        ),
      };
    }
    const bad = table.firstBadCell[index];
    if (bad) {
      const shown = bad.raw.length > 40 ? `${bad.raw.slice(0, 40)}…` : bad.raw;
      const what = shown.trim() === "" ? "is empty" : `"${shown}" is not a number`;
      return { ok: false, error: csvError("not-a-number", what, bad.line, table.headers[index]) };
    }
  }
  const unknown = unknownHeaderUnit(table, mapping);
  if (unknown) return { ok: false, error: unknown };
  const warnings: string[] = [];
  const strainHeader = table.headers[mapping.strain];
  const stressHeader = table.headers[mapping.stress];
  const strainColumn = table.columns[mapping.strain];
  const stressColumn = table.columns[mapping.stress];
  let strainUnit: StrainUnit =
    mapping.strainUnit === "auto"
      ? (strainUnitFromHeader(strainHeader) ?? "mm/mm")
      : mapping.strainUnit;
  if (mapping.strainUnit === "auto" && strainUnitFromHeader(strainHeader) === null) {
    strainUnit = detectStrainUnit(strainColumn);
    if (strainUnit === "percent")
      warnings.push(
        "Strain exceeds 0.2, so it was read as percent and divided by 100. Choose the unit if that is wrong.",
      );
  }
  let stressUnit: StressUnit =
    mapping.stressUnit === "auto"
      ? (stressUnitFromHeader(stressHeader) ?? "MPa")
      : mapping.stressUnit;
  if (mapping.stressUnit === "auto" && stressUnitFromHeader(stressHeader) === null) {
    stressUnit = detectStressUnit(stressColumn);
    if (stressUnit === "Pa")
      warnings.push(
        "Stress exceeds 1e5, so it was read as Pa and divided by 1e6. Choose the unit if that is wrong.",
      );
  }
  const scaled = (channel: Channel): Float64Array | undefined => {
    const index = mapping[channel];
    if (index === undefined) return undefined;
    const factor = STRAIN_CHANNELS.includes(channel)
      ? STRAIN_FACTOR[strainUnit]
      : channel === "time"
        ? 1
        : STRESS_FACTOR[stressUnit];
    return table.columns[index].map((v) => v * factor);
  };
  return {
    ok: true,
    warnings,
    points: {
      strain: scaled("strain") as Float64Array,
      stress: scaled("stress") as Float64Array,
      time: scaled("time"),
      transverseStrain: scaled("transverseStrain"),
      shearStrain: scaled("shearStrain"),
      shearStress: scaled("shearStress"),
      lines: table.lines,
      strainUnit,
      stressUnit,
    },
  };
}

/** A unit written in the header that the reader does not know must not be guessed around. */
function unknownHeaderUnit(table: CurveTable, mapping: ColumnMappingChoice): CsvError | null {
  const checks = [
    {
      auto: mapping.strainUnit === "auto",
      index: mapping.strain,
      known: strainUnitFromHeader,
      list: "%, mm/mm",
    },
    {
      auto: mapping.stressUnit === "auto",
      index: mapping.stress,
      known: stressUnitFromHeader,
      list: "Pa, kPa, MPa, GPa",
    },
  ];
  for (const c of checks) {
    const header = table.headers[c.index];
    const unit = headerUnitText(header);
    if (c.auto && table.hasHeader && unit !== null && unit !== "" && c.known(header) === null) {
      return csvError(
        "mapping",
        `unit "${unit}" is not one of ${c.list}; choose the unit in the mapping step.`,
        table.headerLine,
        header,
      );
    }
  }
  return null;
}
