/**
 * The points a test type is identified on, from a parsed file's channels: in-plane shear uses the
 * shear strain and stress columns when mapped (else the main pair carries γ12 and τ12); every
 * other type uses the strain and stress columns.
 */
import type { CurvePoints } from "@/lib/csv/extract-points";
import type { TestType } from "@/lib/csv/record-schema";
import type { RecordPoints } from "./types";

export function recordPointsFor(testType: TestType, curve: CurvePoints): RecordPoints {
  if (testType === "shear-12" && curve.shearStrain && curve.shearStress) {
    return { strain: curve.shearStrain, stress: curve.shearStress };
  }
  return { strain: curve.strain, stress: curve.stress, transverseStrain: curve.transverseStrain };
}
