/** Refinement by Levenberg–Marquardt over replayed histories: recovery, bounds, cancel, separability. */
import { describe, expect, it } from "vitest";
import { D18_PEAKS, DEMO_PARAMS } from "@/lib/calibration/demo-curves";
import { inseparableParams } from "@/lib/calibration/identifiability";
import { keptOnCancel, refine, type RefineProgress } from "@/lib/calibration/refine";
import type { TestRecordInput } from "@/lib/calibration/types";
import { cyclicRecord } from "./driver-records";

const rel = (x: number, ref: number) => Math.abs(x / ref - 1);
const records: TestRecordInput[] = [
  {
    id: "t1",
    testType: "tension-1",
    points: cyclicRecord(DEMO_PARAMS, "tension-1", D18_PEAKS, { increments: 30 }),
  },
  {
    id: "s",
    testType: "shear-12",
    points: cyclicRecord(DEMO_PARAMS, "shear-12", [0.008, 0.014, 0.02], { increments: 30 }),
  },
];
const perturbed = { ...DEMO_PARAMS, E1: 10000, Y0_1: 0.06, a1: 0.5, alpha: 0.006, k6: 1.3 };

describe("refine", () => {
  it("recovers perturbed parameters from generated records", () => {
    const progress: number[] = [];
    const result = refine(records, perturbed, {
      free: ["E1", "Y0_1", "a1", "alpha", "k6"],
      onProgress: (p) => progress.push(p.rms),
    });
    expect(result.cancelled).toBe(false);
    expect(rel(result.params.E1, 11000)).toBeLessThan(1e-3);
    expect(rel(result.params.Y0_1, 0.05)).toBeLessThan(1e-3);
    expect(rel(result.params.a1, 0.6)).toBeLessThan(1e-3);
    expect(rel(result.params.alpha, 0.005)).toBeLessThan(1e-3);
    expect(rel(result.params.k6, 1)).toBeLessThan(1e-3);
    for (const r of result.residuals) expect(r.rms).toBeLessThan(0.05); // MPa
    expect(progress.length).toBe(result.rounds);
    expect(result.rounds).toBeLessThanOrEqual(12);
    expect(progress[progress.length - 1]).toBeLessThanOrEqual(progress[0]);
    // fixed parameters stay as given
    expect(result.params.nu12).toBe(perturbed.nu12);
    expect(result.params.b).toBe(perturbed.b);
  });

  it("keeps a parameter inside its bounds", () => {
    const result = refine(records.slice(0, 1), perturbed, {
      free: ["a1", "Y0_1"],
      bounds: { a1: [0.3, 0.5] },
    });
    expect(result.params.a1).toBeGreaterThanOrEqual(0.3);
    expect(result.params.a1).toBeLessThanOrEqual(0.5 + 1e-12);
  });

  it("stops when cancelled and still returns usable parameters", () => {
    let calls = 0;
    const result = refine(records, perturbed, {
      free: ["E1", "a1"],
      shouldCancel: () => ++calls > 3,
    });
    expect(result.cancelled).toBe(true);
    expect(result.residuals).toHaveLength(2);
    expect(Number.isFinite(result.params.E1)).toBe(true);
  });

  it("keeps a parameter the records do not depend on and names it, instead of refining it", () => {
    // 0° tension alone: E2 never enters the replayed σ11 (refine-plan.ts, spec B.3/B.4)
    const result = refine(records.slice(0, 1), DEMO_PARAMS, {
      free: ["a1", "E2"],
      isotropic: false,
      maxRounds: 1,
    });
    expect(result.rounds).toBe(1);
    expect(result.free).toEqual(["a1"]);
    expect(result.notInformed).toEqual(["E2"]);
    expect(result.params.E2).toBe(DEMO_PARAMS.E2);
    expect(result.inseparable.some((x) => x.params.includes("E2"))).toBe(false);
  });

  it("refines E2 through E1 when the set is in-plane isotropic", () => {
    const result = refine(records.slice(0, 1), DEMO_PARAMS, { free: ["a1", "E2"], maxRounds: 1 });
    expect(result.free).toEqual(["E1", "a1"]);
    expect(result.notInformed).toEqual([]);
    expect(result.params.E2).toBe(result.params.E1);
  });

  it("skips record types that cannot be replayed and says which", () => {
    const result = refine(
      [
        ...records.slice(0, 1),
        {
          id: "td",
          name: "coupon T after damage",
          testType: "transverse-after-damage-1",
          points: records[0].points,
        },
      ],
      DEMO_PARAMS,
      { free: ["a1"], maxRounds: 1 },
    );
    expect(result.skipped).toEqual(["td"]);
    expect(result.notes).toContainEqual(expect.stringContaining("coupon T after damage"));
  });
});

describe("separability from the Jacobian", () => {
  it("flags two columns that move together, not independent ones", () => {
    const J = Array.from({ length: 20 }, (_, i) => [
      Math.sin(i),
      Math.sin(i) * 1.001 + 1e-4 * Math.cos(i),
      Math.cos(3 * i),
    ]);
    const out = inseparableParams(J, ["p", "q", "r"]);
    expect(out.some((x) => x.params.includes("p") && x.params.includes("q"))).toBe(true);
    expect(out.some((x) => x.params.includes("r"))).toBe(false);
    const independent = Array.from({ length: 20 }, (_, i) => [
      Math.sin(i),
      Math.cos(i),
      Math.cos(3 * i),
    ]);
    expect(inseparableParams(independent, ["p", "q", "r"])).toEqual([]);
  });
});

describe("keptOnCancel", () => {
  it("keeps the best values of the last round reported, which a full run ends on", () => {
    const rounds: RefineProgress[] = [];
    const full = refine(records, perturbed, {
      free: ["E1", "Y0_1", "a1"],
      onProgress: (p) => rounds.push(p),
    });
    const last = rounds[rounds.length - 1];
    // the run's answer is the best of its last round
    expect(last.best.E1).toBe(full.params.E1);
    expect(last.best.a1).toBe(full.params.a1);
    // stopped after the first round, the first round's best is kept, marked cancelled
    const kept = keptOnCancel(records, perturbed, { free: ["E1", "Y0_1", "a1"] }, rounds[0])!;
    expect(kept.params).toEqual(rounds[0].best);
    expect(kept.params.E1).not.toBe(perturbed.E1);
    expect(kept.cancelled).toBe(true);
    expect(kept.rounds).toBe(1);
    expect(kept.free).toEqual(full.free);
    expect(kept.notes[0]).toMatch(/Cancelled after round 1: these are the best values/);
    expect(kept.uncertainty).toBeNull();
  });

  it("keeps nothing when no round had finished", () => {
    expect(keptOnCancel(records, perturbed, { free: ["E1"] }, null)).toBeNull();
  });
});
