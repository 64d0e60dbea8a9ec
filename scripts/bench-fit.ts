/**
 * Speed of the fitting code (issue 6; not a timed test): identification of a 10-loop,
 * 5,000-point record (target < 200 ms) and refinement of 6 free parameters on 3 records ×
 * 2,000 points (target < 5 s), and the uncertainty of the refined values on the same records
 * (standard errors, intervals, correlations; refine + uncertainty < 5 s). All data invented
 * (spec A.3 demo set). Last line: `bench:fit: identify=<ms> refine=<ms> uncertainty=<ms>`.
 */
import { DEMO_PARAMS, demoCyclicTension } from "@/lib/calibration/demo-curves";
import { identify } from "@/lib/calibration/identify";
import { refine, uncertaintyAt } from "@/lib/calibration/refine";
import type { RecordPoints, TestRecordInput } from "@/lib/calibration/types";
import { runPath } from "@/lib/mechanics/driver";
import type { Leg } from "@/lib/mechanics/types";

function cyclic(
  control: Leg["control"],
  at: (v: number) => Leg["target"],
  peaks: number[],
  n: number,
  pick: ["eps11" | "gam12", "sig11" | "sig12"],
): RecordPoints {
  const legs: Leg[] = peaks.flatMap((peak) => [
    { control, target: at(peak), increments: n },
    { control: ["stress", "stress", "stress"], target: [0, 0, 0], increments: n },
  ]);
  const run = runPath(DEMO_PARAMS, legs);
  return {
    strain: run.columns[pick[0]].slice(0, run.rows),
    stress: run.columns[pick[1]].slice(0, run.rows),
  };
}

const tenLoops = demoCyclicTension(DEMO_PARAMS, {
  peaks: Array.from({ length: 10 }, (_, k) => 0.0015 * (k + 1)),
  increments: 250,
  noiseStress: 0.05,
  noiseStrain: 5e-6,
});
let t = performance.now();
const id = identify([{ id: "ten", testType: "tension-1", points: tenLoops }], {
  base: DEMO_PARAMS,
});
const identifyMs = performance.now() - t;
console.log(
  `identify: ${tenLoops.strain.length} points, ${id.records[0].loops.length} loops, a1 = ${id.params.a1.toFixed(4)}, Y0_1 = ${id.params.Y0_1.toFixed(4)}, ${identifyMs.toFixed(0)} ms`,
);

const records: TestRecordInput[] = [
  {
    id: "tension",
    testType: "tension-1",
    points: demoCyclicTension(DEMO_PARAMS, { increments: 143, noiseStress: 0.05, seed: 2 }),
  },
  {
    id: "shear",
    testType: "shear-12",
    points: cyclic(
      ["stress", "stress", "strain"],
      (v) => [0, 0, v],
      [0.006, 0.01, 0.014, 0.018, 0.022],
      200,
      ["gam12", "sig12"],
    ),
  },
  {
    id: "biaxial",
    testType: "biaxial",
    points: cyclic(
      ["strain", "strain", "stress"],
      (v) => [v, v, 0],
      [0.002, 0.004, 0.006, 0.008, 0.01],
      200,
      ["eps11", "sig11"],
    ),
  },
];
const start = { ...DEMO_PARAMS, E1: 10000, Y0_1: 0.06, a1: 0.5, alpha: 0.006, k6: 1.4, b: 0.5 };
t = performance.now();
const fit = refine(records, start, { free: ["E1", "Y0_1", "a1", "alpha", "k6", "b"] });
const refineMs = performance.now() - t;
const p = fit.params;
console.log(
  `refine: ${records.map((r) => r.points.strain.length).join(" + ")} points, ${fit.evaluations} replays, E1 = ${p.E1.toFixed(1)}, Y0_1 = ${p.Y0_1.toFixed(4)}, a1 = ${p.a1.toFixed(4)}, alpha = ${p.alpha.toFixed(5)}, k6 = ${p.k6.toFixed(3)}, b = ${p.b.toFixed(3)}`,
);
console.log(
  `refine: RMS per record ${fit.residuals.map((r) => `${r.id} ${r.rms.toFixed(3)} MPa`).join(", ")}`,
);
const free = ["E1", "Y0_1", "a1", "alpha", "k6", "b"] as const;
t = performance.now();
const sure = uncertaintyAt(records, fit.params, { free: [...free] });
const uncertaintyMs = performance.now() - t;
console.log(
  `uncertainty: ${(sure?.params ?? []).map((q) => `${q.name} ± ${q.se?.toPrecision(2) ?? "—"}`).join(", ")}`,
);
console.log(
  `bench:fit: identify=${identifyMs.toFixed(0)} refine=${refineMs.toFixed(0)} uncertainty=${uncertaintyMs.toFixed(0)}`,
);
