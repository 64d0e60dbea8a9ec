import { readFileSync } from "node:fs";
import path from "node:path";

import { describe, expect, it } from "vitest";

import { runPath } from "@/lib/mechanics/driver";
import { budgetedRunner, CHUNK_INCREMENTS } from "@/lib/server/handoff/runs/budgeted-runner";
import { readRunRequest } from "@/lib/server/handoff/runs/run-request";
import { runScenario } from "@/lib/server/handoff/runs/run-scenario";
import { resultsToCsv } from "@/lib/scenario/results-csv";
import { toMaterialParams } from "@/lib/scenario/parameter-set-schema";
import { parseScenarioFile } from "@/lib/scenario/scenario-schema";

const demo = JSON.parse(
  readFileSync(path.join(process.cwd(), "test/fixtures/demo-scenario.json"), "utf8"),
);

function longPath(increments: number) {
  const file = structuredClone(demo);
  file.path.legs = [{ control: ["strain", "stress", "stress"], target: [0.001, 0, 0], increments }];
  return file;
}

describe("runScenario", () => {
  it("answers the contract's CSV of the first set", () => {
    const parsed = parseScenarioFile(demo);
    if (!parsed.ok) throw new Error(parsed.errors.join("; "));
    const set = parsed.scenario.parameterSets[0];
    const direct = runPath(toMaterialParams(set), parsed.scenario.path.legs);
    const out = runScenario(readRunRequest(demo, {}, null), runPath);
    expect(out.chunks.join("")).toBe(resultsToCsv(direct.columns, direct.rows));
  });

  it("gives up with invalid:time-budget once the clock passes the budget", () => {
    let now = 0;
    const clock = () => (now += 1000); // every look at the clock costs one second
    const request = readRunRequest(longPath(CHUNK_INCREMENTS * 4), {}, null);
    expect(() => runScenario(request, budgetedRunner(2500, clock))).toThrow(
      expect.objectContaining({ code: "invalid:time-budget" }),
    );
  });

  it("finishes a run that stays inside the budget", () => {
    let now = 0;
    const clock = () => (now += 1);
    const request = readRunRequest(longPath(CHUNK_INCREMENTS * 2), {}, null);
    const out = runScenario(request, budgetedRunner(1000, clock));
    expect(out.chunks.join("").trim().split("\n")).toHaveLength(CHUNK_INCREMENTS * 2 + 2);
  });
});

describe("readRunRequest", () => {
  it("takes the format from the wrapper, then the query, then Accept, else CSV", () => {
    expect(readRunRequest({ scenario: demo, format: "json" }, { format: "csv" }, null).format).toBe(
      "json",
    );
    expect(readRunRequest(demo, { format: "json" }, "text/csv").format).toBe("json");
    expect(readRunRequest(demo, {}, "application/json").format).toBe("json");
    expect(readRunRequest(demo, {}, "*/*").format).toBe("csv");
  });

  it("rejects more than 1,000,000 increments before validating", () => {
    expect(() => readRunRequest(longPath(1_000_001), {}, null)).toThrow(
      expect.objectContaining({ code: "invalid:too-large" }),
    );
  });

  it("rejects a wrapper with unknown fields and a body that is not an object", () => {
    expect(() => readRunRequest({ scenario: demo, sett: "A" }, {}, null)).toThrow();
    expect(() => readRunRequest([demo], {}, null)).toThrow(
      expect.objectContaining({ code: "invalid:body" }),
    );
  });
});
