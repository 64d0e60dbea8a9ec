/**
 * Failure behaviour (spec C.7, scenario-file.md "Details this contract fixes"), chunked runs and
 * bad input. Pathological inputs must end in a state, never an exception or an endless loop.
 */
import { describe, expect, it } from "vitest";
import { PathRun, runPath } from "@/lib/mechanics/driver";
import { BYTES_PER_ROW } from "@/lib/mechanics/result-columns";
import { RESULT_COLUMNS, type MaterialParams } from "@/lib/mechanics/types";
import { MechanicsInputError } from "@/lib/mechanics/validate";
import { DEMO, E, S, expectRel, last, leg, run, uniaxial } from "./helpers";

const U = uniaxial(DEMO);

describe("limit load under stress control (spec C.7)", () => {
  it("beyond the peak: rows stop at the failing increment, which shows the last converged sub-step", () => {
    const r = run({}, [leg([S, S, S], [60, 0, 0], 10), leg([S, S, S], [90, 0, 0], 30)]);
    const n = last(r);
    expect(r.status).toMatchObject({ failed: true, failMode: "limit load", stoppedAtIncrement: n });
    // steps count user increments without gaps; leg is 1-based
    for (let i = 0; i <= n; i++) expect(r.columns.increment[i]).toBe(i);
    expect(r.columns.leg[0]).toBe(0);
    expect(r.columns.leg[5]).toBe(1);
    expect(r.columns.leg[n]).toBe(2);
    expect(Array.from(r.columns.failed.subarray(0, n))).not.toContain(1);
    expect(r.columns.failed[n]).toBe(1);
    // the peak lies between 79 and 80 MPa (increments of 1 MPa): the row stops just below it,
    // at a stress that is not a user target (a converged sub-step)
    expect(r.columns.sig11[n]).toBeLessThanOrEqual(U.sigMax + 1e-9);
    expect(r.columns.sig11[n]).toBeGreaterThan(79);
    expect(r.columns.sig11[n - 1]).toBe(79);
    expect(n).toBe(10 + 20);
    expectRel(r.columns.d1[n], U.dOfSig(r.columns.sig11[n]), 1e-6);
  });

  it("mixed control: 'limit load' when any component is stress-controlled", () => {
    const r = run({}, [leg([S, E, S], [85, 0, 0], 20)]);
    expect(r.status.failMode).toBe("limit load");
    expect(r.columns.failed[last(r)]).toBe(1);
  });
});

describe("no convergence under full strain control (spec C.7)", () => {
  it("a strain jump too large even at hmin = 2^-12: 'no convergence', last converged sub-step", () => {
    const r = run({}, [leg([E, E, E], [0.001, 0, 0], 2), leg([E, E, E], [10, 0, 0], 1)]);
    const n = last(r);
    expect(n).toBe(3);
    expect(r.status).toMatchObject({
      failed: true,
      failMode: "no convergence",
      stoppedAtIncrement: 3,
    });
    expect(r.columns.failed[n]).toBe(1);
    expect(r.columns.failed[n - 1]).toBe(0);
    // the row is a converged sub-step on the 2^-12 grid of the increment, short of the target
    const f = ((r.columns.eps11[n] - 0.001) / (10 - 0.001)) * 4096;
    expect(Math.abs(f - Math.round(f))).toBeLessThan(1e-6);
    expect(r.columns.eps11[n]).toBeLessThan(10);
  });
});

describe("dcrit and onFailure (spec B.6, C.7)", () => {
  it("'stop': the path ends with the row where d reaches dcrit, failed = 1", () => {
    const r = run({}, [leg([E, S, S], [0.02, 0, 0], 200), leg([E, S, S], [0, 0, 0], 10)]);
    const n = last(r);
    expect(r.status.failMode).toBe("dcrit axis 1");
    expect(r.status.stoppedAtIncrement).toBe(n);
    expect(r.columns.d1[n]).toBeGreaterThanOrEqual(DEMO.dcrit);
    expect(r.columns.d1[n]).toBeLessThan(DEMO.dmax);
    expect(n).toBeLessThan(200);
  });

  it("loading along axis 2 fails as 'dcrit axis 2'", () => {
    const r = run({}, [leg([S, E, S], [0, 0.02, 0], 200)]);
    expect(r.status.failMode).toBe("dcrit axis 2");
    expect(r.columns.d2[last(r)]).toBeGreaterThanOrEqual(DEMO.dcrit);
  });

  it("'continue': the failing row already shows dmax, failed stays 1, the path goes on", () => {
    const legs = [leg([E, S, S], [0.02, 0, 0], 200), leg([E, S, S], [-0.01, 0, 0], 100)];
    const r = run({ onFailure: "continue" }, legs);
    const c = r.columns;
    const n = last(r);
    expect(n).toBe(300);
    expect(r.status.failed).toBe(true);
    expect(r.status.failMode).toBe("dcrit axis 1");
    expect(r.status.stoppedAtIncrement).toBeNull();
    const k = Array.from(c.failed).indexOf(1);
    expect(k).toBeGreaterThan(0);
    expect(c.d1[k - 1]).toBeLessThan(DEMO.dcrit);
    expect(c.d1[k]).toBe(DEMO.dmax);
    // the family breaks (C.7): dp1 keeps its value at dcrit (no jump with d1)
    expect(c.dp1[k]).toBeGreaterThanOrEqual(DEMO.dcrit);
    expect(c.dp1[k]).toBeLessThan(DEMO.dcrit + 0.05);
    // stress re-solved at the same prescribed strain: sig = E(1 − dmax)(eps − alpha·dp1)
    expectRel(c.sig11[k], DEMO.E1 * (1 - DEMO.dmax) * (c.eps11[k] - DEMO.alpha * c.dp1[k]), 1e-9);
    for (let i = k; i <= n; i++) expect(c.failed[i]).toBe(1);
    // the point still carries compression (unilateral recovery): sig = E·(eps − alpha·dp1)
    expectRel(c.sig11[n], DEMO.E1 * (-0.01 - DEMO.alpha * c.dp1[n]), 1e-9);
  });
});

