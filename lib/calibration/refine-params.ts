/**
 * The free parameters of a refinement as a scaled vector. Levenberg–Marquardt works best when
 * every unknown is of order one, so each parameter is divided by a scale (its start value, or a
 * typical size when the start is zero); bounds are mapped the same way.
 */
import type { MaterialParams } from "@/lib/mechanics/types";

export const FITTABLE = [
  "E1",
  "E2",
  "nu12",
  "G12",
  "Y0_1",
  "Y0_2",
  "a1",
  "a2",
  "b",
  "k6",
  "alpha",
  "beta",
] as const;
export type FittableParam = (typeof FITTABLE)[number];
export type Bounds = Partial<Record<FittableParam, [number, number]>>;

/** Admissible ranges (spec A.3) narrowed to sensible search boxes around the start. */
export function defaultBounds(name: FittableParam, start: number): [number, number] {
  switch (name) {
    case "E1":
    case "E2":
    case "G12":
      return [0.2 * start, 5 * start];
    case "nu12":
      return [0, 0.49];
    case "b":
      return [0, 1];
    case "k6":
      return [0, 3];
    case "alpha":
    case "beta":
      return [0, 0.05];
    default: // Y0_i, a_i: positive, within a decade
      return [1e-3 * start, 10 * start];
  }
}

const TYPICAL: Record<FittableParam, number> = {
  E1: 10000,
  E2: 10000,
  nu12: 0.3,
  G12: 4000,
  Y0_1: 0.05,
  Y0_2: 0.05,
  a1: 0.5,
  a2: 0.5,
  b: 0.5,
  k6: 1,
  alpha: 0.005,
  beta: 0.005,
};

export interface ParamVector {
  names: FittableParam[];
  scale: number[];
  start: number[]; // scaled
  min: number[]; // scaled
  max: number[]; // scaled
  toParams: (u: ArrayLike<number>) => MaterialParams;
}

export function paramVector(
  base: MaterialParams,
  free: FittableParam[],
  bounds: Bounds = {},
): ParamVector {
  const scale = free.map((n) => (Math.abs(base[n]) > 0 ? Math.abs(base[n]) : TYPICAL[n]));
  const box = free.map((n) => bounds[n] ?? defaultBounds(n, base[n]));
  return {
    names: free,
    scale,
    start: free.map((n, j) => Math.min(Math.max(base[n], box[j][0]), box[j][1]) / scale[j]),
    min: box.map((b, j) => b[0] / scale[j]),
    max: box.map((b, j) => b[1] / scale[j]),
    toParams: (u) => {
      const p = { ...base };
      free.forEach((n, j) => {
        p[n] = u[j] * scale[j];
      });
      return p;
    },
  };
}
