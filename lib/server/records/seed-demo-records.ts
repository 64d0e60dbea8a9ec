/**
 * INVENTED demo test records for the demo team: cyclic tension along 1 generated from the
 * invented demo parameter set (spec A.3) plus seeded noise, labelled as invented in their names
 * and notes. Idempotent: a record already present under its name is left alone.
 */
import { createHash } from "node:crypto";

import type { Db } from "@/db/client";
import { findTestRecordIdByName, insertTestRecord } from "@/db/queries/test-records";
import { DEMO_CSV_OPTIONS } from "@/lib/calibration/demo-csv";
import {
  DEMO_PARAMS,
  demoCyclicTension,
  type DemoCurveOptions,
} from "@/lib/calibration/demo-curves";
import { readCurveCsv } from "@/lib/csv/read-curve-csv";

import { toStoredPoints } from "../../shared/records/stored-points";

const DEMOS: { name: string; specimen: string; options: DemoCurveOptions }[] = [
  { name: "Demo cyclic tension A (invented)", specimen: "DEMO-A", options: DEMO_CSV_OPTIONS },
  {
    name: "Demo cyclic tension B (invented)",
    specimen: "DEMO-B",
    options: { ...DEMO_CSV_OPTIONS, seed: 7, peaks: [0.003, 0.006, 0.009, 0.012] },
  },
];

function csvOf(options: DemoCurveOptions): string {
  const p = demoCyclicTension(DEMO_PARAMS, options);
  const rows = ["strain [mm/mm],stress [MPa],transverse strain [mm/mm]"];
  for (let i = 0; i < p.strain.length; i++) {
    rows.push(
      `${p.strain[i].toPrecision(8)},${p.stress[i].toPrecision(8)},${p.transverseStrain![i].toPrecision(8)}`,
    );
  }
  return rows.join("\n") + "\n";
}

export async function seedDemoRecords(
  db: Db,
  teamId: string,
  authorId: string | null,
): Promise<number> {
  let added = 0;
  for (const demo of DEMOS) {
    const exists = await findTestRecordIdByName(db, teamId, demo.name);
    if (exists) continue;
    const text = csvOf(demo.options);
    const mapping = { strain: 0, stress: 1, transverseStrain: 2 };
    const read = readCurveCsv(text, mapping);
    if (!read.ok) throw new Error(`demo record does not parse: ${read.error.message}`);
    await insertTestRecord(db, {
      teamId,
      name: demo.name,
      testType: "tension-1",
      loading: "cyclic",
      specimenId: demo.specimen,
      orientation: 0,
      laboratory: "none: invented data",
      notes:
        "Invented demo curve generated from the invented demo parameter set plus noise; not a measurement.",
      mapping: {
        ...mapping,
        strainUnit: read.points.strainUnit,
        stressUnit: read.points.stressUnit,
      },
      headers: read.table.headers,
      warnings: read.warnings,
      points: toStoredPoints(read.points),
      pointCount: read.points.strain.length,
      fileName: `${demo.specimen.toLowerCase()}-invented.csv`,
      fileSize: Buffer.byteLength(text),
      fileSha256: createHash("sha256").update(text).digest("hex"),
      fileText: text,
      createdBy: authorId,
    });
    added++;
  }
  return added;
}
