/**
 * Admissible ranges of a parameter set (spec damage-law.md A.3; scenario-file.md defaults).
 * Every rejected value must produce a message that starts with the field's JSON path.
 */
import { describe, expect, it } from "vitest";
import { parseScenarioFile } from "@/lib/scenario/scenario-schema";
import { parameterSetSchema } from "@/lib/scenario/parameter-set-schema";
import { DEMO_REQUIRED, REQUIRED_FIELDS, demoFile } from "./fixtures";

function errorsFor(set: Record<string, unknown>): string[] {
  const result = parseScenarioFile(demoFile({ parameterSets: [set] }));
  return result.ok ? [] : result.errors;
}

describe("parameter set: required fields", () => {
  it("accepts the demo set of spec A.3 and fills the defaults", () => {
    const parsed = parameterSetSchema.parse({ ...DEMO_REQUIRED });
    expect(parsed).toMatchObject({
      label: "",
      k6: 1,
      dmax: 0.99,
      law: "sqrtY",
      frame: "fixed",
      thetaD: 0,
      Xc: null,
      onFailure: "stop",
    });
  });

  it.each(REQUIRED_FIELDS)("rejects a set without %s, naming it", (field) => {
    const set: Record<string, unknown> = { ...DEMO_REQUIRED };
    delete set[field];
    expect(errorsFor(set)).toContain(`parameterSets[0].${field}: required (a number)`);
  });
});

describe("parameter set: numbers must be finite numbers", () => {
  const bad: [string, unknown, string][] = [
    ["NaN", NaN, "must be a finite number"],
    ["Infinity", Infinity, "must be a finite number"],
    ["-Infinity", -Infinity, "must be a finite number"],
    ["a string", "11000", 'must be a number, got the string "11000"'],
    ["null", null, "must be a number, got null"],
    ["a boolean", true, "must be a number, got boolean"],
  ];
  it.each(bad)("rejects %s in E1", (_name, value, message) => {
    expect(errorsFor({ ...DEMO_REQUIRED, E1: value })).toEqual([`parameterSets[0].E1: ${message}`]);
  });
  it.each(REQUIRED_FIELDS)("rejects NaN in %s", (field) => {
    const errors = errorsFor({ ...DEMO_REQUIRED, [field]: NaN });
    expect(errors).toContain(`parameterSets[0].${field}: must be a finite number`);
  });
});

// [field, rejected values, accepted values] — boundaries from A.3 with the demo set elsewhere.
const SINGLE_FIELD_RANGES: [string, unknown[], unknown[]][] = [
  ["E1", [0, -1], [3700, 2e5]], // small E1 would break the nu12 bound
  ["E2", [0, -5], [1e-3, 11000]],
  ["G12", [0, -1], [1, 1e5]],
  ["Y0_1", [0, -0.01], [1e-6]],
  ["Y0_2", [0, -0.01], [1e-6]],
  ["b", [-1e-9, 1.000001], [0, 1]],
  ["k6", [-0.1, 3.01], [0, 3]],
  ["alpha", [-1e-6, 0.0501], [0, 0.05]],
  ["beta", [-1e-6, 0.0501], [0, 0.05]],
  ["dmax", [0.89, 0.9991, 1], [0.9, 0.999]],
  ["Xc", [0, -100], [null, 1e-3, 300]],
  ["law", ["sqrty", 1], ["sqrtY", "linY"]],
  ["frame", ["rotating", ""], ["fixed"]],
  ["onFailure", ["abort"], ["stop", "continue"]],
  ["thetaD", [NaN, "30"], [-90, 0, 30, 405]],
];

describe.each(SINGLE_FIELD_RANGES)("parameter set: range of %s", (field, rejected, accepted) => {
  it.each(rejected)(`rejects ${field} = %s`, (value) => {
    const errors = errorsFor({ ...DEMO_REQUIRED, [field]: value });
    expect(errors.length).toBe(1);
    expect(errors[0].startsWith(`parameterSets[0].${field}: must be`)).toBe(true);
  });
  it.each(accepted)(`accepts ${field} = %s`, (value) => {
    // linY needs its own slope bound: 2·a·Y0 < 1 holds for the demo a = 0.6, Y0 = 0.05.
    expect(errorsFor({ ...DEMO_REQUIRED, [field]: value })).toEqual([]);
  });
});

