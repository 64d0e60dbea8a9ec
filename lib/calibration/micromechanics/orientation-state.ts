/**
 * The orientation state of a moulded coupon or region, computed in one call (spec A.5): each
 * layer's principal direction, order parameter and constants, and the stack's constants with its
 * damage frame. Used by the constituents page and `POST /api/v1/orientation`. Pure.
 */
import type { Closure } from "./closure";
import { alignedPly, type AlignedPly, type Constituents } from "./halpin-tsai";
import {
  invariantsOf,
  orientedLayer,
  orientedStack,
  stackStiffness,
  type Layer,
  type OrientedElastic,
  type PlaneStiffness,
} from "./orientation-average";
import { principalOf } from "./orientation-tensor";

export interface OrientationInput {
  /** The aligned ply: typed in, or from the constituents by Halpin–Tsai (spec A.4). */
  ply: AlignedPly | { constituents: Constituents };
  closure: Closure;
  layers: Layer[];
  /** Degrees from the flow (x) direction to a coupon's load axis, if it was cut off-axis. */
  cutAngle?: number;
}

export interface LayerResult extends OrientedElastic {
  fraction: number;
  a11: number;
  a12: number;
  thetaA: number; // degrees
  s: number; // order parameter
}

export interface OrientationResult {
  closure: Closure;
  ply: AlignedPly;
  layers: LayerResult[];
  /** The stack's constants in its damage frame, thetaD measured from the part's x axis. */
  stack: OrientedElastic;
  /** The thickness-averaged in-plane stiffness A/h in the part's x–y axes, MPa. */
  stiffness: PlaneStiffness;
  /** For a coupon cut at cutAngle: the damage frame in the coupon's load axes, thetaA − φ. */
  couponThetaD: number | null;
}

function plyOf(input: OrientationInput["ply"]): AlignedPly {
  return "constituents" in input ? alignedPly(input.constituents) : input;
}

/** Wraps an angle in degrees into (−90, 90]: a frame and its half turn are the same frame. */
function wrapFrame(theta: number): number {
  const t = theta - 180 * Math.round(theta / 180);
  return t === -90 ? 90 : t;
}

export function orientationState(input: OrientationInput): OrientationResult {
  const ply = plyOf(input.ply);
  const layers = input.layers.map((layer): LayerResult => {
    const { thetaA, s } = principalOf(layer.tensor);
    return {
      fraction: layer.fraction,
      a11: layer.tensor.a11,
      a12: layer.tensor.a12,
      thetaA,
      s,
      ...orientedLayer(ply, layer.tensor, input.closure),
    };
  });
  const stack = orientedStack(ply, input.layers, input.closure);
  return {
    closure: input.closure,
    ply,
    layers,
    stack,
    stiffness: stackStiffness(invariantsOf(ply), input.layers, input.closure),
    couponThetaD: input.cutAngle === undefined ? null : wrapFrame(stack.thetaD - input.cutAngle),
  };
}
