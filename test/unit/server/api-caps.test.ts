import { describe, expect, it } from "vitest";

import { statusOf } from "@/lib/server/http/respond";
import { isAppError } from "@/lib/shared/errors";
import {
  API_MAX_PARAMETER_SETS,
  API_MAX_RUN_ROWS,
  checkApiCaps,
  checkApiCapsOfSavedFile,
} from "@/lib/server/api-caps";

function sets(n: number) {
  return Array.from({ length: n }, (_, i) => ({ id: `S${i}` }));
}

function leg(increments: number) {
  return { control: ["strain", "stress", "stress"], target: [0.01, 0, 0], increments };
}

function refusal(scenario: Record<string, unknown>) {
  try {
    checkApiCaps(scenario);
  } catch (error) {
    if (!isAppError(error)) throw error;
    return { status: statusOf(error.code), message: error.message, field: error.field };
  }
  return null;
}

describe("API caps", () => {
  it("accepts 12 parameter sets and refuses 13 with a 400 naming the cap", () => {
    expect(API_MAX_PARAMETER_SETS).toBe(12);
    expect(refusal({ parameterSets: sets(12), path: { legs: [leg(10)] } })).toBeNull();
    expect(refusal({ parameterSets: sets(13), path: { legs: [leg(10)] } })).toEqual({
      status: 400,
      message: "The file has 13 parameter sets; the API accepts at most 12 per scenario file.",
      field: "parameterSets",
    });
  });

  it("counts the initial row: 1,000,000 increments fit, one more does not", () => {
    expect(API_MAX_RUN_ROWS).toBe(1_000_001);
    expect(
      refusal({ parameterSets: sets(1), path: { legs: [leg(600_000), leg(400_000)] } }),
    ).toBeNull();
    const over = refusal({ parameterSets: sets(1), path: { legs: [leg(600_000), leg(400_001)] } });
    expect(over).toEqual({
      status: 400,
      message:
        "The run would produce 1,000,002 rows; the API answers at most 1,000,001 rows per run.",
      field: "path.legs",
    });
  });

  it("leaves malformed files to the schema's own messages", () => {
    expect(refusal({ parameterSets: "many", path: { legs: "long" } })).toBeNull();
    expect(refusal({})).toBeNull();
  });
});

describe("API caps on saved files", () => {
  it("refuses a saved file with 13 parameter sets and ignores bodies without a file", () => {
    expect(() =>
      checkApiCapsOfSavedFile({ message: "m", file: { parameterSets: sets(13) } }),
    ).toThrow("The file has 13 parameter sets; the API accepts at most 12 per scenario file.");
    expect(() => checkApiCapsOfSavedFile({ file: { parameterSets: sets(12) } })).not.toThrow();
    expect(() => checkApiCapsOfSavedFile(null)).not.toThrow();
    expect(() => checkApiCapsOfSavedFile({ file: [] })).not.toThrow();
  });
});
