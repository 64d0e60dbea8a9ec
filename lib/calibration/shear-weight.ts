/**
 * Spec E.9: the shear weight k6 from in-axis shear loops (fixed frame), by a grid scan and then
 * golden-section on [0, 3]. Isotropic materials use D.11's closed form: the loop's peak shear stress fixes d, the
 * secant shear compliance is 1/G12 + 2·k6·d/(E·(1 − d)); orthotropic ones replay the record.
 */
import type { MaterialParams } from "@/lib/mechanics/types";
import { damageAtPeak, scannedSearch } from "./golden-section";
import type { LoopModulus } from "./loop-moduli";
import { replayError } from "./replay";
import type { RecordPoints } from "./types";

/** Loop moduli here are G_k (τ against engineering γ); sigMax is τmax_k. */
export function shearWeightClosedForm(loops: LoopModulus[], p: MaterialParams): number {
  const E = p.E1;
  const error = (k6: number) =>
    loops.reduce((sum, loop) => {
      const kk = Math.max(k6, 1e-9); // k6 → 0: shear does not damage, d = 0
      const d = damageAtPeak(loop.sigMax * Math.sqrt((kk * (1 + p.b)) / (2 * E)), p.a1, p.Y0_1);
      const model = 1 / (1 / p.G12 + (2 * k6 * d) / (E * (1 - d)));
      return sum + ((loop.E - model) / p.G12) ** 2;
    }, 0);
  return scannedSearch(error, 0, 3);
}

export function shearWeightByReplay(points: RecordPoints, p: MaterialParams): number {
  const error = (k6: number) => replayError({ ...p, k6 }, "shear-12", points);
  return scannedSearch(error, 0, 3, 1e-4);
}
