/** Spec E.2–E.3 on hand-built loops: turning points, moduli, residual strain, partial, hysteresis. */
import { describe, expect, it } from "vitest";
import { initialModulus } from "@/lib/calibration/initial-modulus";
import { measureLoops } from "@/lib/calibration/loop-moduli";
import { findTurningPoints } from "@/lib/calibration/turning-points";

/** Piecewise-linear strain–stress path through corner points (ε, σ), n samples per piece. */
function path(corners: [number, number][], n = 40) {
  const e: number[] = [corners[0][0]];
  const s: number[] = [corners[0][1]];
  for (let c = 1; c < corners.length; c++) {
    const [e0, s0] = corners[c - 1];
    const [e1, s1] = corners[c];
    for (let k = 1; k <= n; k++) {
      e.push(e0 + ((e1 - e0) * k) / n);
      s.push(s0 + ((s1 - s0) * k) / n);
    }
  }
  return { strain: Float64Array.from(e), stress: Float64Array.from(s) };
}

describe("turning points (spec E.2)", () => {
  it("finds peaks and valleys, closes the last loop at the end of the data", () => {
    const { strain } = path(
      [
        [0, 0],
        [0.004, 0],
        [0.001, 0],
        [0.008, 0],
        [0.002, 0],
      ],
      20,
    );
    expect(findTurningPoints(strain, 0)).toEqual({ peaks: [20, 60], valleys: [40, 80] });
  });
  it("ignores wiggles smaller than the hysteresis", () => {
    const { strain } = path(
      [
        [0, 0],
        [0.004, 0],
        [0.00397, 0],
        [0.0041, 0],
        [0.001, 0],
      ],
      20,
    );
    const turns = findTurningPoints(strain, 0);
    expect(turns.peaks).toEqual([60]);
  });
});

describe("loop moduli (spec E.3)", () => {
  // Loop: load 0 → (0.01, 72), unload with E = 8000 to σ = 0, reload with the same slope.
  const epsR = 0.01 - 72 / 8000;
  const data = path([
    [0, 0],
    [0.01, 72],
    [epsR, 0],
    [0.01, 72],
    [0.012, 80],
    [0.012 - 80 / 7000, 0],
  ]);
  const turns = findTurningPoints(data.strain, 0);

  it("unloading modulus, residual strain at zero stress, R²", () => {
    const { loops } = measureLoops(data.strain, data.stress, turns);
    expect(loops).toHaveLength(2);
    expect(loops[0].E).toBeCloseTo(8000, 6);
    expect(loops[0].epsR).toBeCloseTo(epsR, 12);
    expect(loops[0].r2).toBeCloseTo(1, 10);
    expect(loops[0].reloadE).toBeCloseTo(8000, 6);
    expect(loops[0].hysteresis).toBe(false);
    expect(loops[1].E).toBeCloseTo(7000, 6);
  });

  it("partial unloading uses the inner window and the intercept", () => {
    const partial = path([
      [0, 0],
      [0.01, 80],
      [0.01 - 50 / 8000, 30],
      [0.013, 85],
      [0.013 - 85 / 7000, 0],
    ]);
    const { loops } = measureLoops(
      partial.strain,
      partial.stress,
      findTurningPoints(partial.strain, 0),
    );
    expect(loops[0].partial).toBe(true);
    expect(loops[0].E).toBeCloseTo(8000, 6);
    expect(loops[0].epsR).toBeCloseTo(0.01 - 80 / 8000, 10);
  });

  it("rejects a loop whose unloading is below 0.3·σmax", () => {
    const shallow = path([
      [0, 0],
      [0.01, 80],
      [0.01 - 20 / 8000, 60],
      [0.013, 85],
      [0.013 - 85 / 7000, 0],
    ]);
    const { loops, rejected } = measureLoops(
      shallow.strain,
      shallow.stress,
      findTurningPoints(shallow.strain, 0),
    );
    expect(rejected.map((r) => r.reason)).toEqual(["unloading amplitude below 0.3·σmax"]);
    expect(loops).toHaveLength(1);
  });

  it("hysteresis: reloading 25 % stiffer reports the chord modulus", () => {
    const e1 = 0.01 - 72 / 8000;
    const hyst = path([
      [0, 0],
      [0.01, 72],
      [e1, 0],
      [e1 + 72 / 10000, 72],
      [0.014, 90],
      [0.006, 0],
    ]);
    const { loops } = measureLoops(hyst.strain, hyst.stress, findTurningPoints(hyst.strain, 0));
    expect(loops[0].hysteresis).toBe(true);
    expect(loops[0].reloadE).toBeCloseTo(10000, 4);
    expect(loops[0].chordE).toBeCloseTo(8000, 6);
  });
});

describe("undamaged modulus E0 (spec E.3)", () => {
  it("prefers sub-knee loops that agree with the ramp", () => {
    const data = path([
      [0, 0],
      [0.002, 22],
      [0, 0],
      [0.004, 40],
      [0.004 - 40 / 10000, 0],
      [0.006, 50],
      [0.006 - 50 / 9000, 0],
    ]);
    const { loops } = measureLoops(data.strain, data.stress, findTurningPoints(data.strain, 0));
    const E0 = initialModulus(data.strain, data.stress, loops);
    expect(E0).toMatchObject({ source: "sub-knee loops", loopsUsed: 1 });
    expect(E0?.E0).toBeCloseTo(11000, 6);
  });
  it("falls back to the first ramp when loop 1 is already damaged", () => {
    // elastic to 33 MPa at 11000, then softening to the peak, unloading at 9000
    const data = path([
      [0, 0],
      [0.003, 33],
      [0.006, 50],
      [0.006 - 50 / 9000, 0],
      [0.009, 60],
      [0.009 - 60 / 8000, 0],
    ]);
    const { loops } = measureLoops(data.strain, data.stress, findTurningPoints(data.strain, 0));
    const E0 = initialModulus(data.strain, data.stress, loops);
    expect(E0?.source).toBe("first ramp");
    expect(E0?.E0).toBeCloseTo(11000, 6);
  });
});
