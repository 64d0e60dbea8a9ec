/**
 * Orientation average of the aligned ply's plane-stress stiffness through the Tsai–Pagano
 * invariants (spec A.5, A.4; Tsai & Pagano 1968), per layer and for a stack of layers.
 * Stiffness in Voigt order (11, 22, 12) with engineering shear, MPa; angles in degrees.
 */
import type { AlignedPly } from "./halpin-tsai";
import { fourthMoment, type Closure } from "./closure";
import { principalOf, type PlanarOrientation } from "./orientation-tensor";

/** Tsai–Pagano invariants U1…U5 of the ply's reduced stiffness Q (spec A.4, A.5). */
export interface Invariants {
  U1: number;
  U2: number;
  U3: number;
  U4: number;
  U5: number;
}

/** In-plane stiffness in some frame; Q16, Q26 couple normal and shear terms. */
export interface PlaneStiffness {
  Q11: number;
  Q22: number;
  Q12: number;
  Q66: number;
  Q16: number;
  Q26: number;
}

export interface Layer {
  fraction: number; // thickness fraction t_k, the fractions of a stack add up to 1
  tensor: PlanarOrientation;
}

/** E1, E2, nu12, G12 in the damage frame and that frame's angle (spec A.5: thD = thetaA). */
export interface OrientedElastic {
  E1: number;
  E2: number;
  nu12: number;
  G12: number;
  thetaD: number; // degrees
}

export function invariantsOf(ply: AlignedPly): Invariants {
  const nu21 = (ply.nu12 * ply.E22) / ply.E11;
  const den = 1 - ply.nu12 * nu21;
  const Q11 = ply.E11 / den;
  const Q22 = ply.E22 / den;
  const Q12 = (ply.nu12 * ply.E22) / den;
  const Q66 = ply.G12;
  return {
    U1: (3 * Q11 + 3 * Q22 + 2 * Q12 + 4 * Q66) / 8,
    U2: (Q11 - Q22) / 2,
    U3: (Q11 + Q22 - 2 * Q12 - 4 * Q66) / 8,
    U4: (Q11 + Q22 + 6 * Q12 - 4 * Q66) / 8,
    U5: (Q11 + Q22 - 2 * Q12 + 4 * Q66) / 8,
  };
}

/**
 * Stiffness of a distribution with moments <cos 2θ> = c2, <sin 2θ> = s2, <cos 4θ> = c4,
 * <sin 4θ> = s4 about the x axis: the invariant form of the rotated ply, averaged term by term.
 */
function stiffnessFromMoments(U: Invariants, c2: number, s2: number, c4: number, s4: number) {
  return {
    Q11: U.U1 + U.U2 * c2 + U.U3 * c4,
    Q22: U.U1 - U.U2 * c2 + U.U3 * c4,
    Q12: U.U4 - U.U3 * c4,
    Q66: U.U5 - U.U3 * c4,
    Q16: 0.5 * U.U2 * s2 + U.U3 * s4,
    Q26: 0.5 * U.U2 * s2 - U.U3 * s4,
  };
}

/** One layer's averaged stiffness in the load frame (the closure gives c4 in its principal frame). */
export function layerStiffness(
  U: Invariants,
  tensor: PlanarOrientation,
  closure: Closure,
): PlaneStiffness {
  const { thetaA, s } = principalOf(tensor);
  const c4 = fourthMoment(s, closure);
  const t = (thetaA * Math.PI) / 180;
  return stiffnessFromMoments(
    U,
    s * Math.cos(2 * t),
    s * Math.sin(2 * t),
    c4 * Math.cos(4 * t),
    c4 * Math.sin(4 * t),
  );
}

/** Thickness-weighted average of the layers' stiffness (the in-plane laminate stiffness A/h). */
export function stackStiffness(U: Invariants, layers: Layer[], closure: Closure): PlaneStiffness {
  const sum: PlaneStiffness = { Q11: 0, Q22: 0, Q12: 0, Q66: 0, Q16: 0, Q26: 0 };
  const total = layers.reduce((acc, l) => acc + l.fraction, 0);
  for (const layer of layers) {
    const q = layerStiffness(U, layer.tensor, closure);
    const w = layer.fraction / total;
    for (const k of Object.keys(sum) as (keyof PlaneStiffness)[]) sum[k] += w * q[k];
  }
  return sum;
}

/**
 * The stiffness seen in a frame rotated by theta (degrees) from the frame Q is written in:
 * Q'(θ) = Tσ Q Tσᵀ with the usual plane-stress transformation (Jones, Mechanics of Composite
 * Materials, 2nd ed., eq. 2.84, written for the rotated frame).
 */
