/** POST /api/v1/orientation's computation: spec A.5's balanced stack through the request shape. */
import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/shared/errors";
import { computeOrientation } from "@/lib/server/handoff/orientation/compute";

const constituents = { Ef: 72000, nuf: 0.22, Em: 3500, num: 0.35, Vf: 0.2, aspect: 100 };
const skin = { fraction: 0.25, a11: 0.8, a12: 0 };
const core = { fraction: 0.5, a11: 0.2, a12: 0 };

describe("orientation request", () => {
  it("answers spec A.5's balanced three-layer stack with the default closure", () => {
    const r = computeOrientation({ ply: { constituents }, layers: [skin, core, skin] });
    expect(r.closure).toBe("exact");
    expect(r.stack.E1 / 9698.2 - 1).toBeLessThan(1e-4);
    expect(Math.abs(r.stack.nu12 / 0.27055 - 1)).toBeLessThan(1e-4);
    expect(r.layers).toHaveLength(3);
    expect(r.layers[1].thetaA).toBeCloseTo(90, 12);
    expect(r.caution).toContain("no design allowable");
    expect(r.couponThetaD).toBeNull();
  });

  it("a coupon cut at φ = 30° from the flow direction has thetaD = thetaA − φ", () => {
    const layer = { fraction: 1, a11: 0.7, a12: 0.2 }; // thetaA = 22.5° (spec A.5)
    const r = computeOrientation({ ply: { constituents }, layers: [layer], cutAngle: 30 });
    expect(r.stack.thetaD).toBeCloseTo(22.5, 12);
    expect(r.couponThetaD).toBeCloseTo(-7.5, 12);
  });

  it("refuses fractions that do not add up to 1 and an impossible tensor, naming the field", () => {
    const bad = (body: unknown) => {
      try {
        computeOrientation(body);
      } catch (e) {
        return e as AppError;
      }
      throw new Error("accepted");
    };
    expect(bad({ ply: { constituents }, layers: [skin, skin] }).message).toMatch(
      /thickness fractions must add up to 1/,
    );
    const e = bad({ ply: { constituents }, layers: [{ fraction: 1, a11: 0.9, a12: 0.4 }] });
    expect(e.message).toMatch(/a12² must not exceed a11·a22/);
    expect(e.field).toBe("layers[0].a12");
  });
});
