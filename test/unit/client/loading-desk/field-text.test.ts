import { describe, expect, it } from "vitest";
import { PARAMETER_FIELDS, choiceText, labelOf } from "@/lib/scenario/parameter-fields";
import { rangeFor, unitFor } from "@/lib/client/loading-desk/field-text";

const field = (s: string) => PARAMETER_FIELDS.find((f) => f.symbol === s)!;

describe("unit and range for the law in use", () => {
  it("shows only the variant of the chosen law", () => {
    expect(unitFor(field("a1"), "sqrtY")).toBe("MPa⁻⁰·⁵");
    expect(unitFor(field("a1"), "linY")).toBe("MPa⁻¹");
    expect(unitFor(field("a2"), "linY")).toBe("MPa⁻¹");
    expect(rangeFor(field("a1"), "sqrtY")).toBe("> 0 and a1·√Y0_1 < 1");
    expect(rangeFor(field("a2"), "linY")).toBe("> 0 and 2·a2·Y0_2 < 1");
  });

  it("leaves single-variant fields alone", () => {
    expect(unitFor(field("E1"), "linY")).toBe("MPa");
    expect(rangeFor(field("b"), "linY")).toBe("in [0, 1]");
    expect(unitFor(field("b"), "linY")).toBe("");
  });
});

describe("labels in words", () => {
  it("keeps the symbol and says what it is", () => {
    expect(labelOf("k6")).toBe("k6 (shear weight in crack compliance)");
    expect(labelOf("dcrit")).toBe("dcrit (critical damage)");
  });

  it("writes choice values in words with the file's word beside them", () => {
    expect(choiceText(field("onFailure"), "stop")).toBe("end the path (stop)");
    expect(choiceText(field("law"), "linY")).toBe("d linear in Ȳ (linY)");
  });

  it("gives every field a label and every choice its words", () => {
    for (const f of PARAMETER_FIELDS) {
      expect(f.label.length, f.symbol).toBeGreaterThan(3);
      for (const c of f.choices ?? []) expect(f.choiceWords?.[c], `${f.symbol} ${c}`).toBeTruthy();
    }
  });
});
