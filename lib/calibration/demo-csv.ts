/**
 * The invented demo curve as CSV text, for the seed and the browser test upload. Invented data:
 * the header says so in the file name only (test/fixtures/calibration/demo-cyclic-tension.csv and
 * its README), so the file stays a plain numeric table.
 */
import { DEMO_PARAMS, demoCyclicTension, type DemoCurveOptions } from "./demo-curves";

export const DEMO_CSV_OPTIONS: DemoCurveOptions = {
  noiseStress: 0.05,
  noiseStrain: 5e-6,
  seed: 42,
};

export function demoCsvText(): string {
  const p = demoCyclicTension(DEMO_PARAMS, DEMO_CSV_OPTIONS);
  const lines = ["strain [mm/mm],stress [MPa],transverse strain [mm/mm]"];
  for (let i = 0; i < p.strain.length; i++) {
    lines.push(
      `${p.strain[i].toPrecision(8)},${p.stress[i].toPrecision(8)},${p.transverseStrain![i].toPrecision(8)}`,
    );
  }
  return lines.join("\n") + "\n";
}
