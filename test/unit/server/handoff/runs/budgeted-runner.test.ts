import { readFileSync } from "node:fs";
import path from "node:path";

import { describe, expect, it } from "vitest";

import { runPath } from "@/lib/mechanics/driver";
import { resultsToCsv } from "@/lib/scenario/results-csv";
import { toMaterialParams } from "@/lib/scenario/parameter-set-schema";
import { runScenarioFile } from "@/lib/scenario/run-scenario-file";
import { parseScenarioFile } from "@/lib/scenario/scenario-schema";
import {
  budgetedRunner,
  CHUNK_INCREMENTS,
  TimeBudgetExceeded,
} from "@/lib/server/handoff/runs/budgeted-runner";

const demo = JSON.parse(
  readFileSync(path.join(process.cwd(), "test/fixtures/demo-scenario.json"), "utf8"),
);

function longPath(increments: number) {
  const file = structuredClone(demo);
  file.path.legs = [{ control: ["strain", "stress", "stress"], target: [0.001, 0, 0], increments }];
  return file;
}

function runWith(file: unknown, runner: ReturnType<typeof budgetedRunner>) {
  const out: string[] = [];
  const outcome = runScenarioFile(
    file,
    { setId: null, format: "csv", fileName: "body" },
    runner,
    (text) => void out.push(text),
  );
  return { outcome, text: out.join("") };
}

describe("the budgeted runner through the one run function", () => {
  it("gives the same CSV as the core run directly while inside the budget", () => {
    const parsed = parseScenarioFile(demo);
    if (!parsed.ok) throw new Error(parsed.errors.join("; "));
    const direct = runPath(
      toMaterialParams(parsed.scenario.parameterSets[0]),
      parsed.scenario.path.legs,
    );
    const { outcome, text } = runWith(demo, budgetedRunner(60_000));
    expect(outcome.kind).toBe("ok");
    expect(text).toBe(resultsToCsv(direct.columns, direct.rows));
  });

  it("stops the run with TimeBudgetExceeded once the clock passes the budget", () => {
    let now = 0;
    const clock = () => (now += 1000); // every look at the clock costs one second
    expect(() => runWith(longPath(CHUNK_INCREMENTS * 4), budgetedRunner(2500, clock))).toThrow(
      TimeBudgetExceeded,
    );
  });

  it("finishes a run that stays inside the budget", () => {
    let now = 0;
    const clock = () => (now += 1);
    const { text } = runWith(longPath(CHUNK_INCREMENTS * 2), budgetedRunner(1000, clock));
    expect(text.trim().split("\n")).toHaveLength(CHUNK_INCREMENTS * 2 + 2);
  });
});
