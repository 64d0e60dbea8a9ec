import { describe, expect, it } from "vitest";
import { SHOWN_DIGITS, shownNumber } from "@/lib/shared/shown-number";

describe("shownNumber: parameter values as people read them", () => {
  it("shows six significant digits", () => {
    expect(SHOWN_DIGITS).toBe(6);
    // the fitted E1 seen on the desk in the issue 13 browser walk
    expect(shownNumber(10994.028523930534)).toBe("10994");
    expect(shownNumber(0.31234567891)).toBe("0.312346");
    expect(shownNumber(1.2345678e-5)).toBe("0.0000123457");
  });

  it("writes moduli without an exponent", () => {
    expect(shownNumber(210000.4)).toBe("210000");
    expect(shownNumber(123456789)).toBe("123457000");
  });

  it("drops float noise and keeps short values as typed", () => {
    expect(shownNumber(0.000030000000000000004)).toBe("0.00003");
    expect(shownNumber(0.1 + 0.2)).toBe("0.3");
    expect(shownNumber(0.06)).toBe("0.06");
    expect(shownNumber(8200)).toBe("8200");
  });

  it("writes -0 as 0 and leaves non-finite values readable", () => {
    expect(shownNumber(-0)).toBe("0");
    expect(shownNumber(-4.5e-7)).toBe("-4.5e-7");
    expect(shownNumber(Infinity)).toBe("Infinity");
  });

  it("takes another digit count", () => {
    expect(shownNumber(10994.028523930534, 3)).toBe("11000");
  });
});
