import { readFileSync } from "node:fs";
import path from "node:path";

import { describe, expect, it } from "vitest";

import { onsetStrains, standardLoadCases } from "@/lib/server/handoff/bundle/load-cases";
import { runPath } from "@/lib/mechanics/driver";
import { toMaterialParams } from "@/lib/scenario/parameter-set-schema";
import { parseScenarioFile } from "@/lib/scenario/scenario-schema";

const parsed = parseScenarioFile(
  JSON.parse(readFileSync(path.join(process.cwd(), "test/fixtures/demo-scenario.json"), "utf8")),
);
if (!parsed.ok) throw new Error("fixture");
const set = parsed.scenario.parameterSets[0];

describe("standard load cases", () => {
  const cases = standardLoadCases(set);
  const last = (id: string) => {
    const run = runPath(toMaterialParams(set), cases.find((c) => c.id === id)!.legs);
    return { run, row: run.rows - 1 };
  };

  it("are the six cases of the hand-off, each a valid path", () => {
    expect(cases.map((c) => c.id)).toEqual([
      "tension-1",
      "tension-2",
      "compression-1",
      "shear-12",
      "cycles-1",
      "tension-unload-compression-1",
    ]);
  });

  it("reach damage in tension and shear, none in compression (closure)", () => {
    const t = last("tension-1");
    expect(t.run.columns.d1[t.row]).toBeGreaterThan(0);
    expect(t.run.columns.eps11[t.row]).toBeCloseTo(4 * onsetStrains(set).e1, 12);
    const c = last("compression-1");
    expect(c.run.columns.d1[c.row]).toBe(0);
    expect(c.run.columns.sig11[c.row]).toBeLessThan(0);
    const s = last("shear-12");
    expect(Math.max(s.run.columns.d1[s.row], s.run.columns.d2[s.row])).toBeGreaterThan(0);
  });

  it("grow the cycles' amplitude and unload each to zero stress", () => {
    const legs = cases.find((c) => c.id === "cycles-1")!.legs;
    const peaks = legs.filter((l) => l.control[0] === "strain").map((l) => l.target[0]);
    expect(peaks).toEqual([...peaks].sort((a, b) => a - b));
    expect(new Set(peaks).size).toBe(4);
    expect(
      legs
        .filter((l) => l.control.every((k) => k === "stress"))
        .every((l) => l.target.every((v) => v === 0)),
    ).toBe(true);
  });
});