describe("parameter set: rules across fields", () => {
  it("nu12 must satisfy |nu12| < sqrt(E1/E2) (A.3)", () => {
    const orthotropic = { ...DEMO_REQUIRED, E1: 9000, E2: 4000, G12: 2500 }; // bound 1.5
    expect(errorsFor({ ...orthotropic, nu12: 1.49 })).toEqual([]);
    expect(errorsFor({ ...orthotropic, nu12: -1.49 })).toEqual([]);
    for (const nu12 of [1.5, -1.5, 2]) {
      expect(errorsFor({ ...orthotropic, nu12 })).toEqual([
        "parameterSets[0].nu12: must satisfy |nu12| < sqrt(E1/E2) = 1.50000",
      ]);
    }
  });

  it.each([
    ["a1", "Y0_1"],
    ["a2", "Y0_2"],
  ])("sqrtY: %s > 0 and a·sqrt(Y0) < 1 (A.3)", (a, y0) => {
    const message = `parameterSets[0].${a}: must be > 0 and ${a}·sqrt(${y0}) < 1`;
    // Y0 = 0.04: sqrt = 0.2, so the bound on a is 5.
    const base = { ...DEMO_REQUIRED, [y0]: 0.04 };
    expect(errorsFor({ ...base, [a]: 4.999 })).toEqual([]);
    expect(errorsFor({ ...base, [a]: 5 })).toEqual([message]);
    expect(errorsFor({ ...base, [a]: 0 })).toEqual([message]);
    expect(errorsFor({ ...base, [a]: -0.1 })).toEqual([message]);
  });

  it.each([
    ["a1", "Y0_1"],
    ["a2", "Y0_2"],
  ])("linY: %s > 0 and 2·a·Y0 < 1 (A.3)", (a, y0) => {
    const message = `parameterSets[0].${a}: must be > 0 and 2·${a}·${y0} < 1`;
    // Y0 = 0.04: bound 2·a·0.04 < 1 → a < 12.5; a = 6 passes linY but fails sqrtY (6·0.2 > 1).
    const base = { ...DEMO_REQUIRED, law: "linY", [y0]: 0.04 };
    expect(errorsFor({ ...base, [a]: 6 })).toEqual([]);
    expect(errorsFor({ ...base, [a]: 12.5 })).toEqual([message]);
    expect(errorsFor({ ...base, [a]: 0 })).toEqual([message]);
  });

  it("dcrit must lie in (0, dmax) (A.3)", () => {
    expect(errorsFor({ ...DEMO_REQUIRED, dcrit: 0.98 })).toEqual([]);
    expect(errorsFor({ ...DEMO_REQUIRED, dcrit: 0.99 })).toEqual([
      "parameterSets[0].dcrit: must be > 0 and < dmax (0.99)",
    ]);
    expect(errorsFor({ ...DEMO_REQUIRED, dcrit: 0.95, dmax: 0.95 })).toEqual([
      "parameterSets[0].dcrit: must be > 0 and < dmax (0.95)",
    ]);
    expect(errorsFor({ ...DEMO_REQUIRED, dcrit: 0 })).toHaveLength(1);
  });

  it('frame "onset" needs E1 = E2 and G12 = E1/(2(1+nu12)) to 1e-6 relative (B.8)', () => {
    // Demo G12 = 4230.769 is 11000/2.6 = 4230.7692… rounded: 5e-8 relative, inside the tolerance.
    expect(errorsFor({ ...DEMO_REQUIRED, frame: "onset" })).toEqual([]);
    const bad = [
      { E2: 11000 * (1 + 2e-6) },
      { G12: 4230.769 * (1 + 2e-6) },
      { E1: 9000, E2: 6000, G12: 2500 },
    ];
    for (const change of bad) {
      const errors = errorsFor({ ...DEMO_REQUIRED, frame: "onset", ...change });
      expect(errors).toHaveLength(1);
      expect(errors[0]).toMatch(/^parameterSets\[0\]\.frame: "onset" needs an isotropic/);
    }
    // The fixed frame takes any orthotropic material.
    expect(errorsFor({ ...DEMO_REQUIRED, E1: 9000, E2: 6000, G12: 2500 })).toEqual([]);
  });

  it("reports independent problems together, each with its path", () => {
    const errors = errorsFor({ ...DEMO_REQUIRED, E1: -1, b: 2, a2: 9 });
    expect(errors).toEqual(
      expect.arrayContaining([
        "parameterSets[0].E1: must be > 0",
        "parameterSets[0].b: must be in [0, 1]",
        "parameterSets[0].a2: must be > 0 and a2·sqrt(Y0_2) < 1",
      ]),
    );
  });

  it("rejects unknown fields, so a typo cannot silently fall back to a default", () => {
    expect(errorsFor({ ...DEMO_REQUIRED, onfailure: "continue" })).toEqual([
      "parameterSets[0].onfailure: unknown field",
    ]);
  });
});
