import { describe, expect, it } from "vitest";

import { conversionRows } from "@/lib/shared/records/conversion-words";

describe("a record's conversion in words", () => {
  it("names the raw columns, the geometry and the skipped lines", () => {
    const rows = conversionRows({
      strain: 4,
      stress: 5,
      strainUnit: "mm/mm",
      stressUnit: "MPa",
      conversion: {
        forceColumn: "Force [kN]",
        forceUnit: "kN",
        extensionColumn: "Extension [mm]",
        extensionUnit: "mm",
      },
      geometry: { widthMm: 10, thicknessMm: 4, gaugeLengthMm: 50 },
      layout: { skipLines: 8, headerRow: true, unitRow: true, delimiter: ";", decimalComma: true },
    });
    expect(rows).toEqual([
      ["Stress from", "Force [kN] in kN ÷ (width 10 mm × thickness 4 mm)"],
      ["Strain from", "Extension [mm] in mm ÷ gauge length 50 mm"],
      ["Lines skipped", "8 before the header, with a unit row"],
    ]);
  });

  it("says nothing for a plain stress–strain file", () => {
    expect(
      conversionRows({ strain: 0, stress: 1, strainUnit: "mm/mm", stressUnit: "MPa" }),
    ).toEqual([]);
  });
});