function rotateStiffness(q: PlaneStiffness, theta: number): PlaneStiffness {
  const t = (theta * Math.PI) / 180;
  const c = Math.cos(t);
  const s = Math.sin(t);
  // stress transformation into the rotated frame (Voigt, engineering shear on strains)
  const T = [
    [c * c, s * s, 2 * c * s],
    [s * s, c * c, -2 * c * s],
    [-c * s, c * s, c * c - s * s],
  ];
  const Q = [
    [q.Q11, q.Q12, q.Q16],
    [q.Q12, q.Q22, q.Q26],
    [q.Q16, q.Q26, q.Q66],
  ];
  // σ' = T σ, ε' = T⁻ᵀ ε (engineering shear) ⇒ Q' = T Q Tᵀ
  const R = [0, 1, 2].map((i) =>
    [0, 1, 2].map((j) => {
      let acc = 0;
      for (let k = 0; k < 3; k++) for (let l = 0; l < 3; l++) acc += T[i][k] * Q[k][l] * T[j][l];
      return acc;
    }),
  );
  return { Q11: R[0][0], Q22: R[1][1], Q12: R[0][1], Q66: R[2][2], Q16: R[0][2], Q26: R[1][2] };
}

/** Compliance entries of a plane stiffness (3×3 inverse, cofactors). */
function compliance(q: PlaneStiffness) {
  const a = q.Q11, b = q.Q12, c = q.Q16, d = q.Q22, e = q.Q26, f = q.Q66; // prettier-ignore
  const det = a * (d * f - e * e) - b * (b * f - c * e) + c * (b * e - c * d);
  return {
    S11: (d * f - e * e) / det,
    S22: (a * f - c * c) / det,
    S12: -(b * f - c * e) / det,
    S66: (a * d - b * b) / det,
  };
}

/** Young's modulus along the direction theta (degrees) of the frame Q is written in. */
export function modulusAlong(q: PlaneStiffness, theta: number): number {
  return 1 / compliance(rotateStiffness(q, theta)).S11;
}

/**
 * The frame of a stack: the principal direction of its thickness-averaged orientation tensor (the
 * 2θ part of the average stiffness); when that tensor is isotropic (a balanced stack), the
 * direction of the 4θ part that is stiffest along axis 1; else the x axis.
 */
function stackFrame(q: PlaneStiffness, layers: Layer[]): number {
  const total = layers.reduce((acc, l) => acc + l.fraction, 0);
  const mean = layers.reduce(
    (acc, l) => ({
      a11: acc.a11 + (l.fraction / total) * l.tensor.a11,
      a12: acc.a12 + (l.fraction / total) * l.tensor.a12,
    }),
    { a11: 0, a12: 0 },
  );
  const principal = principalOf(mean);
  if (principal.s > 1e-12) return principal.thetaA;
  const scale = Math.abs(q.Q11) + Math.abs(q.Q22);
  const c4 = q.Q11 + q.Q22 - 2 * q.Q12 - 4 * q.Q66; // 8·U3·<cos 4θ>
  const s4 = q.Q16 - q.Q26; // 2·U3·<sin 4θ>
  if (Math.hypot(c4, 4 * s4) <= 1e-12 * scale) return 0;
  const t = (0.25 * Math.atan2(4 * s4, c4) * 180) / Math.PI;
  return modulusAlong(q, t) >= modulusAlong(q, t + 45) ? t : t + 45;
}

/** Engineering constants in the frame at thetaD: E_i = 1/S_ii, nu12 = −S12/S11, G12 = 1/S66. */
function engineeringConstants(q: PlaneStiffness, thetaD: number): OrientedElastic {
  const S = compliance(rotateStiffness(q, thetaD));
  return { E1: 1 / S.S11, E2: 1 / S.S22, nu12: -S.S12 / S.S11, G12: 1 / S.S66, thetaD };
}

/** A layer: aligned-ply constants, planar tensor and closure → E1, E2, nu12, G12, thetaD = thetaA. */
export function orientedLayer(
  ply: AlignedPly,
  tensor: PlanarOrientation,
  closure: Closure,
): OrientedElastic {
  const q = layerStiffness(invariantsOf(ply), tensor, closure);
  return engineeringConstants(q, principalOf(tensor).thetaA);
}

/** A stack of layers with thickness fractions → the same constants for the whole thickness. */
export function orientedStack(ply: AlignedPly, layers: Layer[], closure: Closure): OrientedElastic {
  const q = stackStiffness(invariantsOf(ply), layers, closure);
  return engineeringConstants(q, stackFrame(q, layers));
}
