import { describe, expect, it } from "vitest";
import { PARAMETER_FIELDS } from "@/lib/scenario/parameter-fields";
import { rangeFor, unitFor } from "@/lib/client/loading-desk/field-text";

const field = (s: string) => PARAMETER_FIELDS.find((f) => f.symbol === s)!;

describe("unit and range for the law in use", () => {
  it("shows only the variant of the chosen law", () => {
    expect(unitFor(field("a1"), "sqrtY")).toBe("MPa^-0.5");
    expect(unitFor(field("a1"), "linY")).toBe("MPa^-1");
    expect(rangeFor(field("a1"), "sqrtY")).toBe("> 0 and a1·sqrt(Y0_1) < 1");
    expect(rangeFor(field("a2"), "linY")).toBe("> 0 and 2·a2·Y0_2 < 1");
  });

  it("leaves single-variant fields alone", () => {
    expect(unitFor(field("E1"), "linY")).toBe("MPa");
    expect(rangeFor(field("b"), "linY")).toBe("in [0, 1]");
  });
});
