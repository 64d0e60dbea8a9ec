import { describe, expect, it } from "vitest";

import { identifiedFrame } from "@/lib/calibration/identify-frame";
import {
  couponFrame,
  couponOrientationSchema,
  type CouponOrientation,
} from "@/lib/calibration/micromechanics/coupon-orientation";

// spec A.5: a = [[0.7, 0.2], [0.2, 0.3]] has thetaA = 22.5°.
const tilted: CouponOrientation = { cutAngle: 30, layers: [{ fraction: 1, a11: 0.7, a12: 0.2 }] };
// spec A.5's skin/core/skin stack (0.25/0.5/0.25, skins a11 0.8, core 0.2): balanced.
const balanced: CouponOrientation = {
  cutAngle: 0,
  layers: [
    { fraction: 0.25, a11: 0.8, a12: 0 },
    { fraction: 0.5, a11: 0.2, a12: 0 },
    { fraction: 0.25, a11: 0.8, a12: 0 },
  ],
};

function messageOf(value: unknown): string {
  const r = couponOrientationSchema.safeParse(value);
  if (r.success) throw new Error("expected a refusal");
  return r.error.issues.map((i) => i.message).join("; ");
}

describe("couponOrientationSchema", () => {
  it("takes spec A.5's tensors and stacks", () => {
    expect(couponOrientationSchema.parse(tilted)).toEqual(tilted);
    expect(couponOrientationSchema.parse(balanced)).toEqual(balanced);
  });

  it("refuses a12² > a11·a22, naming the layer and field by its label", () => {
    const bad = { cutAngle: 0, layers: [{ fraction: 1, a11: 0.9, a12: 0.4 }] }; // 0.16 > 0.09
    expect(messageOf(bad)).toBe(
      "Coupon orientation, layer 1, a12: a12² must not exceed a11·a22: no fibre distribution has that tensor",
    );
  });

  it("refuses a11 outside [0, 1] and fractions that do not add up to 1", () => {
    const bad = {
      cutAngle: 0,
      layers: [
        { fraction: 0.5, a11: 1.2, a12: 0 },
        { fraction: 0.3, a11: 0.5, a12: 0 },
      ],
    };
    const m = messageOf(bad);
    expect(m).toContain("Coupon orientation, layer 1, a11: a11 must lie between 0 and 1");
    expect(m).toContain("thickness fractions add up to 0.8000, not 1");
  });

  it("refuses a cut angle beyond ±180°", () => {
    expect(messageOf({ ...tilted, cutAngle: 200 })).toContain("cut angle φ must lie between");
  });
});

describe("couponFrame: thetaD = thetaA − φ (spec A.5)", () => {
  it("gives 22.5° − 30° = −7.5° for the principal-direction example cut at 30°", () => {
    const f = couponFrame(tilted);
    expect(f.ok).toBe(true);
    if (!f.ok) return;
    expect(f.thetaA).toBeCloseTo(22.5, 10);
    expect(f.thetaD).toBeCloseTo(-7.5, 10);
  });

  it("wraps the frame into (−90°, 90°]: a frame and its half turn are one frame", () => {
    const f = couponFrame({ ...tilted, cutAngle: -150 }); // 22.5 + 150 = 172.5 ≡ −7.5
    expect(f.ok && f.thetaD).toBeCloseTo(-7.5, 10);
  });

  it("uses the thickness-weighted tensor of a stack", () => {
    // skins a11 0.9, core 0.5 (random): mean a11 0.7, a12 0 → thetaA 0; cut at 45° → −45°.
    const f = couponFrame({
      cutAngle: 45,
      layers: [
        { fraction: 0.5, a11: 0.9, a12: 0 },
        { fraction: 0.5, a11: 0.5, a12: 0 },
      ],
    });
    expect(f.ok && f.thetaD).toBeCloseTo(-45, 10);
  });

  it("gives no frame for a balanced stack (its mean tensor is isotropic)", () => {
    expect(couponFrame(balanced)).toEqual({ ok: false, reason: "balanced" });
  });
});

describe("identifiedFrame", () => {
  it("says nothing when no record carries an orientation", () => {
    expect(identifiedFrame([{ name: "c1", couponOrientation: null }])).toEqual({ kind: "none" });
  });

  it("uses the common frame with a note naming thetaA and φ", () => {
    const r = identifiedFrame([
      { name: "c1", couponOrientation: tilted },
      // thetaA 0 − φ (7.5°) = −7.5°: the same frame from another coupon
      {
        name: "c2",
        couponOrientation: { cutAngle: 7.5, layers: [{ fraction: 1, a11: 0.8, a12: 0 }] },
      },
    ]);
    expect(r.kind).toBe("frame");
    if (r.kind !== "frame") return;
    expect(r.thetaD).toBeCloseTo(-7.5, 10);
    expect(r.note).toContain("thetaA 22.5° − cut angle φ 30°");
  });

  it("warns instead of mixing records of different frames", () => {
    const r = identifiedFrame([
      { name: "c1", couponOrientation: tilted },
      { name: "c2", couponOrientation: { ...tilted, cutAngle: 0 } },
    ]);
    expect(r.kind).toBe("warning");
    if (r.kind !== "warning") return;
    expect(r.warning).toContain("different damage frames");
    expect(r.warning).toContain("c1 -7.5°, c2 22.5°");
  });

  it("warns when only some records carry an orientation", () => {
    const r = identifiedFrame([
      { name: "c1", couponOrientation: tilted },
      { name: "c2", couponOrientation: null },
    ]);
    expect(r.kind === "warning" && r.warning).toContain("missing on c2");
  });

  it("treats 89.99° and −89.99° as one frame", () => {
    const near = (cutAngle: number): CouponOrientation => ({
      cutAngle,
      layers: [{ fraction: 1, a11: 0.8, a12: 0 }],
    });
    const r = identifiedFrame([
      { name: "c1", couponOrientation: near(-89.99) },
      { name: "c2", couponOrientation: near(89.99) },
    ]);
    expect(r.kind).toBe("frame");
  });
});
