/**
 * Curves for the polar pictures of the orientation section: the stiffness rose E(θ) of a stack
 * beside those of the aligned ply and of its planar-random average, and each layer's fibre
 * density (spec A.5). Angles in degrees from the part's x axis; E in MPa.
 */
import { fibreDensityCurve } from "./angular-gaussian";
import type { AlignedPly } from "./halpin-tsai";
import {
  invariantsOf,
  layerStiffness,
  modulusAlong,
  type PlaneStiffness,
} from "./orientation-average";
import type { PlanarOrientation } from "./orientation-tensor";

export interface PolarPoint {
  theta: number; // degrees
  r: number;
}

function stiffnessRose(q: PlaneStiffness, n = 181): PolarPoint[] {
  return Array.from({ length: n }, (_, k) => {
    const theta = (360 * k) / (n - 1);
    return { theta, r: modulusAlong(q, theta) };
  });
}

/** The three roses the section draws: result, aligned ply along x, planar random. */
export function comparisonRoses(ply: AlignedPly, stack: PlaneStiffness) {
  const U = invariantsOf(ply);
  return {
    result: stiffnessRose(stack),
    aligned: stiffnessRose(layerStiffness(U, { a11: 1, a12: 0 }, "exact")),
    random: stiffnessRose(layerStiffness(U, { a11: 0.5, a12: 0 }, "exact")),
  };
}

/** A layer's fibre density for the polar picture; an aligned layer is drawn as a spike. */
export function densityPicture(tensor: PlanarOrientation, n = 181): PolarPoint[] {
  const curve = fibreDensityCurve(tensor, n);
  const finite = curve.filter((p) => Number.isFinite(p.f)).map((p) => p.f);
  const cap = Math.max(1, ...finite) * 1.0;
  return curve.map((p) => ({ theta: p.theta, r: Number.isFinite(p.f) ? p.f : cap * 4 }));
}
