import { describe, expect, it } from "vitest";

import { plausibilityWarnings } from "@/lib/scenario/plausibility";

// The demo set's values (invented, typical of a sheet moulding compound).
const DEMO = { E1: 11000, E2: 11000, nu12: 0.3, G12: 4230.769, Y0_1: 0.05, Y0_2: 0.05, Xc: null };

describe("plausibility warnings", () => {
  it("say nothing about a typical moulding compound", () => {
    expect(plausibilityWarnings(DEMO)).toEqual([]);
  });

  it("name E1 and say what is usual when the exponent slipped", () => {
    const [warning, ...rest] = plausibilityWarnings({ ...DEMO, E1: 1e308 });
    expect(rest).toEqual([]);
    expect(warning.field).toBe("E1");
    expect(warning.message).toContain("E1 = 1e+308 MPa");
    expect(warning.message).toContain("100 MPa to 500 GPa");
    expect(warning.severity).toBe("implausible");
  });

  it("tell an unusual value (runs) from an implausible one (not plotted)", () => {
    expect(plausibilityWarnings({ ...DEMO, E1: 800_000 })[0].severity).toBe("unusual");
    expect(plausibilityWarnings({ ...DEMO, E1: 0.05 })[0].severity).toBe("implausible");
  });

  it("catch a modulus typed in GPa where MPa is meant", () => {
    expect(plausibilityWarnings({ ...DEMO, E2: 11 }).map((w) => w.field)).toEqual(["E2"]);
  });

  it("check a compressive strength only when one is given", () => {
    expect(plausibilityWarnings({ ...DEMO, Xc: 2 }).map((w) => w.field)).toEqual(["Xc"]);
    expect(plausibilityWarnings({ ...DEMO, Xc: 180 })).toEqual([]);
  });

  it("leave invalid values to the hard checks (no warning for text or NaN)", () => {
    expect(plausibilityWarnings({ ...DEMO, E1: Number.NaN, G12: "x" })).toEqual([]);
  });
});
