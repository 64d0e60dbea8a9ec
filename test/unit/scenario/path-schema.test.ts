/** Legs and paths (scenario-file.md "A leg" and "Validation"; spec C.1). */
import { describe, expect, it } from "vitest";
import { parseScenarioFile } from "@/lib/scenario/scenario-schema";
import { MAX_TOTAL_INCREMENTS } from "@/lib/scenario/path-schema";
import { DEMO_LEGS, demoFile } from "./fixtures";

function errorsForPath(path: unknown): string[] {
  const result = parseScenarioFile(demoFile({ path }));
  return result.ok ? [] : result.errors;
}

const leg = (overrides: Record<string, unknown>) => ({ ...DEMO_LEGS[0], ...overrides });

describe("path", () => {
  it("accepts spec C.1's tension – unload – compression path and keeps it as given", () => {
    const result = parseScenarioFile(demoFile());
    expect(result.ok && result.scenario.path.legs).toEqual(DEMO_LEGS);
    expect(result.ok && result.scenario.path.generators).toEqual([]);
  });

  it("rejects an empty path", () => {
    expect(errorsForPath({ legs: [] })).toEqual([
      "path.legs: must contain at least one leg (the path is empty)",
    ]);
  });

  it("rejects a missing path or missing legs, naming them", () => {
    const { path: _path, ...rest } = demoFile();
    const result = parseScenarioFile(rest);
    expect(result.ok ? [] : result.errors).toEqual(["path: required (an object)"]);
    expect(errorsForPath({})).toEqual(["path.legs: required (a list of legs)"]);
  });

  it.each([0, -3, 1.5, NaN, "10"])("rejects increments = %s", (increments) => {
    const errors = errorsForPath({ legs: [DEMO_LEGS[0], DEMO_LEGS[1], leg({ increments })] });
    expect(errors).toHaveLength(1);
    expect(errors[0]).toMatch(/^path\.legs\[2\]\.increments: must be/);
  });

  it("says an integer >= 1 for a zero-increment leg (the contract's example)", () => {
    expect(errorsForPath({ legs: [DEMO_LEGS[0], DEMO_LEGS[1], leg({ increments: 0 })] })).toEqual([
      "path.legs[2].increments: must be an integer >= 1",
    ]);
  });

  it(`accepts exactly ${MAX_TOTAL_INCREMENTS} increments in total and rejects one more`, () => {
    const half = MAX_TOTAL_INCREMENTS / 2;
    expect(errorsForPath({ legs: [leg({ increments: half }), leg({ increments: half })] })).toEqual(
      [],
    );
    expect(
      errorsForPath({ legs: [leg({ increments: half }), leg({ increments: half + 1 })] }),
    ).toEqual(["path.legs: total increments 1000001 exceed the limit of 1000000"]);
  });

  it("rejects bad control entries and wrong tuple lengths, naming the component", () => {
    expect(errorsForPath({ legs: [leg({ control: ["strain", "load", "stress"] })] })).toEqual([
      'path.legs[0].control[1]: must be one of "strain", "stress"',
    ]);
    for (const control of [
      ["strain", "stress"],
      ["strain", "stress", "stress", "stress"],
      "strain",
    ]) {
      expect(errorsForPath({ legs: [leg({ control })] })).toEqual([
        'path.legs[0].control: must be a list of 3 entries, each "strain" or "stress", for (11, 22, 12)',
      ]);
    }
  });

  it("rejects non-finite or missing targets", () => {
    expect(errorsForPath({ legs: [leg({ target: [0.01, Infinity, 0] })] })).toEqual([
      "path.legs[0].target[1]: must be a finite number",
    ]);
    expect(errorsForPath({ legs: [leg({ target: [0.01, 0] })] })).toEqual([
      "path.legs[0].target: must be a list of 3 numbers for (11, 22, 12)",
    ]);
    expect(errorsForPath({ legs: [{ control: DEMO_LEGS[0].control, increments: 5 }] })).toEqual([
      "path.legs[0].target: must be a list of 3 numbers for (11, 22, 12)",
    ]);
  });

  it("rejects unknown fields in a leg and in the path", () => {
    expect(errorsForPath({ legs: [leg({ n: 5 })] })).toEqual(["path.legs[0].n: unknown field"]);
    expect(errorsForPath({ legs: DEMO_LEGS, segments: [] })).toEqual([
      "path.segments: unknown field",
    ]);
  });
});