describe("chunked runs", () => {
  const legs = [
    leg([E, S, S], [0.01, 0, 0], 100),
    leg([S, S, S], [0, 0, 0], 50),
    leg([E, S, S], [-0.005, 0, 0], 100),
  ];

  it("advance(n) in chunks gives the same rows as one run", () => {
    const whole = runPath(DEMO, legs);
    const chunked = new PathRun(DEMO, legs);
    let calls = 0;
    while (!chunked.done && calls < 1000) {
      chunked.advance(7);
      calls++;
    }
    expect(chunked.rows).toBe(whole.rows);
    for (const name of RESULT_COLUMNS) {
      expect(Array.from(chunked.columns[name].subarray(0, chunked.rows))).toEqual(
        Array.from(whole.columns[name].subarray(0, whole.rows)),
      );
    }
    expect(chunked.sliceRows(10, 20).eps11.length).toBe(10);
  });

  it("cancel stops between chunks; rows so far stay valid", () => {
    const r = new PathRun(DEMO, legs);
    expect(r.advance(30)).toBe(30);
    r.cancel();
    expect(r.advance(30)).toBe(0);
    expect(r.rows).toBe(31);
    expect(r.done).toBe(true);
  });

  it("stores 24 Float64 columns: 192 bytes per increment", () => {
    expect(BYTES_PER_ROW).toBe(192);
    const r = new PathRun(DEMO, legs);
    const bytes = RESULT_COLUMNS.reduce((s, n) => s + r.columns[n].byteLength, 0);
    expect(bytes / (r.totalIncrements + 1)).toBe(192);
  });
});

describe("pathological parameters and paths never throw nor hang", () => {
  const extreme: Partial<MaterialParams>[] = [
    {
      a1: 4.4,
      a2: 4.4,
      b: 1,
      k6: 3,
      alpha: 0.05,
      beta: 0.05,
      dmax: 0.999,
      dcrit: 0.998,
      onFailure: "continue",
    },
    { law: "linY", a1: 9.9, a2: 9.9, b: 1, k6: 0, dcrit: 0.95, onFailure: "continue" },
    {
      E1: 200000,
      E2: 1000,
      nu12: 0.3,
      G12: 50,
      thetaD: 37,
      b: 0,
      alpha: 0,
      beta: 0.05,
      onFailure: "continue",
    },
    { frame: "onset", b: 1, k6: 3, onFailure: "continue", Xc: 1 },
  ];
  const paths = [
    [leg([E, E, E], [1, -1, 2], 7), leg([E, E, E], [-1, 1, -2], 3)],
    [leg([S, S, S], [1e6, -1e6, 1e6], 5)],
    [leg([S, E, S], [0, 0.5, 300], 4), leg([E, S, E], [0.3, 0, -0.3], 4)],
    [
      leg([E, S, S], [0.05, 0, 0], 1),
      leg([S, S, S], [0, 0, 0], 1),
      leg([E, E, S], [0.2, 0.2, 0], 2),
    ],
  ];
  it.each(extreme.map((p, i) => [i, p]))(
    "parameter set %i on every path ends in a state",
    (_, p) => {
      for (const legs of paths) {
        const r = run(p, legs);
        expect(r.rows).toBeGreaterThan(0);
        const n = last(r);
        for (const name of RESULT_COLUMNS) expect(Number.isFinite(r.columns[name][n])).toBe(true);
        if (r.status.failed)
          expect(r.status.failMode).toMatch(/^(dcrit axis [12]|limit load|no convergence)$/);
        expect(r.columns.d1[n]).toBeLessThanOrEqual(p.dmax ?? DEMO.dmax);
      }
    },
  );
});

describe("bad input is rejected with a message naming the field", () => {
  it.each([
    [{ a1: 5 }, /^a1: must be > 0 and a1·sqrt\(Y0_1\) < 1/],
    [{ E2: Number.NaN }, /E2: must be a finite number/],
    [{ nu12: 2 }, /nu12: must satisfy/],
    [{ dcrit: 0.995 }, /dcrit: must be in \(0, dmax\)/],
    [{ frame: "onset" as const, E2: 9000 }, /frame: 'onset' needs an isotropic material/],
    [{ b: 1.5 }, /b: must be in \[0, 1\]/],
  ])("%o", (p, msg) => {
    expect(() => run(p, [leg([E, S, S], [0.01, 0, 0], 10)])).toThrow(MechanicsInputError);
    expect(() => run(p, [leg([E, S, S], [0.01, 0, 0], 10)])).toThrow(msg);
  });

  it("empty path, zero increments, non-finite target, too many increments", () => {
    expect(() => run({}, [])).toThrow(/legs: the path is empty/);
    expect(() => run({}, [leg([E, S, S], [0.01, 0, 0], 0)])).toThrow(/legs\[0\]\.increments/);
    expect(() => run({}, [leg([E, S, S], [Number.NaN, 0, 0], 3)])).toThrow(
      /legs\[0\]\.target\[0\]/,
    );
    expect(() => run({}, [leg([E, S, S], [0.01, 0, 0], 1_000_001)])).toThrow(/at most 1000000/);
  });
});
