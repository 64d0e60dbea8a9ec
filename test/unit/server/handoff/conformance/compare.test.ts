import { readFileSync } from "node:fs";
import path from "node:path";

import { beforeAll, describe, expect, it } from "vitest";

import { compareHistory } from "@/lib/server/handoff/conformance/compare";
import { readHistory } from "@/lib/server/handoff/conformance/read-history";
import { replayHistory } from "@/lib/server/handoff/conformance/replay";
import { DEFAULT_TOLERANCE } from "@/lib/server/handoff/conformance/types";
import { runPath } from "@/lib/mechanics/driver";
import { toMaterialParams } from "@/lib/scenario/parameter-set-schema";
import { resultsToCsv } from "@/lib/scenario/results-csv";
import { parseScenarioFile, type Scenario } from "@/lib/scenario/scenario-schema";

let scenario: Scenario;
let driverCsv: string;

beforeAll(() => {
  const file = JSON.parse(
    readFileSync(path.join(process.cwd(), "test/fixtures/demo-scenario.json"), "utf8"),
  );
  const parsed = parseScenarioFile(file);
  if (!parsed.ok) throw new Error(parsed.errors.join("; "));
  scenario = parsed.scenario;
  const run = runPath(toMaterialParams(scenario.parameterSets[0]), scenario.path.legs);
  driverCsv = resultsToCsv(run.columns, run.rows);
});

function check(csv: string) {
  const read = readHistory(csv);
  if (!read.ok) throw new Error(read.error.message);
  const set = scenario.parameterSets[0];
  const replay = replayHistory(toMaterialParams(set), read.history);
  return compareHistory(set.id, read.history, replay.columns, replay.rowOf, DEFAULT_TOLERANCE);
}

/** Adds `delta` to one column from the row whose increment is `from` on. */
function perturb(csv: string, column: string, from: number, delta: number): string {
  const [header, ...rows] = csv.trim().split("\n");
  const index = header.split(",").indexOf(column);
  const out = rows.map((line) => {
    const cells = line.split(",");
    if (Number(cells[0]) >= from) cells[index] = String(Number(cells[index]) + delta);
    return cells.join(",");
  });
  return [header, ...out].join("\n") + "\n";
}

describe("conformance check", () => {
  it("passes a history written by the command-line driver, on every quantity", () => {
    const result = check(driverCsv);
    expect(result.quantities.map((q) => q.quantity)).toEqual([
      "sig11",
      "sig22",
      "sig12",
      "d1",
      "d2",
    ]);
    expect(result.passed).toBe(true);
    expect(result.firstFailIncrement).toBeNull();
    for (const q of result.quantities) expect(q.maxAbs).toBeLessThan(q.tolerance);
  });

  it("fails at the increment where one stress column is perturbed from", () => {
    const peak = check(driverCsv).peakStress;
    const result = check(perturb(driverCsv, "sig11", 137, 0.02 * peak));
    expect(result.passed).toBe(false);
    expect(result.firstFailIncrement).toBe(137);
    const sig11 = result.quantities.find((q) => q.quantity === "sig11")!;
    expect(sig11.firstFailIncrement).toBe(137);
    expect(sig11.maxAbs).toBeGreaterThan(0.019 * peak);
    expect(result.quantities.filter((q) => !q.passed).map((q) => q.quantity)).toEqual(["sig11"]);
  });

  it("fails on damage beyond 0.005 but not within it", () => {
    expect(check(perturb(driverCsv, "d2", 60, 0.004)).passed).toBe(true);
    const result = check(perturb(driverCsv, "d2", 60, 0.006));
    expect(result.firstFailIncrement).toBe(60);
  });

  it("reads decimal commas and semicolons like test records, and names a missing column", () => {
    const european = driverCsv.replace(/,/g, ";").replace(/(\d)\.(\d)/g, "$1,$2");
    expect(check(european).passed).toBe(true);
    const noShear = readHistory("eps11,eps22,sig11,sig22,sig12\n0,0,0,0,0\n");
    expect(noShear.ok).toBe(false);
    if (!noShear.ok) expect(noShear.error.message).toContain("gam12");
    const bad = readHistory("eps11,eps22,gam12,sig11,sig22,sig12\n0,0,0,0,0,0\n0.1,x,0,0,0,0\n");
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.error.message).toMatch(/line 3, column "eps22"/);
  });
});
