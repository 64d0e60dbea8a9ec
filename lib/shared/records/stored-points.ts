/**
 * Parsed channels ↔ the compact arrays a test record stores, and the identification input of a
 * stored record. Units: strain mm/mm, stress MPa (spec A.1).
 */
import type { StoredPoints } from "@/db/schema/test-records";
import type { CurvePoints } from "@/lib/csv/extract-points";
import type { TestType } from "@/lib/csv/record-schema";
import { recordPointsFor } from "@/lib/calibration/record-points";
import type { TestRecordInput } from "@/lib/calibration/types";

const OPTIONAL = ["time", "transverseStrain", "shearStrain", "shearStress"] as const;

export function toStoredPoints(curve: CurvePoints): StoredPoints {
  const stored: StoredPoints = {
    strain: Array.from(curve.strain),
    stress: Array.from(curve.stress),
  };
  for (const key of OPTIONAL) {
    const column = curve[key];
    if (column) stored[key] = Array.from(column);
  }
  return stored;
}

function toCurvePoints(
  stored: StoredPoints,
): Omit<CurvePoints, "lines" | "strainUnit" | "stressUnit"> {
  const curve: Omit<CurvePoints, "lines" | "strainUnit" | "stressUnit"> = {
    strain: Float64Array.from(stored.strain),
    stress: Float64Array.from(stored.stress),
  };
  for (const key of OPTIONAL) {
    const column = stored[key];
    if (column) curve[key] = Float64Array.from(column);
  }
  return curve;
}

export interface StoredRecordForFit {
  id: string;
  name?: string; // what the fit's notes call the record

  testType: string;
  orientation: number;
  points: StoredPoints;
}

export function toTestRecordInput(row: StoredRecordForFit): TestRecordInput {
  const testType = row.testType as TestType;
  const curve = toCurvePoints(row.points) as CurvePoints;
  return {
    id: row.id,
    ...(row.name ? { name: row.name } : {}),
    testType,
    points: recordPointsFor(testType, curve),
    orientation: row.orientation || undefined,
  };
}

/** Every n-th sample so a chart gets at most `max` points (turning points matter less here). */
export function thinForDisplay(strain: ArrayLike<number>, stress: ArrayLike<number>, max = 2000) {
  const step = Math.max(1, Math.ceil(strain.length / max));
  const x: number[] = [];
  const y: number[] = [];
  for (let i = 0; i < strain.length; i += step) {
    x.push(strain[i]);
    y.push(stress[i]);
  }
  return { x, y };
}
