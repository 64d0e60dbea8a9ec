import { readFileSync } from "node:fs";
import path from "node:path";

import { beforeAll, describe, expect, it } from "vitest";

import { getTestRecord } from "@/lib/server/records/records";
import { uploadTestRecord } from "@/lib/server/records/upload";

import { openTestDb } from "../support/db";
import { makeTeamWithAllRoles, type TeamFixture } from "../support/team";
import { META, recordCount } from "./support";

// Issue 14 item 1: a machine-shaped file (invented, test/fixtures/machine/README.md) through the
// record upload, stress and strain derived from force and extension with the specimen's geometry.
const KN_PERCENT = readFileSync(
  path.join(process.cwd(), "test/fixtures/machine/tension-kn-percent.csv"),
  "utf8",
);
const GEOMETRY = { widthMm: 10, thicknessMm: 4, gaugeLengthMm: 50 };

const db = openTestDb();
let t: TeamFixture;

beforeAll(async () => {
  t = await makeTeamWithAllRoles(db);
});

function body(mapping: Record<string, unknown>) {
  return { fileName: "tension-kn-percent.csv", text: KN_PERCENT, mapping, meta: META };
}

describe("upload of a machine file", () => {
  it("stores stress from force in kN and strain from extension, with the raw columns and geometry", async () => {
    // The layout is left to the server's detection: 8 lines skipped, header, unit row.
    const out = await uploadTestRecord(
      db,
      t.members.editor,
      t.slug,
      body({ time: 0, force: 1, extension: 2, geometry: GEOMETRY }),
    );
    expect(out.pointCount).toBe(8);
    const view = await getTestRecord(db, t.members.viewer, t.slug, out.id);
    // Line 14 "3,0;1,250;0,1875;0,375": σ = 1250 N / (10·4 mm²) = 31.25 MPa; ε = 0.1875/50 = 0.00375.
    expect(view.points.stress[3]).toBeCloseTo(31.25, 9);
    expect(view.points.strain[3]).toBeCloseTo(0.00375, 12);
    // Line 16 "5,0;1,500;0,3125;…": 1500/40 = 37.5 MPa; 0.3125/50 = 0.00625.
    expect(view.points.stress[5]).toBeCloseTo(37.5, 9);
    expect(view.points.strain[5]).toBeCloseTo(0.00625, 12);
    expect(view.headers.slice(0, 4)).toEqual([
      "Time [s]",
      "Force [kN]",
      "Extension [mm]",
      "Strain [%]",
    ]);
    expect(view.mapping).toMatchObject({
      force: 1,
      extension: 2,
      strainUnit: "mm/mm",
      stressUnit: "MPa",
      geometry: GEOMETRY,
      conversion: {
        forceColumn: "Force [kN]",
        forceUnit: "kN",
        extensionColumn: "Extension [mm]",
        extensionUnit: "mm",
      },
      layout: { skipLines: 8, headerRow: true, unitRow: true, delimiter: ";", decimalComma: true },
    });
    expect(view.headers[view.mapping.stress]).toBe("stress from force [MPa]");
  });

  it("reads the extensometer's % column as strain when it is mapped", async () => {
    const out = await uploadTestRecord(
      db,
      t.members.editor,
      t.slug,
      body({ force: 1, strain: 3, geometry: { widthMm: 10, thicknessMm: 4 } }),
    );
    const view = await getTestRecord(db, t.members.viewer, t.slug, out.id);
    expect(view.points.strain[3]).toBeCloseTo(0.00375, 12); // 0.375 % on line 14
    expect(view.mapping.conversion).toEqual({ forceColumn: "Force [kN]", forceUnit: "kN" });
  });

  it("refuses a force file without the thickness, in words, and saves nothing", async () => {
    const before = await recordCount(db, t.teamId);
    await expect(
      uploadTestRecord(
        db,
        t.members.editor,
        t.slug,
        body({ force: 1, strain: 3, geometry: { widthMm: 10 } }),
      ),
    ).rejects.toMatchObject({
      message: "Give the specimen's thickness in mm to convert force to stress.",
    });
    expect(await recordCount(db, t.teamId)).toBe(before);
  });
});
