import { describe, expect, it } from "vitest";
import { columnMappingSchema, testRecordMetaSchema } from "@/lib/csv/record-schema";

describe("column mapping schema", () => {
  it("defaults units to auto and accepts optional channels", () => {
    expect(columnMappingSchema.parse({ strain: 0, stress: 1, time: 2 })).toEqual({
      strain: 0,
      stress: 1,
      time: 2,
      strainUnit: "auto",
      stressUnit: "auto",
    });
  });
  it("refuses one column mapped twice and unknown units", () => {
    const twice = columnMappingSchema.safeParse({ strain: 0, stress: 0 });
    expect(twice.success).toBe(false);
    if (!twice.success)
      expect(twice.error.issues[0].message).toBe("each column can be mapped to one quantity only");
    expect(columnMappingSchema.safeParse({ strain: 0, stress: 1, stressUnit: "psi" }).success).toBe(
      false,
    );
  });
});

describe("test record metadata schema", () => {
  it("takes the six test types and the specimen data", () => {
    const meta = testRecordMetaSchema.parse({
      testType: "transverse-after-damage-1",
      loading: "cyclic",
      specimenId: " SMC-07 ",
      orientation: 45,
      strainRate: 1e-4,
      temperature: 23,
      laboratory: "our lab",
      notes: "invented example",
    });
    expect(meta.specimenId).toBe("SMC-07");
  });
  it("needs a specimen id and a known test type", () => {
    expect(
      testRecordMetaSchema.safeParse({ testType: "tension-1", loading: "cyclic", specimenId: "" })
        .success,
    ).toBe(false);
    expect(
      testRecordMetaSchema.safeParse({ testType: "bending", loading: "cyclic", specimenId: "a" })
        .success,
    ).toBe(false);
  });
});
