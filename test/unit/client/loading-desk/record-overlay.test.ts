import { describe, expect, it } from "vitest";
import { overlayAxesOf, recordOverlay } from "@/lib/client/loading-desk/record-overlay";

const points = { strain: [0, 0.001], stress: [0, 10] };

describe("test record as a chart overlay", () => {
  it("puts each test type on its own stress–strain pair", () => {
    expect(overlayAxesOf("tension-1")).toEqual({ x: "eps11", y: "sig11" });
    expect(overlayAxesOf("compression-1")).toEqual({ x: "eps11", y: "sig11" });
    expect(overlayAxesOf("tension-2")).toEqual({ x: "eps22", y: "sig22" });
    expect(overlayAxesOf("shear-12")).toEqual({ x: "gam12", y: "sig12" });
    expect(overlayAxesOf("biaxial")).toBeNull();
    expect(overlayAxesOf("transverse-after-damage-1")).toBeNull();
  });

  it("carries the record's name and points, and nothing for a type without a pair", () => {
    const o = recordOverlay({ id: "r1", name: "T-03", testType: "tension-2", points });
    expect(o).toEqual({
      id: "r1",
      label: "T-03",
      chart: "stress-strain",
      x: "eps22",
      y: "sig22",
      xs: points.strain,
      ys: points.stress,
    });
    expect(recordOverlay({ id: "r2", name: "B", testType: "biaxial", points })).toBeNull();
  });

  it("draws shear from the shear columns when the file mapped them", () => {
    const withShear = { ...points, shearStrain: [0, 0.02], shearStress: [0, 30] };
    const o = recordOverlay({ id: "s", name: "S", testType: "shear-12", points: withShear });
    expect(o?.xs).toEqual([0, 0.02]);
    expect(o?.ys).toEqual([0, 30]);
    const plain = recordOverlay({ id: "s", name: "S", testType: "shear-12", points });
    expect(plain?.xs).toEqual(points.strain);
  });
});
