/**
 * A coupon's orientation state as a test record carries it (issue 19 item 3, spec A.5): the cut
 * angle φ from the flow direction and the planar tensor of each layer through the thickness.
 * Messages name the form's labels ("Coupon orientation, layer 2, a12"), not schema paths. Pure.
 */
import { z } from "zod";

import { orientationProblem, principalOf } from "./orientation-tensor";

export const COUPON_ORIENTATION_LABEL = "Coupon orientation";
const layerLabel = (i: number) => `${COUPON_ORIENTATION_LABEL}, layer ${i + 1}`;

const layerSchema = z.strictObject({
  fraction: z.number({ error: "each layer's thickness fraction must be a number" }),
  a11: z.number({ error: "each layer's a11 must be a number" }),
  a12: z.number({ error: "each layer's a12 must be a number" }),
});

export const couponOrientationSchema = z
  .strictObject({
    cutAngle: z
      .number({ error: `${COUPON_ORIENTATION_LABEL}, cut angle φ must be a number in degrees` })
      .min(-180, `${COUPON_ORIENTATION_LABEL}, cut angle φ must lie between −180° and 180°`)
      .max(180, `${COUPON_ORIENTATION_LABEL}, cut angle φ must lie between −180° and 180°`),
    layers: z
      .array(layerSchema)
      .min(1, `${COUPON_ORIENTATION_LABEL}: give at least one layer`)
      .max(50, `${COUPON_ORIENTATION_LABEL}: at most 50 layers`),
  })
  .superRefine((value, ctx) => {
    value.layers.forEach((layer, i) => {
      if (!(layer.fraction > 0 && layer.fraction <= 1)) {
        ctx.addIssue({
          code: "custom",
          path: ["layers", i, "fraction"],
          message: `${layerLabel(i)}, thickness fraction must lie above 0 and at most 1`,
        });
      }
      const problem = orientationProblem(layer);
      if (problem) {
        const field = problem.startsWith("a12") ? "a12" : "a11";
        ctx.addIssue({
          code: "custom",
          path: ["layers", i, field],
          message: `${layerLabel(i)}, ${field}: ${problem}`,
        });
      }
    });
    const sum = value.layers.reduce((acc, l) => acc + l.fraction, 0);
    if (value.layers.length > 0 && Math.abs(sum - 1) > 1e-6) {
      ctx.addIssue({
        code: "custom",
        path: ["layers"],
        message: `${COUPON_ORIENTATION_LABEL}: the layers' thickness fractions add up to ${sum.toPrecision(4)}, not 1`,
      });
    }
  });

export type CouponOrientation = z.output<typeof couponOrientationSchema>;

/** Wraps an angle in degrees into (−90, 90]: a frame and its half turn are the same frame. */
export function wrapFrame(theta: number): number {
  const t = theta - 180 * Math.round(theta / 180);
  return t === -90 ? 90 : t;
}

export type CouponFrame =
  { ok: true; thetaA: number; thetaD: number } | { ok: false; reason: "balanced" };

/**
 * The damage frame in the coupon's load axes, thetaD = thetaA − φ (spec A.5), with thetaA the
 * principal direction of the thickness-weighted tensor: the stack frame of A.5 whenever that
 * tensor is not isotropic, and it needs no ply constants. A balanced stack (isotropic mean
 * tensor) has its frame only from the ply's 4θ stiffness, which a record does not carry.
 */
export function couponFrame(orientation: CouponOrientation): CouponFrame {
  const total = orientation.layers.reduce((acc, l) => acc + l.fraction, 0);
  const mean = orientation.layers.reduce(
    (acc, l) => ({
      a11: acc.a11 + (l.fraction / total) * l.a11,
      a12: acc.a12 + (l.fraction / total) * l.a12,
    }),
    { a11: 0, a12: 0 },
  );
  const principal = principalOf(mean);
  if (!(principal.s > 1e-9)) return { ok: false, reason: "balanced" };
  return {
    ok: true,
    thetaA: principal.thetaA,
    thetaD: wrapFrame(principal.thetaA - orientation.cutAngle),
  };
}

/** The upload form's draft: the section switched on, the cut angle and the layer rows as typed. */
export interface CouponOrientationDraft {
  cutAngle: string;
  layers: { fraction: string; a11: string; a12: string }[];
}

/** The draft as the record stores it, or every problem in the form's words. */
export function readCouponOrientation(
  draft: CouponOrientationDraft,
): { ok: true; value: CouponOrientation } | { ok: false; message: string } {
  const number = (s: string) => (s.trim() === "" ? Number.NaN : Number(s));
  const parsed = couponOrientationSchema.safeParse({
    cutAngle: number(draft.cutAngle),
    layers: draft.layers.map((l) => ({
      fraction: number(l.fraction),
      a11: number(l.a11),
      a12: number(l.a12),
    })),
  });
  if (parsed.success) return { ok: true, value: parsed.data };
  return { ok: false, message: parsed.error.issues.map((i) => i.message).join("; ") };
}
