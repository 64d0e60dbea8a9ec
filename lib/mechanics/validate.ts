/**
 * Guards of the core against bad input (spec A.3 ranges, scenario-file limits). The scenario
 * schema validates files upstream; these checks keep the core safe when called directly.
 * Each message names the field, e.g. "a1: must be > 0 and a1·sqrt(Y0_1) < 1".
 */
import type { Leg, MaterialParams } from "./types";

export const MAX_TOTAL_INCREMENTS = 1_000_000;

export class MechanicsInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "MechanicsInputError";
  }
}

/** Returns every violated range as "field: reason"; empty when the set is admissible. */
export function checkParams(p: MaterialParams): string[] {
  const out: string[] = [];
  const num = (k: keyof MaterialParams) => {
    const v = p[k];
    if (typeof v !== "number" || !Number.isFinite(v)) {
      out.push(`${k}: must be a finite number`);
      return false;
    }
    return true;
  };
  const positive = (k: "E1" | "E2" | "G12" | "Y0_1" | "Y0_2") => {
    if (num(k) && !(p[k] > 0)) out.push(`${k}: must be > 0`);
  };
  positive("E1");
  positive("E2");
  positive("G12");
  positive("Y0_1");
  positive("Y0_2");
  if (num("nu12") && p.E1 > 0 && p.E2 > 0 && !(Math.abs(p.nu12) < Math.sqrt(p.E1 / p.E2))) {
    out.push("nu12: must satisfy |nu12| < sqrt(E1/E2)");
  }
  for (const [a, y] of [
    ["a1", "Y0_1"],
    ["a2", "Y0_2"],
  ] as const) {
    if (!num(a)) continue;
    const ok =
      p.law === "linY" ? p[a] > 0 && 2 * p[a] * p[y] < 1 : p[a] > 0 && p[a] * Math.sqrt(p[y]) < 1;
    if (!ok) {
      out.push(
        p.law === "linY"
          ? `${a}: must be > 0 and 2·${a}·${y} < 1`
          : `${a}: must be > 0 and ${a}·sqrt(${y}) < 1`,
      );
    }
  }
  const inRange = (k: "b" | "k6" | "alpha" | "beta" | "dmax", lo: number, hi: number) => {
    if (num(k) && !(p[k] >= lo && p[k] <= hi)) out.push(`${k}: must be in [${lo}, ${hi}]`);
  };
  inRange("b", 0, 1);
  inRange("k6", 0, 3);
  inRange("alpha", 0, 0.05);
  inRange("beta", 0, 0.05);
  inRange("dmax", 0.9, 0.999);
  if (num("dcrit") && !(p.dcrit > 0 && p.dcrit < p.dmax)) out.push("dcrit: must be in (0, dmax)");
  num("thetaD");
  if (p.Xc !== null && p.Xc !== undefined && !(Number.isFinite(p.Xc) && p.Xc > 0)) {
    out.push("Xc: must be > 0 or null (off)");
  }
  if (p.law !== "sqrtY" && p.law !== "linY") out.push("law: must be 'sqrtY' or 'linY'");
  if (p.frame !== "fixed" && p.frame !== "onset") out.push("frame: must be 'fixed' or 'onset'");
  if (p.onFailure !== "stop" && p.onFailure !== "continue") {
    out.push("onFailure: must be 'stop' or 'continue'");
  }
  if (p.frame === "onset" && !isIsotropic(p)) {
    out.push("frame: 'onset' needs an isotropic material (E1 = E2, G12 = E1/(2(1+nu12)), 1e-6)");
  }
  return out;
}

/** In-plane isotropy of S0 to 1e-6 relative (spec B.8). */
export function isIsotropic(p: MaterialParams): boolean {
  const g = p.E1 / (2 * (1 + p.nu12));
  return Math.abs(p.E1 - p.E2) <= 1e-6 * p.E1 && Math.abs(p.G12 - g) <= 1e-6 * g;
}

export function checkLegs(legs: readonly Leg[]): string[] {
  const out: string[] = [];
  if (!Array.isArray(legs) || legs.length === 0) return ["legs: the path is empty"];
  let total = 0;
  legs.forEach((leg, i) => {
    const n = leg.increments;
    if (!Number.isInteger(n) || n < 1) out.push(`legs[${i}].increments: must be an integer >= 1`);
    else total += n;
    for (let k = 0; k < 3; k++) {
      const c = leg.control?.[k];
      if (c !== "strain" && c !== "stress") {
        out.push(`legs[${i}].control[${k}]: must be 'strain' or 'stress'`);
      }
      if (!Number.isFinite(leg.target?.[k])) out.push(`legs[${i}].target[${k}]: must be finite`);
    }
  });
  if (total > MAX_TOTAL_INCREMENTS) {
    out.push(`legs: ${total} increments in total, at most ${MAX_TOTAL_INCREMENTS}`);
  }
  return out;
}
