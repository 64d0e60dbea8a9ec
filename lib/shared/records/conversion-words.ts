/**
 * How a record's stress and strain were made, in words for its page: the raw force and
 * extension columns with the geometry, and the lines skipped before the table.
 */
import type { StoredMapping } from "@/db/schema/test-records";

const mm = (v: number | undefined) => (v === undefined ? "?" : `${v} mm`);

export function conversionRows(mapping: StoredMapping): [string, string][] {
  const rows: [string, string][] = [];
  const { conversion, geometry = {}, layout } = mapping;
  if (conversion?.forceColumn) {
    rows.push([
      "Stress from",
      `${conversion.forceColumn} in ${conversion.forceUnit} ÷ (width ${mm(geometry.widthMm)} × thickness ${mm(geometry.thicknessMm)})`,
    ]);
  }
  if (conversion?.extensionColumn) {
    rows.push([
      "Strain from",
      `${conversion.extensionColumn} in ${conversion.extensionUnit} ÷ gauge length ${mm(geometry.gaugeLengthMm)}`,
    ]);
  }
  if (layout && layout.skipLines > 0) {
    const units = layout.unitRow ? ", with a unit row" : "";
    rows.push(["Lines skipped", `${layout.skipLines} before the header${units}`]);
  }
  return rows;
}
