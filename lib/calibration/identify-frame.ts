/**
 * The damage frame an identification uses when its records carry their coupons' orientation
 * states (issue 19 item 3, spec A.5: thetaD = thetaA − φ). All records must carry one and agree;
 * otherwise the set keeps its thetaD and a warning says why, rather than mixing frames. Pure.
 */
import { couponFrame, type CouponOrientation } from "./micromechanics/coupon-orientation";

export interface FrameRecord {
  name: string;
  couponOrientation: CouponOrientation | null;
}

export type IdentifiedFrame =
  | { kind: "none" } // no record carries an orientation: nothing to say
  | { kind: "frame"; thetaD: number; note: string }
  | { kind: "warning"; warning: string };

/** Frames closer than this (degrees) are the same frame: typed tensors carry rounding. */
const SAME_FRAME_DEG = 0.05;

const deg = (x: number) => `${Number(x.toFixed(2))}°`;

export function identifiedFrame(records: FrameRecord[]): IdentifiedFrame {
  const carrying = records.filter((r) => r.couponOrientation !== null);
  if (carrying.length === 0) return { kind: "none" };
  const missing = records.filter((r) => r.couponOrientation === null).map((r) => r.name);
  if (missing.length > 0) {
    return {
      kind: "warning",
      warning: `Only some records carry a coupon orientation (missing on ${missing.join(", ")}): thetaD keeps the starting set's value; give every record its orientation to use thetaD = thetaA − φ.`,
    };
  }
  const frames = carrying.map((r) => ({
    name: r.name,
    frame: couponFrame(r.couponOrientation as CouponOrientation),
  }));
  const balanced = frames.filter((f) => !f.frame.ok).map((f) => f.name);
  if (balanced.length > 0) {
    return {
      kind: "warning",
      warning: `The coupon orientation of ${balanced.join(", ")} is balanced (its mean tensor is isotropic), so the tensors alone give no damage frame: thetaD keeps the starting set's value.`,
    };
  }
  const values = frames.map((f) => ({ name: f.name, thetaD: f.frame.ok ? f.frame.thetaD : 0 }));
  const first = values[0].thetaD;
  // Frames are axial: 89.99° and −89.99° are the same frame.
  const apart = values.some((v) => {
    const gap = Math.abs(v.thetaD - first) % 180;
    return Math.min(gap, 180 - gap) > SAME_FRAME_DEG;
  });
  if (apart) {
    const list = values.map((v) => `${v.name} ${deg(v.thetaD)}`).join(", ");
    return {
      kind: "warning",
      warning: `The chosen records give different damage frames (thetaD = thetaA − φ: ${list}); one set has one frame, so thetaD keeps the starting set's value. Identify records of one frame together.`,
    };
  }
  const f = frames[0].frame;
  const thetaA = f.ok ? f.thetaA : 0;
  const phi = (carrying[0].couponOrientation as CouponOrientation).cutAngle;
  return {
    kind: "frame",
    thetaD: first,
    note: `thetaD = ${deg(first)} from the records' coupon orientation: thetaA ${deg(thetaA)} − cut angle φ ${deg(phi)} (spec A.5)`,
  };
}
