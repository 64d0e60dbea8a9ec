import { describe, expect, it } from "vitest";

import { demoCsvText } from "@/lib/calibration/demo-csv";
import { previewCsv } from "@/lib/shared/records/csv-preview";

describe("previewCsv (the upload's mapping step)", () => {
  it("suggests strain, stress and transverse strain for the invented demo file", () => {
    const result = previewCsv(demoCsvText());
    if (!result.ok) throw new Error(result.error.message);
    const { preview } = result;
    expect(preview.suggested).toEqual({ strain: 0, stress: 1, transverseStrain: 2 });
    expect(preview.rowCount).toBe(841);
    expect(preview.firstRows).toHaveLength(6);
    expect(preview.curve?.x.length).toBe(841);
    expect(preview.curve?.strainUnit).toBe("mm/mm");
  });

  it("detects semicolons and decimal commas, and warns when percent strain is guessed", () => {
    const text = "eps;sig\n0,0;0,0\n0,5;55,0\n1,0;99,5\n";
    const result = previewCsv(text, { strain: 0, stress: 1 });
    if (!result.ok) throw new Error(result.error.message);
    expect(result.preview.delimiter).toBe(";");
    expect(result.preview.decimalComma).toBe(true);
    expect(result.preview.curve?.x[2]).toBeCloseTo(0.01, 12);
    expect(result.preview.warnings[0]).toMatch(/percent/);
  });

  it("keeps the table but names the cell when a mapped column holds text", () => {
    const result = previewCsv("strain,stress,note\n0.001,10,a\n0.002,x,b\n", {
      strain: 0,
      stress: 1,
    });
    if (!result.ok) throw new Error(result.error.message);
    expect(result.preview.curve).toBeNull();
    expect(result.preview.error?.message).toBe('line 3, column "stress": "x" is not a number');
  });

  it("shows no curve until strain and stress are both mapped", () => {
    const result = previewCsv("a,b\n1,2\n3,4\n", { strain: 0 } as never);
    expect(result.ok && result.preview.curve).toBeNull();
  });

  it("fails the whole file on a ragged row", () => {
    const result = previewCsv("strain,stress\n0.001,10\n0.002\n");
    expect(result.ok).toBe(false);
    expect(!result.ok && result.error.line).toBe(3);
  });
});
