import { readFileSync } from "node:fs";
import path from "node:path";

import { describe, expect, it } from "vitest";

import { parseScenarioFile, type Scenario } from "@/lib/scenario/scenario-schema";
import { diffScenarios } from "@/lib/shared/revision-diff";

const RAW = JSON.parse(
  readFileSync(path.join(process.cwd(), "test/fixtures/demo-scenario.json"), "utf8"),
);

function parse(json: unknown): Scenario {
  const result = parseScenarioFile(json);
  if (!result.ok) throw new Error(result.errors.join("; "));
  return result.scenario;
}

function variant(change: (file: typeof RAW) => void): Scenario {
  const file = structuredClone(RAW);
  change(file);
  return parse(file);
}

describe("diffScenarios", () => {
  it("finds nothing between a file and itself, even when defaults were written out or left off", () => {
    const withoutDefaults = variant((f) => {
      delete f.parameterSets[0].k6;
      delete f.parameterSets[0].dmax;
    });
    const diff = diffScenarios(parse(RAW), withoutDefaults);
    expect(diff.identical).toBe(true);
    expect(diff.parameterSets).toEqual([]);
    expect(diff.path.legs).toEqual([]);
  });

  it("names each changed parameter with both values, and added or removed sets by id", () => {
    const after = variant((f) => {
      f.parameterSets[0].b = 0.4;
      f.parameterSets[0].dcrit = 0.5;
      f.parameterSets.push({ ...f.parameterSets[0], id: "B", label: "stiffer" });
    });
    const diff = diffScenarios(parse(RAW), after);
    expect(diff.identical).toBe(false);
    expect(diff.parameterSets).toEqual([
      {
        id: "A",
        kind: "changed",
        label: "demo SMC (invented values)",
        fields: [
          { field: "b", from: 0.3, to: 0.4 },
          { field: "dcrit", from: 0.45, to: 0.5 },
        ],
      },
      { id: "B", kind: "added", label: "stiffer" },
    ]);
    expect(diffScenarios(after, parse(RAW)).parameterSets[1]).toEqual({
      id: "B",
      kind: "removed",
      label: "stiffer",
    });
  });

  it("compares legs by position and reports counts and total increments", () => {
    const after = variant((f) => {
      f.path.legs[1].increments = 80;
      f.path.legs[2].target = [-0.006, 0, 0];
      f.path.legs.push({
        control: ["strain", "stress", "stress"],
        target: [0.012, 0, 0],
        increments: 40,
      });
    });
    const diff = diffScenarios(parse(RAW), after);
    expect(diff.path.legs).toEqual([
      { index: 1, kind: "changed", fields: [{ field: "increments", from: 50, to: 80 }] },
      {
        index: 2,
        kind: "changed",
        fields: [{ field: "target", from: [-0.005, 0, 0], to: [-0.006, 0, 0] }],
      },
      {
        index: 3,
        kind: "added",
        to: { control: ["strain", "stress", "stress"], target: [0.012, 0, 0], increments: 40 },
      },
    ]);
    expect(diff.path.legCount).toEqual({ from: 3, to: 4 });
    expect(diff.path.totalIncrements).toEqual({ from: 250, to: 320 });
    expect(diff.path.generatorsChanged).toBe(false);
  });

  it("reports a renamed file", () => {
    const diff = diffScenarios(
      parse(RAW),
      variant((f) => (f.name = "Other")),
    );
    expect(diff.name).toEqual({ from: RAW.name, to: "Other" });
    expect(diff.identical).toBe(false);
  });
});
