/**
 * Force and extension → engineering stress and strain, from the specimen's geometry:
 * σ = F / (w·t) with F in N and w, t in mm gives MPa; ε = ΔL / L0 with both in mm gives mm/mm.
 * The derived columns are appended to the table, so the usual extraction (units, bad cells,
 * cleaning) reads them like any other column, and the raw columns stay as they were.
 */
import { csvError, type CsvError } from "./csv-error";
import type { CurveTable } from "./parse-table";
import type { RecordMapping } from "./record-mapping";
import type { ColumnMappingChoice } from "./record-schema";
import {
  FORCE_FACTOR,
  forceUnitFromHeader,
  headerUnitText,
  LENGTH_FACTOR,
  lengthUnitFromHeader,
  type ForceUnit,
  type LengthUnit,
} from "./units";

export const STRESS_FROM_FORCE = "stress from force [MPa]";
export const STRAIN_FROM_EXTENSION = "strain from extension [mm/mm]";

/** What the record keeps about a conversion: the raw column, its unit and the geometry used. */
export interface Conversion {
  forceColumn?: string;
  forceUnit?: ForceUnit;
  extensionColumn?: string;
  extensionUnit?: LengthUnit;
}

export type QuantitiesResult =
  | {
      ok: true;
      table: CurveTable;
      choice: ColumnMappingChoice;
      conversion: Conversion;
      warnings: string[];
    }
  | { ok: false; missing: string }
  | { ok: false; error: CsvError };

/** Engineering stress in MPa from force in N and a cross-section in mm. */
export function stressFromForce(forceN: number, widthMm: number, thicknessMm: number): number {
  return forceN / (widthMm * thicknessMm);
}

/** Engineering strain in mm/mm from an extension and a gauge length, both in mm. */
export function strainFromExtension(extensionMm: number, gaugeLengthMm: number): number {
  return extensionMm / gaugeLengthMm;
}

function unitOf<U extends string>(
  table: CurveTable,
  index: number,
  chosen: U | "auto",
  fromHeader: (h: string) => U | null,
  fallback: U,
  what: string,
  list: string,
): { unit: U; warning?: string } | { error: CsvError } {
  if (chosen !== "auto") return { unit: chosen };
  const header = table.headers[index];
  const known = fromHeader(header);
  if (known) return { unit: known };
  const written = headerUnitText(header);
  if (table.hasHeader && written) {
    return {
      error: csvError(
        "mapping",
        `unit "${written}" is not one of ${list}; choose the ${what} unit in the mapping step.`,
        table.headerLine,
        header,
      ),
    };
  }
  const warning = `The ${what} column has no unit, so it was read as ${fallback}. Choose the unit if that is wrong.`;
  return { unit: fallback, warning };
}

function appendColumn(table: CurveTable, header: string, raw: number, values: Float64Array) {
  table.headers.push(header);
  table.columns.push(values);
  table.firstBadCell.push(table.firstBadCell[raw]);
  return table.headers.length - 1;
}

/** The stress and strain columns to extract: mapped ones, or ones derived here. */
export function resolveQuantities(source: CurveTable, mapping: RecordMapping): QuantitiesResult {
  const { geometry = {} } = mapping;
  const table: CurveTable = {
    ...source,
    headers: [...source.headers],
    columns: [...source.columns],
    firstBadCell: [...source.firstBadCell],
  };
  const warnings: string[] = [];
  const conversion: Conversion = {};
  let { stress, strain, stressUnit, strainUnit } = mapping;
  for (const index of [mapping.force, mapping.extension]) {
    if (index !== undefined && index >= table.headers.length) {
      const message = `a column ${index + 1} is mapped, but the file has ${table.headers.length} columns.`;
      return { ok: false, error: csvError("mapping", message) };
    }
  }
  if (stress === undefined) {
    if (mapping.force === undefined) {
      return {
        ok: false,
        missing:
          "Choose the stress column, or the force column and the specimen's width and thickness.",
      };
    }
    if (geometry.widthMm === undefined)
      return { ok: false, missing: "Give the specimen's width in mm to convert force to stress." };
    if (geometry.thicknessMm === undefined) {
      return {
        ok: false,
        missing: "Give the specimen's thickness in mm to convert force to stress.",
      };
    }
    const u = unitOf(
      table,
      mapping.force,
      mapping.forceUnit,
      forceUnitFromHeader,
      "N",
      "force",
      "N, kN",
    );
    if ("error" in u) return { ok: false, error: u.error };
    if (u.warning) warnings.push(u.warning);
    const factor = FORCE_FACTOR[u.unit];
    const { widthMm, thicknessMm } = geometry;
    const values = table.columns[mapping.force].map((f) =>
      stressFromForce(f * factor, widthMm, thicknessMm),
    );
    stress = appendColumn(table, STRESS_FROM_FORCE, mapping.force, values);
    stressUnit = "MPa";
    conversion.forceColumn = source.headers[mapping.force];
    conversion.forceUnit = u.unit;
  }
  if (strain === undefined) {
    if (mapping.extension === undefined) {
      return {
        ok: false,
        missing:
          "Choose the strain column (extensometer), or the extension column and the gauge length.",
      };
    }
    if (geometry.gaugeLengthMm === undefined) {
      return { ok: false, missing: "Give the gauge length in mm to convert extension to strain." };
    }
    const u = unitOf(
      table,
      mapping.extension,
      mapping.extensionUnit,
      lengthUnitFromHeader,
      "mm",
      "extension",
      "mm, µm",
    );
    if ("error" in u) return { ok: false, error: u.error };
    if (u.warning) warnings.push(u.warning);
    const factor = LENGTH_FACTOR[u.unit];
    const { gaugeLengthMm } = geometry;
    const values = table.columns[mapping.extension].map((d) =>
      strainFromExtension(d * factor, gaugeLengthMm),
    );
    strain = appendColumn(table, STRAIN_FROM_EXTENSION, mapping.extension, values);
    strainUnit = "mm/mm";
    conversion.extensionColumn = source.headers[mapping.extension];
    conversion.extensionUnit = u.unit;
  }
  const choice: ColumnMappingChoice = {
    strain,
    stress,
    time: mapping.time,
    transverseStrain: mapping.transverseStrain,
    shearStrain: mapping.shearStrain,
    shearStress: mapping.shearStress,
    strainUnit,
    stressUnit,
  };
  for (const key of Object.keys(choice) as (keyof ColumnMappingChoice)[]) {
    if (choice[key] === undefined) delete choice[key];
  }
  return { ok: true, table, choice, conversion, warnings };
}
