/** The cycle generator and its expansion into legs (scenario-file.md: files store both). */
import { describe, expect, it } from "vitest";
import {
  cycleGeneratorSchema,
  expandCycles,
  expandGenerators,
  type CycleGenerator,
} from "@/lib/scenario/cycle-generator";
import { parseScenarioFile } from "@/lib/scenario/scenario-schema";
import { DEMO_LEGS, demoFile } from "./fixtures";

/** Spec D.18's cyclic tension: peaks 0.002 … 0.014, unloading to σ = 0, 60 + 60 increments. */
const D18: CycleGenerator = cycleGeneratorSchema.parse({
  kind: "cycles",
  component: "11",
  peak: { control: "strain", first: 0.002, step: 0.002 },
  count: 7,
  increments: 60,
  unloadTo: { control: "stress", value: 0 },
});

describe("expandCycles", () => {
  it("gives load and unload legs with growing peaks (spec D.18 path)", () => {
    const legs = expandCycles(D18);
    expect(legs).toHaveLength(14);
    expect(legs[0]).toEqual({
      control: ["strain", "stress", "stress"],
      target: [0.002, 0, 0],
      increments: 60,
    });
    expect(legs[1]).toEqual({
      control: ["stress", "stress", "stress"],
      target: [0, 0, 0],
      increments: 60,
    });
    const peaks = legs.filter((_, i) => i % 2 === 0).map((l) => l.target[0]);
    expect(peaks.map((p) => +p.toFixed(12))).toEqual([
      0.002, 0.004, 0.006, 0.008, 0.01, 0.012, 0.014,
    ]);
  });

  it("adds a reverse half and a return to the unload target, on the chosen component", () => {
    const legs = expandCycles({
      ...D18,
      component: "12",
      count: 2,
      peak: { control: "stress", first: 20, step: 10 },
      reverse: { control: "stress", first: -20, step: -10 },
    });
    expect(legs.map((l) => l.target[2])).toEqual([20, 0, -20, 0, 30, 0, -30, 0]);
    expect(legs.every((l) => l.target[0] === 0 && l.target[1] === 0)).toBe(true);
    expect(legs.every((l) => l.control[0] === "stress" && l.control[1] === "stress")).toBe(true);
  });

  it("repeats the same amplitude when step is omitted", () => {
    const gen = cycleGeneratorSchema.parse({
      kind: "cycles",
      component: "22",
      peak: { control: "strain", first: 0.004 },
      count: 3,
      increments: 10,
      unloadTo: { control: "strain", value: 0.001 },
    });
    const legs = expandCycles(gen);
    expect(legs.map((l) => l.target[1])).toEqual([0.004, 0.001, 0.004, 0.001, 0.004, 0.001]);
    expect(legs[1].control).toEqual(["stress", "strain", "stress"]);
  });
});

describe("expandGenerators", () => {
  it("places generators at the index of their first leg among plain legs", () => {
    const { legs, generators } = expandGenerators([
      { leg: DEMO_LEGS[0] },
      { generator: D18 },
      { leg: DEMO_LEGS[2] },
    ]);
    expect(legs).toHaveLength(16);
    expect(generators).toEqual([{ ...D18, firstLeg: 1 }]);
    expect(legs[15]).toEqual(DEMO_LEGS[2]);
  });
});

describe("generators in a scenario file", () => {
  const stored = expandGenerators([{ leg: DEMO_LEGS[0] }, { generator: D18 }]);

  it("accepts a file whose legs are the generator's expansion", () => {
    const result = parseScenarioFile(demoFile({ path: structuredClone(stored) }));
    expect(result.ok).toBe(true);
  });

  it("rejects legs edited without their generator, naming the generator and the leg", () => {
    const path = structuredClone(stored);
    path.legs[4].target[0] = 0.0041;
    const result = parseScenarioFile(demoFile({ path }));
    expect(result.ok ? [] : result.errors).toEqual([
      "path.generators[0]: does not match path.legs[4]; store the expanded legs or remove the generator",
    ]);
  });

  it("rejects a generator that runs past the end of the legs", () => {
    const path = { legs: stored.legs.slice(0, 5), generators: stored.generators };
    const result = parseScenarioFile(demoFile({ path }));
    expect(result.ok ? [] : result.errors).toEqual([
      "path.generators[0]: expands to 14 legs from legs[1], but the path has only 5",
    ]);
  });

  it("validates the generator's own fields with their paths", () => {
    const path = structuredClone(stored) as {
      legs: unknown[];
      generators: Record<string, unknown>[];
    };
    path.generators[0].count = 0;
    path.generators[0].component = "33";
    const result = parseScenarioFile(demoFile({ path }));
    expect(result.ok ? [] : result.errors).toEqual([
      'path.generators[0].component: must be one of "11", "22", "12"',
      "path.generators[0].count: must be an integer in [1, 10000]",
    ]);
  });
});
