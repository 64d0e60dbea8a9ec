/** The scenario file as a whole (scenario-file.md "File", "Validation", "Details this contract fixes"). */
import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { defaultSetId, parseScenarioFile, SCENARIO_FORMAT } from "@/lib/scenario/scenario-schema";
import { formatJsonPath } from "@/lib/scenario/issue-messages";
import { DEMO_REQUIRED, demoFile } from "./fixtures";

const errorsOf = (json: unknown) => {
  const result = parseScenarioFile(json);
  return result.ok ? [] : result.errors;
};

describe("scenario file", () => {
  it("reads the contract's example file (test/fixtures/demo-scenario.json)", () => {
    const file = path.resolve(__dirname, "../../fixtures/demo-scenario.json");
    const result = parseScenarioFile(JSON.parse(readFileSync(file, "utf8")));
    if (!result.ok) throw new Error(result.errors.join("\n"));
    expect(result.scenario.parameterSets[0]).toMatchObject({
      id: "A",
      label: "demo SMC (invented values)",
    });
    expect(result.scenario.path.legs).toHaveLength(3);
  });

  it.each([["craquelure.scenario/2"], ["craquelure.scenario/1 "], [1]])(
    "rejects format %j",
    (format) => {
      expect(errorsOf(demoFile({ format }))).toEqual([
        `format: unknown format ${JSON.stringify(format)}; this version reads "${SCENARIO_FORMAT}"`,
      ]);
    },
  );

  it("rejects a file without format, and reports only that for a foreign format", () => {
    const { format: _format, ...rest } = demoFile();
    expect(errorsOf(rest)).toEqual([`format: required; this version reads "${SCENARIO_FORMAT}"`]);
    expect(errorsOf({ format: "other/3", parameterSets: 5 })).toHaveLength(1);
  });

  it.each([[null], [[]], ["text"], [42]])("rejects %j as a whole file", (json) => {
    expect(errorsOf(json)).toEqual(["(file): must be a JSON object"]);
  });

  it("needs at least one parameter set", () => {
    expect(errorsOf(demoFile({ parameterSets: [] }))).toEqual([
      "parameterSets: must contain at least one parameter set",
    ]);
  });

  it("assigns ids A, B, … by position where they are missing", () => {
    const result = parseScenarioFile(
      demoFile({
        parameterSets: [
          { ...DEMO_REQUIRED },
          { ...DEMO_REQUIRED, id: "stiff" },
          { ...DEMO_REQUIRED },
        ],
      }),
    );
    expect(result.ok && result.scenario.parameterSets.map((s) => s.id)).toEqual([
      "A",
      "stiff",
      "C",
    ]);
  });

  it("rejects duplicate ids, also when a default id collides", () => {
    expect(
      errorsOf(
        demoFile({
          parameterSets: [
            { ...DEMO_REQUIRED, id: "X" },
            { ...DEMO_REQUIRED, id: "X" },
          ],
        }),
      ),
    ).toEqual([
      'parameterSets[1].id: duplicate id "X" (also parameterSets[0]; ids default to A, B, … by position)',
    ]);
    const collide = errorsOf(
      demoFile({ parameterSets: [{ ...DEMO_REQUIRED, id: "B" }, { ...DEMO_REQUIRED }] }),
    );
    expect(collide).toHaveLength(1);
    expect(collide[0]).toMatch(/^parameterSets\[1\]\.id: duplicate id "B"/);
  });

  it("rejects an empty id", () => {
    expect(errorsOf(demoFile({ parameterSets: [{ ...DEMO_REQUIRED, id: " " }] }))).toEqual([
      "parameterSets[0].id: must not be empty",
    ]);
  });

  it("names the set's position in every message", () => {
    const errors = errorsOf(
      demoFile({ parameterSets: [{ ...DEMO_REQUIRED }, { ...DEMO_REQUIRED, a1: 0 }] }),
    );
    expect(errors).toEqual(["parameterSets[1].a1: must be > 0 and a1·sqrt(Y0_1) < 1"]);
  });

  it("limits label and name lengths with a message that says so", () => {
    const long = "x".repeat(501);
    expect(
      errorsOf(demoFile({ name: long, parameterSets: [{ ...DEMO_REQUIRED, label: long }] })),
    ).toEqual([
      "name: must be at most 500 characters",
      "parameterSets[0].label: must be at most 200 characters",
    ]);
  });

  it("ignores unknown top-level fields (room for editor metadata)", () => {
    expect(errorsOf(demoFile({ chart: { x: "eps11" } }))).toEqual([]);
  });
});

describe("helpers", () => {
  it("numbers default ids like spreadsheet columns", () => {
    expect([0, 1, 25, 26, 27, 51, 52, 701, 702].map(defaultSetId)).toEqual([
      "A",
      "B",
      "Z",
      "AA",
      "AB",
      "AZ",
      "BA",
      "ZZ",
      "AAA",
    ]);
  });

  it("writes JSON paths with brackets for indices", () => {
    expect(formatJsonPath(["parameterSets", 0, "a1"])).toBe("parameterSets[0].a1");
    expect(formatJsonPath(["path", "legs", 2, "target", 1])).toBe("path.legs[2].target[1]");
    expect(formatJsonPath([])).toBe("(file)");
  });
});
