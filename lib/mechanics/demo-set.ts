import type { MaterialParams } from "./types";

/**
 * The demo SMC parameter set of damage-law.md A.3: invented values [I] in the window of a
 * 25–30 wt% glass SMC. Shared by the loading desk preset, the benchmark and the invented demo
 * curves; tests keep their own literal copy so they do not trust this one.
 */
export const DEMO_SMC: Readonly<MaterialParams> = Object.freeze({
  E1: 11000, // MPa
  E2: 11000, // MPa
  nu12: 0.3,
  G12: 4230.769, // MPa, E/(2(1+nu)) as printed in A.3
  Y0_1: 0.05, // MPa
  Y0_2: 0.05, // MPa
  a1: 0.6, // MPa^-0.5
  a2: 0.6, // MPa^-0.5
  b: 0.3,
  k6: 1,
  alpha: 0.005, // mm/mm
  beta: 0.005, // mm/mm
  dcrit: 0.45,
  dmax: 0.99,
  law: "sqrtY",
  frame: "fixed",
  thetaD: 0, // degrees
  Xc: null,
  onFailure: "stop",
});
