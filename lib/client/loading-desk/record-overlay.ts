/**
 * A stored test record as a curve over the loading desk's stress–strain chart: which σ–ε pair its
 * test type measures, and its points (already mm/mm and MPa).
 */
import type { StoredPoints } from "@/db/schema/test-records";
import type { StrainComponent, StressComponent } from "@/lib/client/loading-desk/chart-defs";
import type { ChartOverlay } from "@/lib/client/loading-desk/chart-overlays";

const AXES: Record<string, { x: StrainComponent; y: StressComponent }> = {
  "tension-1": { x: "eps11", y: "sig11" },
  "compression-1": { x: "eps11", y: "sig11" },
  "tension-2": { x: "eps22", y: "sig22" },
  "shear-12": { x: "gam12", y: "sig12" },
};

/** The chart axes a test type plots on; null for types with no single σ–ε pair (biaxial …). */
export function overlayAxesOf(testType: string): { x: StrainComponent; y: StressComponent } | null {
  return AXES[testType] ?? null;
}

export interface RecordForOverlay {
  id: string;
  name: string;
  testType: string;
  points: StoredPoints;
}

export function recordOverlay(record: RecordForOverlay): ChartOverlay | null {
  const axes = overlayAxesOf(record.testType);
  if (!axes) return null;
  const p = record.points;
  // Same rule as identification: shear uses its own columns when the file mapped them.
  const pair =
    record.testType === "shear-12" && p.shearStrain && p.shearStress
      ? { xs: p.shearStrain, ys: p.shearStress }
      : { xs: p.strain, ys: p.stress };
  return { id: record.id, label: record.name, chart: "stress-strain", ...axes, ...pair };
}
