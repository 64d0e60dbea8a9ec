import { describe, expect, it } from "vitest";

import { readCurveCsv } from "@/lib/csv/read-curve-csv";
import {
  thinForDisplay,
  toStoredPoints,
  toTestRecordInput,
} from "@/lib/shared/records/stored-points";
import { nameFromFile, uploadTestRecordSchema } from "@/lib/server/records/upload-schema";

const TEXT = "strain,stress,gamma,tau\n0,0,0,0\n0.001,11,0.002,8\n0.002,21,0.004,15\n";

describe("stored points", () => {
  it("round-trips the mapped channels and feeds the shear channels to a shear record", () => {
    const read = readCurveCsv(TEXT, { strain: 0, stress: 1, shearStrain: 2, shearStress: 3 });
    if (!read.ok) throw new Error(read.error.message);
    const stored = toStoredPoints(read.points);
    expect(stored).toEqual({
      strain: [0, 0.001, 0.002],
      stress: [0, 11, 21],
      shearStrain: [0, 0.002, 0.004],
      shearStress: [0, 8, 15],
    });
    const shear = toTestRecordInput({
      id: "r",
      testType: "shear-12",
      orientation: 0,
      points: stored,
    });
    expect(Array.from(shear.points.stress)).toEqual([0, 8, 15]);
    const tension = toTestRecordInput({
      id: "r",
      testType: "tension-1",
      orientation: 30,
      points: stored,
    });
    expect(Array.from(tension.points.stress)).toEqual([0, 11, 21]);
    expect(tension.orientation).toBe(30);
    expect(tension.name).toBeUndefined();
    const named = toTestRecordInput({
      id: "r",
      name: "coupon B",
      testType: "tension-1",
      orientation: 0,
      points: stored,
    });
    expect(named.name).toBe("coupon B"); // the fit's notes name records by it
  });

  it("thins a long curve to at most the asked number of points", () => {
    const n = 10_001;
    const a = Array.from({ length: n }, (_, i) => i);
    const { x, y } = thinForDisplay(a, a, 2000);
    expect(x.length).toBeLessThanOrEqual(2000);
    expect(x[1] - x[0]).toBe(6);
    expect(y).toEqual(x);
  });
});

describe("upload body", () => {
  it("names a record after its file and refuses a missing specimen id", () => {
    expect(nameFromFile("coupon-3.csv")).toBe("coupon-3");
    expect(nameFromFile("noext")).toBe("noext");
    const bad = uploadTestRecordSchema.safeParse({
      fileName: "a.csv",
      text: "x",
      mapping: { strain: 0, stress: 1 },
      meta: { testType: "tension-1", loading: "cyclic", specimenId: "" },
    });
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0].message).toBe("give the specimen an id");
  });
});
